import type { Photo } from '../../../../shared/schemas/photos';
import { OWNER_COLUMN_SIZES, photoSources } from '../../../lib/photo-sources';

/** The set's picture at the top of its page, given the width; a quiet panel until there is one. */
export function HeroPhoto({ photo, name }: { photo: Photo | undefined; name: string }) {
  if (!photo)
    return (
      <div className="flex aspect-[4/3] w-full items-center justify-center rounded-2xl border border-dashed border-rule bg-sunken p-6 text-center text-ink-soft">
        Photos of your set appear here as the workshop shares them.
      </div>
    );
  return (
    <img
      {...photoSources(photo, OWNER_COLUMN_SIZES)}
      alt={
        photo.caption
          ? `${name}: ${photo.caption}`
          : `${name}, ${photo.phase === 'after' ? 'after the work' : 'in the workshop'}`
      }
      width={photo.width || undefined}
      height={photo.height || undefined}
      fetchPriority="high"
      decoding="async"
      className="aspect-[4/3] h-auto w-full rounded-2xl bg-sunken object-cover shadow-sm"
    />
  );
}
