import { heaterSummary } from '../lib/heater-summary';

/** The line-up's heaters in one line (series total and current, or parallel load), a mixed-current error, and unread names. */
export function HeaterSummaryLine({ types }: { types: readonly string[] }) {
  const summary = heaterSummary(types);
  if (summary.line === undefined && summary.unknown.length === 0) return null;
  return (
    <div className="space-y-1 text-sm" aria-label="Heaters">
      {summary.line && (
        <p>
          <span className="font-semibold">Heaters: </span>
          <span className="font-mono">{summary.line}</span>
        </p>
      )}
      {summary.mixed && (
        <p className="font-semibold text-danger">
          <span aria-hidden="true">✕ </span>Valves made for different heater currents share one series string: some
          heaters run hot, others cold.
        </p>
      )}
      {summary.unknown.length > 0 && (
        <p className="text-ink-soft">{`Not recognised, check their heater data by hand: ${summary.unknown.join(', ')}.`}</p>
      )}
    </div>
  );
}
