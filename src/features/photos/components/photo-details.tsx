import { phaseLabels, viewLabels, type Photo } from '../../../../shared/schemas/photos';
import { takenAt } from '../../../lib/photo-format';
import { SharedBadge } from './shared-badge';

/** What is known about the photo on screen; announced politely as the person moves through the set. */
export function PhotoDetails({ photo, position, showShared }: { photo: Photo; position: string; showShared: boolean }) {
  const taken = takenAt(photo.takenAt);
  return (
    <div aria-live="polite" className="space-y-2">
      <p className="text-sm text-ink-soft">{position}</p>
      <h2 className="flex flex-wrap items-center gap-2 text-lg font-bold">
        {viewLabels[photo.view]} · {phaseLabels[photo.phase]}
        {showShared && photo.ownerVisible && <SharedBadge />}
      </h2>
      {photo.caption ? (
        <p className="whitespace-pre-line">{photo.caption}</p>
      ) : (
        <p className="text-ink-soft">No caption.</p>
      )}
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm">
        <dt className="text-ink-soft">Taken</dt>
        <dd>{taken ?? 'not recorded by the camera'}</dd>
        <dt className="text-ink-soft">Added</dt>
        <dd>{takenAt(photo.uploadedAt) ?? '—'}</dd>
      </dl>
    </div>
  );
}
