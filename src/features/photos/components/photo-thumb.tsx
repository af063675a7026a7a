import type { Photo } from '../../../../shared/schemas/photos';
import { StatusGlyph } from '../../../components/status-mark';
import { findingCountList, findingCountText, photoLabel, thumbSize } from '../../../lib/photo-format';
import { SharedBadge } from './shared-badge';
import { photoSources } from '../../../lib/photo-sources';

/** The gallery's columns: 2 on a phone up to 10 on a wide screen (photo-gallery.tsx). */
const GRID_SIZES =
  '(min-width: 1536px) 10vw, (min-width: 1280px) 12.5vw, (min-width: 1024px) 17vw, (min-width: 768px) 25vw, (min-width: 640px) 33vw, 50vw';

export function PhotoThumb({
  photo,
  showShared,
  onOpen,
  onImageError,
}: {
  photo: Photo;
  /** Only worth marking for people who also see unshared photos. */
  showShared: boolean;
  onOpen: (id: number) => void;
  onImageError?: () => void;
}) {
  const { width, height } = thumbSize(photo);
  const shared = showShared && photo.ownerVisible;
  const counts = findingCountList(photo.findingCounts);
  const label = `${photoLabel(photo)}${shared ? ' (shared with owner)' : ''}${photo.findingCounts ? `; findings: ${findingCountText(photo.findingCounts)}` : ''}`;
  return (
    <button
      type="button"
      data-photo-id={photo.id}
      aria-label={label}
      onClick={() => onOpen(photo.id)}
      className="group relative block w-full overflow-hidden rounded-lg border border-rule bg-sunken text-left hover:border-glow"
    >
      <img
        alt=""
        width={width}
        height={height}
        loading="lazy"
        decoding="async"
        {...photoSources(photo, GRID_SIZES)}
        onError={onImageError}
        className="aspect-[4/3] h-auto w-full object-cover transition-transform group-hover:scale-[1.02] motion-reduce:transition-none"
      />
      {shared && <SharedBadge className="absolute top-1.5 left-1.5" />}
      {counts.length > 0 && (
        <span aria-hidden="true" className="absolute top-1.5 right-1.5 flex flex-wrap justify-end gap-1">
          {counts.map(({ status, count }) => (
            <span
              key={status}
              className="inline-flex items-center gap-0.5 rounded-full bg-panel/90 py-0.5 pr-1.5 pl-0.5 text-xs font-semibold tabular-nums"
            >
              <StatusGlyph status={status} className="!h-4 !w-4 !text-[0.65rem]" />
              {count}
            </span>
          ))}
        </span>
      )}
      {photo.caption && (
        <span aria-hidden="true" className="block truncate bg-panel px-2 py-1 text-xs text-ink-soft">
          {photo.caption}
        </span>
      )}
    </button>
  );
}
