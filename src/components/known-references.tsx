import { useReferences } from '../lib/queries/references';

/** The references already known in the restoration (diagram, chassis, findings, ledger, readings), for an input's `list`. */
export function KnownReferences({ restorationId, id }: { restorationId: number; id: string }) {
  const known = useReferences(restorationId);
  return (
    <datalist id={id}>
      {(known.data ?? []).map((r) => (
        <option key={r.ref} value={r.ref} />
      ))}
    </datalist>
  );
}
