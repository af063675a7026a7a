import { Link } from 'react-router';
import type { ReferenceMark } from '../../../../shared/schemas/sheets';
import { markPath } from '../lib/mark-as-finding';

interface Props {
  restorationId: number;
  /** The marks on this picture. */
  here: ReferenceMark[];
  /** Every mark of the restoration, to link the same reference elsewhere. */
  all: ReferenceMark[];
  loading: boolean;
  selectedId?: number;
  onSelect: (id: number) => void;
  onDelete?: (id: number) => void;
}

/** The references on this picture; each links to the same reference on the diagram and on the chassis. */
export function ReferenceMarkList({ restorationId, here, all, loading, selectedId, onSelect, onDelete }: Props) {
  if (loading) return <p className="text-sm text-ink-soft">Fetching the references…</p>;
  if (!here.length) return <p className="text-sm text-ink-soft">No references marked on this picture yet.</p>;
  return (
    <ul className="space-y-2" aria-label="References on this picture">
      {here.map((m, i) => {
        const elsewhere = all.filter((o) => o.ref === m.ref && o.id !== m.id && (o.sheetPageId !== m.sheetPageId || o.photoId !== m.photoId));
        return (
          <li key={m.id} className={`rounded-lg border p-2 ${m.id === selectedId ? 'border-glow' : 'border-rule'}`}>
            <div className="flex items-center gap-2">
              <button type="button" onClick={() => onSelect(m.id)} className="min-h-11 flex-1 text-left font-mono font-semibold" aria-pressed={m.id === selectedId}>
                {i + 1}. {m.ref}
              </button>
              {onDelete && (
                <button type="button" onClick={() => onDelete(m.id)} className="min-h-11 px-2 text-sm text-danger underline" aria-label={`Remove the ${m.ref} mark`}>
                  Remove
                </button>
              )}
            </div>
            <ul className="flex flex-wrap gap-x-3 text-sm">
              {elsewhere.map((o) => (
                <li key={o.id}>
                  <Link to={markPath(restorationId, o)} className="font-semibold text-glow-strong underline">
                    {o.sheetPageId !== null ? 'on the diagram' : 'on the chassis'}
                    {elsewhere.filter((e) => (e.sheetPageId !== null) === (o.sheetPageId !== null)).length > 1 ? ` (${o.sheetPageId ?? o.photoId})` : ''}
                  </Link>
                </li>
              ))}
              {!elsewhere.length && <li className="text-ink-soft">Not marked elsewhere yet.</li>}
            </ul>
          </li>
        );
      })}
    </ul>
  );
}
