import { Link } from 'react-router';
import {
  mismatchLine,
  type MismatchNote,
  type ReferenceMark,
  type ReferenceSummary,
} from '../../../../shared/schemas/sheets';
import { referencePath } from '../../../lib/reference-path';

interface Props {
  restorationId: number;
  /** The marks on this picture. */
  here: ReferenceMark[];
  /** Every mark of the restoration, to link the same reference elsewhere. */
  all: ReferenceMark[];
  loading: boolean;
  /** Mismatch notes of the restoration, shown under the reference they are about. */
  mismatches: MismatchNote[];
  /** The references' counts: a finding naming the reference shows it on the chassis too. */
  summary: ReferenceSummary[];
  selectedId?: number;
  onSelect: (id: number) => void;
  onDelete?: (id: number) => void;
}

/** The references on this picture; each links to the same reference on the diagram and on the chassis. */
export function ReferenceMarkList({
  restorationId,
  here,
  all,
  loading,
  mismatches,
  summary,
  selectedId,
  onSelect,
  onDelete,
}: Props) {
  if (loading) return <p className="text-sm text-ink-soft">Fetching the references…</p>;
  if (!here.length) return <p className="text-sm text-ink-soft">No references marked on this picture yet.</p>;
  return (
    <ul className="space-y-2" aria-label="References on this picture">
      {here.map((m, i) => {
        const onDiagram = m.sheetPageId !== null;
        const counts = summary.find((r) => r.ref === m.ref);
        const others = onDiagram
          ? counts
            ? counts.chassisMarks + counts.findings
            : 0
          : all.filter((o) => o.ref === m.ref && o.sheetPageId !== null).length;
        const other = onDiagram ? 'on the chassis' : 'on the diagram';
        const path = referencePath(
          restorationId,
          m.ref,
          onDiagram ? { diagram: m.id, first: 'chassis' } : { chassis: m.id, first: 'diagram' },
        );
        return (
          <li key={m.id} className={`rounded-lg border p-2 ${m.id === selectedId ? 'border-glow' : 'border-rule'}`}>
            <div className="flex items-center gap-2">
              <button
                type="button"
                onClick={() => onSelect(m.id)}
                className="min-h-11 flex-1 text-left font-mono font-semibold"
                aria-pressed={m.id === selectedId}
              >
                {i + 1}. {m.ref}
              </button>
              {onDelete && (
                <button
                  type="button"
                  onClick={() => onDelete(m.id)}
                  className="min-h-11 px-2 text-sm text-danger underline"
                  aria-label={`Remove the ${m.ref} mark`}
                >
                  Remove
                </button>
              )}
            </div>
            <p className="text-sm">
              <Link to={path} className="font-semibold text-glow-strong underline" aria-label={`${m.ref} ${other}`}>
                {other}
              </Link>
              {!others && <span className="text-ink-soft"> (not marked there yet)</span>}
            </p>
            {mismatches
              .filter((n) => n.ref === m.ref)
              .map((n) => (
                <p key={n.id} className="text-sm">
                  Differs from the diagram: {mismatchLine(n)}
                </p>
              ))}
          </li>
        );
      })}
    </ul>
  );
}
