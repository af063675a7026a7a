import { useMemo, useState } from 'react';
import type { Finding } from '../../../../shared/schemas/findings';
import type { MismatchNote, ReferenceMark } from '../../../../shared/schemas/sheets';
import { mismatchLine } from '../../../../shared/schemas/sheets';
import type { NewMark } from '../../../lib/new-mark';
import { useCreateReferenceMark } from '../api/reference-marks';
import { markAsFinding } from '../lib/mark-as-finding';
import { ReferenceCanvas } from './sheet-canvas';
import type { MarkTarget } from './reference-viewer';

interface Props {
  restorationId: number;
  refName: string;
  /** `diagram` or `chassis`: names the canvas for `window.__gridleakMarkups` and the heading. */
  side: 'diagram' | 'chassis';
  label: string;
  imageUrl: string;
  imageSize: { width: number; height: number };
  target: MarkTarget;
  /** Reference marks on this picture (any reference, for context). */
  marks: ReferenceMark[];
  /** Findings on this photo that name the reference (drawn with negative ids, apart from the marks). */
  findings?: Finding[];
  /** Canvas id to zoom onto: a mark's id, or minus a finding's. */
  focusId?: number;
  mismatches: MismatchNote[];
  canMark: boolean;
  onImageError?: () => void;
}

/** One picture of the side-by-side view, zoomed onto the part for every reader; a technician may mark the reference here too. */
export function ReferencePane({
  restorationId,
  refName,
  side,
  label,
  imageUrl,
  imageSize,
  target,
  marks,
  findings = [],
  focusId,
  mismatches,
  canMark,
  onImageError,
}: Props) {
  const create = useCreateReferenceMark(restorationId);
  const [message, setMessage] = useState('');
  const [selectedId, setSelectedId] = useState(focusId);
  const items = useMemo(
    () => [...marks.map((m, i) => markAsFinding(m, i + 1)), ...findings.map((f) => ({ ...f, id: -f.id }))],
    [marks, findings],
  );
  const onCreate = async (geometry: NewMark): Promise<number | undefined> => {
    if (geometry.shape !== 'pin' && geometry.shape !== 'rect') {
      setMessage('Mark a reference with the pin or the box.');
      return undefined;
    }
    try {
      const mark = await create.mutateAsync({
        ...target,
        ref: refName,
        shape: geometry.shape,
        points: geometry.points,
      });
      setMessage(`${mark.ref} marked ${side === 'diagram' ? 'on the diagram' : 'on the chassis'}.`);
      return mark.id;
    } catch (err) {
      setMessage(err instanceof Error ? err.message : 'The mark was not saved.');
      return undefined;
    }
  };
  return (
    <figure className="flex min-w-0 flex-col gap-2" aria-label={label}>
      <figcaption className="space-y-1">
        <span className="block font-semibold">{label}</span>
        {mismatches.map((m) => (
          <span key={m.id} className="block rounded-md border border-glow bg-sunken px-2 py-1 text-sm">
            Differs from the diagram: {mismatchLine(m)}
          </span>
        ))}
      </figcaption>
      <div className="h-[60vh] min-h-72" data-markup-probe={side}>
        <ReferenceCanvas
          imageUrl={imageUrl}
          imageSize={imageSize}
          items={items}
          selectedId={selectedId}
          focusId={focusId}
          canMark={canMark}
          onSelect={setSelectedId}
          onCreate={onCreate}
          onImageError={onImageError}
          label={label}
        />
      </div>
      {message && (
        <p role="status" className="text-sm">
          {message}
        </p>
      )}
    </figure>
  );
}
