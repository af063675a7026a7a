import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { findingPath, type Finding } from '../../shared/schemas/findings';

/**
 * The one notice that a reference already has a finding: it names the first one and links to it; `children`
 * may add an offer (attach this view to it). It never stops a second finding (a part may well have two faults).
 */
export function ReferenceFindingNotice({ first, children }: { first: Finding; children?: ReactNode }) {
  const ref = first.componentRef.trim().toUpperCase();
  return (
    <div
      role="group"
      aria-label={`${ref} already has a finding`}
      className="space-y-2 rounded-lg border border-glow bg-glow-soft px-3 py-2 text-sm"
    >
      <p role="status">
        {ref} already has finding #{first.number}, “{first.title}”.{' '}
        <Link to={findingPath(first)} className="font-semibold text-glow-strong underline">
          Open #{first.number}
        </Link>
      </p>
      {children}
    </div>
  );
}
