import type { Severity, Status } from '../../shared/schemas/findings';
import { severityMarker, statusStyle, type MarkerShape } from '../lib/finding-legend';

/** The status glyph on its colour, as the canvas draws it on the pin. The word travels beside it (or in `label`). */
export function StatusGlyph({ status, className = '' }: { status: Status; className?: string }) {
  const s = statusStyle(status);
  return (
    <span
      aria-hidden="true"
      className={`inline-flex h-6 w-6 shrink-0 items-center justify-center rounded-full text-sm leading-none font-bold ring-1 ring-ink/30 ${className}`}
      style={{ backgroundColor: s.colour, color: s.ink }}
    >
      {s.glyph}
    </span>
  );
}

export function StatusMark({ status }: { status: Status }) {
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
      <StatusGlyph status={status} />
      {statusStyle(status).label}
    </span>
  );
}

const shapePaths: Record<MarkerShape, string> = {
  triangle: 'M8 1.5 15 14.5H1Z',
  square: 'M2 2h12v12H2Z',
  diamond: 'M8 1 15 8 8 15 1 8Z',
  circle: 'M8 1.5a6.5 6.5 0 1 1 0 13 6.5 6.5 0 0 1 0-13Z',
  ring: 'M8 2.5a5.5 5.5 0 1 1 0 11 5.5 5.5 0 0 1 0-11Z',
};

/** The severity's marker shape, the same one the canvas draws. */
export function SeverityShape({ severity, className = 'h-4 w-4' }: { severity: Severity; className?: string }) {
  const { shape } = severityMarker(severity);
  const hollow = shape === 'ring';
  return (
    <svg viewBox="0 0 16 16" aria-hidden="true" className={`shrink-0 ${className}`}>
      <path
        d={shapePaths[shape]}
        fill={hollow ? 'none' : 'currentColor'}
        stroke="currentColor"
        strokeWidth={hollow ? 2 : 1}
        strokeLinejoin="round"
      />
    </svg>
  );
}

export function SeverityMark({ severity }: { severity: Severity }) {
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap ${severity === 'hazard' ? 'font-semibold text-danger' : ''}`}
    >
      <SeverityShape severity={severity} />
      {severityMarker(severity).label}
    </span>
  );
}
