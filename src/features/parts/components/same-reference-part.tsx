import { firstWithComponentRef } from '../../../../shared/natural-order';
import { partActionLabels } from '../../../../shared/schemas/parts';
import { useParts } from '../api/get-parts';

/** The ledger row's element id, so a notice can link to it. */
export const partRowId = (id: number) => `part-${id}`;

/**
 * Points out that the ledger already has a line for the reference, with a link to the first one; a second line
 * is still allowed (a part replaced twice, a valve and its socket).
 */
export function SameReferencePart({
  restorationId,
  componentRef,
  exceptId,
}: {
  restorationId: number;
  componentRef: string;
  exceptId?: number;
}) {
  const parts = useParts(restorationId);
  const first = parts.data ? firstWithComponentRef(parts.data, componentRef, exceptId) : undefined;
  if (!first) return null;
  return (
    <p role="status" className="rounded-lg bg-glow-soft px-3 py-2 text-sm">
      The ledger already has a line for {first.componentRef.toUpperCase()} (
      {partActionLabels[first.action].toLowerCase()}).{' '}
      <a href={`#${partRowId(first.id)}`} className="font-semibold text-glow-strong underline">
        Go to that line
      </a>
    </p>
  );
}
