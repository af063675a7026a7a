import { useMemo, useState } from 'react';
import { markRefSchema, type ReferenceMark } from '../../../../shared/schemas/sheets';
import { inputClass } from '../../../components/field';
import type { NewMark } from '../../../lib/new-mark';
import { useReferences } from '../../../lib/queries/references';
import { useCreateReferenceMark, useDeleteReferenceMark, useReferenceMarks } from '../api/reference-marks';
import { useMismatchNotes } from '../api/mismatch-notes';
import { markAsFinding } from '../lib/mark-as-finding';
import { ReferenceCanvas } from './sheet-canvas';
import { ReferenceMarkList } from './reference-mark-list';

export type MarkTarget = { sheetPageId: number; photoId?: undefined } | { photoId: number; sheetPageId?: undefined };

interface Props {
  restorationId: number;
  label: string;
  imageUrl: string;
  imageSize: { width: number; height: number };
  target: MarkTarget;
  canMark: boolean;
  /** Zoom onto this mark on arrival ("on the diagram" / "on the chassis"). */
  focusMarkId?: number;
  onImageError?: () => void;
}

const onThis = (m: ReferenceMark, target: MarkTarget) =>
  target.sheetPageId !== undefined ? m.sheetPageId === target.sheetPageId : m.photoId === target.photoId;

/**
 * A diagram page or a chassis photo on the markup canvas with its reference marks: a technician places a pin or
 * a box with a reference (R23); every mark links to the same reference on the other pictures.
 */
export function ReferenceViewer({
  restorationId,
  label,
  imageUrl,
  imageSize,
  target,
  canMark,
  focusMarkId,
  onImageError,
}: Props) {
  const marks = useReferenceMarks(restorationId);
  const known = useReferences(restorationId);
  const mismatches = useMismatchNotes(restorationId);
  const create = useCreateReferenceMark(restorationId);
  const remove = useDeleteReferenceMark(restorationId);
  const [ref, setRef] = useState('');
  const [message, setMessage] = useState('');
  const [selectedId, setSelectedId] = useState(focusMarkId);
  const here = useMemo(() => (marks.data ?? []).filter((m) => onThis(m, target)), [marks.data, target]);
  const items = useMemo(() => here.map((m, i) => markAsFinding(m, i + 1)), [here]);

  const onCreate = async (geometry: NewMark): Promise<number | undefined> => {
    if (geometry.shape !== 'pin' && geometry.shape !== 'rect') {
      setMessage('Mark a reference with the pin or the box.');
      return undefined;
    }
    const parsed = markRefSchema.safeParse(ref);
    if (!parsed.success) {
      setMessage(`Type the reference first: ${parsed.error.issues[0]?.message ?? 'e.g. R23'}.`);
      return undefined;
    }
    try {
      const mark = await create.mutateAsync({
        ...target,
        ref: parsed.data,
        shape: geometry.shape,
        points: geometry.points,
      });
      setMessage(`${mark.ref} marked.`);
      setSelectedId(mark.id);
      return mark.id;
    } catch (err) {
      setMessage(err instanceof Error ? err.message : 'The mark was not saved.');
      return undefined;
    }
  };

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="h-[70vh] min-h-80" data-markup-probe={target.sheetPageId !== undefined ? 'diagram' : 'chassis'}>
        <ReferenceCanvas
          imageUrl={imageUrl}
          imageSize={imageSize}
          items={items}
          selectedId={selectedId}
          focusId={focusMarkId}
          canMark={canMark}
          onSelect={setSelectedId}
          onCreate={onCreate}
          onDelete={(id) => remove.mutate(id)}
          onImageError={onImageError}
          label={label}
        />
      </div>
      <aside className="space-y-4">
        {canMark && (
          <label className="block space-y-1">
            <span className="font-semibold">Reference for the next mark</span>
            <input
              value={ref}
              onChange={(e) => setRef(e.target.value)}
              list="known-references"
              className={inputClass}
              placeholder="e.g. R23"
              autoComplete="off"
            />
            <datalist id="known-references">
              {(known.data ?? []).map((r) => (
                <option key={r.ref} value={r.ref} />
              ))}
            </datalist>
            <span className="block text-sm text-ink-soft">Then place a pin or draw a box on the picture.</span>
          </label>
        )}
        <p role="status" className="text-sm">
          {message}
        </p>
        <ReferenceMarkList
          restorationId={restorationId}
          here={here}
          all={marks.data ?? []}
          loading={marks.isPending}
          mismatches={mismatches.data ?? []}
          summary={known.data ?? []}
          selectedId={selectedId}
          onSelect={setSelectedId}
          onDelete={canMark ? (id) => remove.mutate(id) : undefined}
        />
      </aside>
    </div>
  );
}
