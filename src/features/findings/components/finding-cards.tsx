import type { Row } from '@tanstack/react-table';
import { Link } from 'react-router';
import { findingPath, kindLabels, type Finding } from '../../../../shared/schemas/findings';
import { relativeTime } from './finding-format';
import { SeverityMark, StatusMark } from '../../../components/status-mark';

/** The findings as cards, for a phone propped against a chassis: each card is one link. */
export function FindingCards({
  rows,
  photoLabel,
  className = '',
}: {
  rows: Row<Finding>[];
  photoLabel: (id: number) => string;
  className?: string;
}) {
  return (
    <ul className={`space-y-2 ${className}`} aria-label="Findings">
      {rows.map(({ original: f }) => (
        <li key={f.id}>
          <Link
            to={findingPath(f)}
            className="block space-y-1 rounded-xl border border-rule bg-panel px-4 py-3 hover:bg-sunken"
          >
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <span className="font-mono font-bold">#{f.number}</span>
              {f.componentRef && <span className="font-mono font-semibold">{f.componentRef}</span>}
              <span className="font-semibold">{f.title}</span>
            </span>
            <span className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
              <StatusMark status={f.status} />
              <SeverityMark severity={f.severity} />
              <span>{kindLabels[f.kind]}</span>
            </span>
            <span className="block text-sm text-ink-soft">
              {photoLabel(f.photoId)} · {f.commentCount === 1 ? '1 comment' : `${f.commentCount} comments`} · updated{' '}
              {relativeTime(f.updatedAt)}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
