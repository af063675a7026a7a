import { useState, type FormEvent } from 'react';
import {
  mismatchKindLabels,
  mismatchKinds,
  mismatchLine,
  type MismatchKind,
  type MismatchNote,
} from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useCreateMismatchNote, useDeleteMismatchNote, useUpdateMismatchNote } from '../api/mismatch-notes';
import { LabelledOptions } from '../../../components/labelled-options';

interface Props {
  restorationId: number;
  refName: string;
  notes: MismatchNote[];
  canEdit: boolean;
}

/** Where the part on the chassis differs from the diagram, for one reference; a technician adds, shares and removes notes. */
export function MismatchNotesPanel({ restorationId, refName, notes, canEdit }: Props) {
  const create = useCreateMismatchNote(restorationId);
  const update = useUpdateMismatchNote(restorationId);
  const remove = useDeleteMismatchNote(restorationId);
  const [kind, setKind] = useState<MismatchKind>('value-differs');
  const [diagramSays, setDiagramSays] = useState('');
  const [chassisHas, setChassisHas] = useState('');
  const [note, setNote] = useState('');
  const [ownerVisible, setOwnerVisible] = useState(false);
  const [done, setDone] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setDone('');
    create.mutate(
      { ref: refName, kind, diagramSays, chassisHas, note, ownerVisible },
      {
        onSuccess: () => {
          setDone('Mismatch noted.');
          setDiagramSays('');
          setChassisHas('');
          setNote('');
        },
      },
    );
  };
  return (
    <section className="space-y-3 rounded-xl border border-rule bg-panel p-4" aria-labelledby="mismatch-heading">
      <h3 id="mismatch-heading" className="font-semibold">
        Where {refName} differs from the diagram
      </h3>
      {notes.length === 0 ? (
        <p className="text-sm text-ink-soft">
          No difference noted: the part matches the diagram as far as anyone has recorded.
        </p>
      ) : (
        <ul className="space-y-2">
          {notes.map((n) => (
            <li key={n.id} className="flex flex-wrap items-center gap-2 text-sm">
              <span className="flex-1">
                {mismatchLine(n)}
                {n.ownerVisible ? ' · shared with owner' : ''}
              </span>
              {canEdit && (
                <>
                  <button
                    type="button"
                    className="min-h-11 px-2 underline"
                    onClick={() => update.mutate({ id: n.id, patch: { ownerVisible: !n.ownerVisible } })}
                  >
                    {n.ownerVisible ? 'Stop sharing' : 'Share with owner'}
                  </button>
                  <button
                    type="button"
                    className="min-h-11 px-2 text-danger underline"
                    aria-label={`Remove the note on ${n.ref}`}
                    onClick={() => remove.mutate(n.id)}
                  >
                    Remove
                  </button>
                </>
              )}
            </li>
          ))}
        </ul>
      )}
      {canEdit && (
        <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2">
          <label className="block space-y-1">
            <span className="text-sm font-semibold">What differs</span>
            <select value={kind} onChange={(e) => setKind(e.target.value as MismatchKind)} className={inputClass}>
              <LabelledOptions values={mismatchKinds} labels={mismatchKindLabels} />
            </select>
          </label>
          <label className="block space-y-1">
            <span className="text-sm font-semibold">The diagram says</span>
            <input
              value={diagramSays}
              onChange={(e) => setDiagramSays(e.target.value)}
              maxLength={200}
              className={inputClass}
              placeholder="e.g. 47k"
            />
          </label>
          <label className="block space-y-1">
            <span className="text-sm font-semibold">The chassis has</span>
            <input
              value={chassisHas}
              onChange={(e) => setChassisHas(e.target.value)}
              maxLength={200}
              className={inputClass}
              placeholder="e.g. 39k, factory solder joints"
            />
          </label>
          <label className="block space-y-1">
            <span className="text-sm font-semibold">Note (optional)</span>
            <input value={note} onChange={(e) => setNote(e.target.value)} maxLength={2000} className={inputClass} />
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              checked={ownerVisible}
              onChange={(e) => setOwnerVisible(e.target.checked)}
              className="h-5 w-5 accent-glow"
            />
            <span>Share with owner (shown in the report)</span>
          </label>
          <div className="flex items-center gap-3">
            <Button type="submit" disabled={create.isPending}>
              {create.isPending ? 'Saving…' : 'Note the difference'}
            </Button>
            <p role="status" className="text-sm">
              {create.isError ? <span className="text-danger">{create.error.message}</span> : done}
            </p>
          </div>
        </form>
      )}
    </section>
  );
}
