import { Link } from 'react-router';
import { useReferences } from '../lib/queries/references';
import { referencePath, refOf, type ReferenceView } from '../lib/reference-path';

/**
 * "on the diagram" beside a finding, a ledger row or a reading whose text names a reference (R23, "V5 pin 3")
 * marked on a service sheet page: opens the diagram zoomed onto the symbol, beside the chassis.
 */
export function OnTheDiagramLink({
  restorationId,
  text,
  from = {},
}: {
  restorationId: number;
  text: string;
  from?: Omit<ReferenceView, 'first'>;
}) {
  const ref = refOf(text);
  const known = useReferences(restorationId, ref !== undefined);
  if (!ref || !known.data?.some((r) => r.ref === ref && r.diagramMarks > 0)) return null;
  return (
    <Link
      to={referencePath(restorationId, ref, { ...from, first: 'diagram' })}
      className="text-sm font-semibold text-glow-strong underline"
      aria-label={`${ref} on the diagram`}
    >
      on the diagram
    </Link>
  );
}
