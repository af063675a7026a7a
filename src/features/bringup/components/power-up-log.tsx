import { decisionLabels, lampBehaviourLabels, supplyLabels, type Bringup } from '../../../../shared/schemas/bringup';
import { EmptyState } from '../../../components/states';
import { lampLimitWords } from '../lib/inline-limits';
import { formatDateTime as when } from '../../../lib/format';

const verdictClass = {
  within: 'text-ok',
  marginal: 'text-glow-strong',
  out: 'text-danger font-semibold',
  unknown: 'text-ink-soft',
} as const;

/** The steps taken at first power, in order: supply, lamp, readings with their verdicts, and the decision. */
export function PowerUpLog({ steps }: { steps: Bringup['steps'] }) {
  if (steps.length === 0)
    return (
      <EmptyState title="No power-up steps yet">
        Each step taken at first power is logged here, with its readings and the decision.
      </EmptyState>
    );
  return (
    <ol aria-label="Power-up steps" className="space-y-3">
      {steps.map((s) => {
        const limit = s.lampWatts ? lampLimitWords(s) : null;
        const stop = s.decision === 'stop';
        return (
          <li key={s.id} className={`rounded-lg border bg-panel p-3 ${stop ? 'border-danger' : 'border-rule'}`}>
            <p className="font-semibold">
              Step {s.number}: {supplyLabels[s.supply]}
              {s.lampWatts !== null && `, ${s.lampWatts} W lamp`}
              {s.appliedVolts !== null && `, ${s.appliedVolts} V applied`}
            </p>
            {s.lampBehaviour !== 'no-lamp' && (
              <p>
                Lamp: {lampBehaviourLabels[s.lampBehaviour]}
                {limit && <span className="text-sm text-ink-soft"> — {limit.limit}</span>}
              </p>
            )}
            {s.readings.length > 0 && (
              <ul className="text-sm">
                {s.readings.map((r) => (
                  <li key={r.measurementId}>
                    {r.location}: <span className="font-mono">{r.readingText}</span>
                    {r.expectedText && <span className="text-ink-soft"> (expected {r.expectedText})</span>} —{' '}
                    <span className={verdictClass[r.verdict]}>{r.verdict}</span>
                  </li>
                ))}
              </ul>
            )}
            {s.notes && <p className="text-sm whitespace-pre-line">{s.notes}</p>}
            <p className={stop ? 'font-semibold text-danger' : 'font-semibold text-ok'}>{decisionLabels[s.decision]}</p>
            <p className="text-sm text-ink-soft">
              <time dateTime={s.takenAt}>{when(s.takenAt)}</time>
              {s.takenBy && ` · ${s.takenBy}`}
            </p>
          </li>
        );
      })}
    </ol>
  );
}
