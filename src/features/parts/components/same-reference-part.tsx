import { partActionLabels } from '../../../../shared/schemas/parts';
import { SameReferenceNotice, type SameReferenceProps } from '../../../components/same-reference-notice';
import { useParts } from '../api/get-parts';

/** The ledger row's element id, so a notice can link to it. */
export const partRowId = (id: number) => `part-${id}`;

/** Points out that the ledger already has a line for the reference, with a link to the first one. */
export function SameReferencePart({ restorationId, ...reference }: SameReferenceProps) {
  const parts = useParts(restorationId);
  return (
    <SameReferenceNotice rows={parts.data} {...reference}>
      {(first) => (
        <p role="status" className="rounded-lg bg-glow-soft px-3 py-2 text-sm">
          The ledger already has a line for {first.componentRef.toUpperCase()} (
          {partActionLabels[first.action].toLowerCase()}).{' '}
          <a href={`#${partRowId(first.id)}`} className="font-semibold text-glow-strong underline">
            Go to that line
          </a>
        </p>
      )}
    </SameReferenceNotice>
  );
}
