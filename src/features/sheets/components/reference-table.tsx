import { useReferences } from '../../../lib/queries/references';
import { useReferenceMarks } from '../api/reference-marks';
import { Link } from 'react-router';
import { markPath } from '../lib/mark-as-finding';
import { referencePath } from '../../../lib/reference-path';

/** Every reference known in the restoration, with where it appears; each mark count links to the first mark. */
export function ReferenceTable({ restorationId }: { restorationId: number }) {
  const refs = useReferences(restorationId);
  const marks = useReferenceMarks(restorationId);
  if (refs.isPending) return <p className="text-sm text-ink-soft">Fetching the references…</p>;
  if (refs.isError) return <p className="text-sm text-danger">The references did not load: {refs.error.message}</p>;
  if (!refs.data.length)
    return (
      <p className="text-sm text-ink-soft">
        No references yet: mark R23 on the diagram, or name it in a finding, a reading or the ledger.
      </p>
    );
  const first = (ref: string, diagram: boolean) =>
    (marks.data ?? []).find((m) => m.ref === ref && (m.sheetPageId !== null) === diagram);
  const linked = (ref: string, n: number, diagram: boolean) => {
    const mark = n > 0 ? first(ref, diagram) : undefined;
    return mark ? (
      <Link
        to={markPath(restorationId, mark)}
        className="font-semibold text-glow-strong underline"
        aria-label={`${ref} ${diagram ? 'on the diagram' : 'on the chassis'}`}
      >
        {n}
      </Link>
    ) : (
      n
    );
  };
  return (
    <table className="w-full text-left text-sm">
      <caption className="text-left text-lg font-semibold">References</caption>
      <thead>
        <tr className="border-b border-rule">
          <th scope="col" className="py-2">
            Reference
          </th>
          <th scope="col">On the diagram</th>
          <th scope="col">On the chassis</th>
          <th scope="col">Findings</th>
          <th scope="col">Ledger</th>
          <th scope="col">Readings</th>
        </tr>
      </thead>
      <tbody>
        {refs.data.map((r) => (
          <tr key={r.ref} className="border-b border-rule">
            <th scope="row" className="py-2 font-mono">
              <Link to={referencePath(restorationId, r.ref)} className="font-semibold text-glow-strong underline">
                {r.ref}
              </Link>
            </th>
            <td>{linked(r.ref, r.diagramMarks, true)}</td>
            <td>{linked(r.ref, r.chassisMarks, false)}</td>
            <td>{r.findings}</td>
            <td>{r.parts}</td>
            <td>{r.readings}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
