import { Link } from 'react-router';
import { firstWithComponentRef } from '../../../../shared/natural-order';
import { findingPath } from '../../../../shared/schemas/findings';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';

/**
 * Points out that another finding of this restoration already names the reference, with a link to the first
 * one; it does not stop a second finding (a part may well have two faults). Says nothing until the list is here.
 */
export function SameReferenceFinding({ restorationId, componentRef, exceptId }: { restorationId: number; componentRef: string; exceptId?: number }) {
  const findings = useRestorationFindings(restorationId);
  const first = findings.data ? firstWithComponentRef(findings.data, componentRef, exceptId) : undefined;
  if (!first) return null;
  return (
    <p role="status" className="rounded-lg bg-glow-soft px-3 py-2 text-sm">
      {first.componentRef.toUpperCase()} already has finding #{first.number}, “{first.title}”.{' '}
      <Link to={findingPath(first)} className="font-semibold text-glow-strong underline">
        Open #{first.number}
      </Link>
    </p>
  );
}
