import { useRef, type KeyboardEvent } from 'react';
import { createPortal } from 'react-dom';
import { Link } from 'react-router';
import { can, type Role } from '../../../../shared/permissions';
import type { Photo } from '../../../../shared/schemas/photos';
import { buttonClass } from '../../../components/button';
import { useModalFocus } from '../hooks/use-modal-focus';
import { useSwipe } from '../hooks/use-swipe';
import { photoLabel } from '../../../lib/photo-format';
import { LightboxImage } from './lightbox-image';
import { PhotoDetails } from './photo-details';
import { PhotoEditPanel } from './photo-edit-panel';

const typing = (target: EventTarget) =>
  target instanceof HTMLElement && target.matches('input, textarea, select, [contenteditable="true"]');
const stepButton = buttonClass(
  'quiet',
  'absolute top-1/2 -translate-y-1/2 bg-panel/90 px-3 aria-disabled:opacity-40 aria-disabled:cursor-not-allowed',
);

/** One photo large, in gallery order: ← → (or swipe) to move, Escape to close. */
export function PhotoLightbox({
  photos,
  currentId,
  role,
  onNavigate,
  onClose,
  onDeleted,
  onImageError,
}: {
  photos: readonly Photo[];
  currentId: number;
  role: Role;
  onNavigate: (id: number) => void;
  onClose: () => void;
  onDeleted: (id: number) => void;
  onImageError?: () => void;
}) {
  const dialogRef = useRef<HTMLDivElement>(null);
  useModalFocus(dialogRef, onClose);
  const index = photos.findIndex((p) => p.id === currentId);
  const photo = photos[index];
  const go = (step: 1 | -1) => {
    const next = photos[index + step];
    if (next) onNavigate(next.id);
  };
  const swipe = useSwipe(go);
  if (!photo) return null;

  const position = `Photo ${index + 1} of ${photos.length}`;
  const onKeyDown = (e: KeyboardEvent) => {
    if (typing(e.target) || e.altKey || e.ctrlKey || e.metaKey) return;
    if (e.key === 'ArrowRight' || e.key === 'ArrowLeft') {
      e.preventDefault();
      go(e.key === 'ArrowRight' ? 1 : -1);
    }
  };
  const atStart = index === 0;
  const atEnd = index === photos.length - 1;

  return createPortal(
    <div
      ref={dialogRef}
      role="dialog"
      aria-modal="true"
      aria-label={`${position}: ${photoLabel(photo)}`}
      tabIndex={-1}
      onKeyDown={onKeyDown}
      className="fixed inset-0 z-50 flex flex-col bg-bakelite lg:flex-row"
    >
      <div className="relative min-h-0 flex-1 touch-pan-y" {...swipe}>
        <LightboxImage key={photo.id} photo={photo} onError={onImageError} />
        {/* aria-disabled rather than disabled: a button that vanishes from the tab order would drop focus. */}
        <button type="button" className={`${stepButton} left-2`} aria-disabled={atStart} onClick={() => go(-1)}>
          <span aria-hidden="true">←</span>
          <span className="sr-only">Previous photo</span>
        </button>
        <button type="button" className={`${stepButton} right-2`} aria-disabled={atEnd} onClick={() => go(1)}>
          <span aria-hidden="true">→</span>
          <span className="sr-only">Next photo</span>
        </button>
      </div>
      <aside className="max-h-[45dvh] space-y-4 overflow-y-auto border-t border-rule bg-panel p-4 text-ink lg:max-h-none lg:w-96 lg:border-t-0 lg:border-l">
        <div className="flex items-start justify-between gap-3">
          <PhotoDetails photo={photo} position={position} showShared={role !== 'owner'} />
          <button type="button" data-autofocus className={buttonClass('quiet', 'shrink-0')} onClick={onClose}>
            Close
          </button>
        </div>
        <Link
          to={`/restorations/${photo.restorationId}/photos/${photo.id}`}
          className={buttonClass('primary', 'w-full')}
        >
          {can(role, 'findings.create') ? 'Mark up this photo' : 'See the findings on this photo'}
        </Link>
        {can(role, 'photos.edit') && (
          <PhotoEditPanel
            key={photo.id}
            photo={photo}
            canDelete={can(role, 'photos.delete')}
            canDownload={can(role, 'photos.original')}
            onDeleted={onDeleted}
          />
        )}
      </aside>
    </div>,
    document.body,
  );
}
