import { useState } from 'react';
import type { Photo } from '../../../../shared/schemas/photos';
import { photoLabel } from '../../../lib/photo-format';
import { photoSources } from '../../../lib/photo-sources';

/**
 * The large image, letterboxed in the space it is given. The thumbnail (already in the browser's cache) stands
 * in, softened, until the display size arrives. Mount with `key={photo.id}` so each photo starts unloaded.
 */
export function LightboxImage({ photo, onError }: { photo: Photo; onError?: () => void }) {
  const [loaded, setLoaded] = useState(false);
  const fill = 'absolute inset-0 h-full w-full object-contain p-2 sm:p-6';
  return (
    <>
      {!loaded && (
        <img src={photo.urls.thumb} alt="" loading="lazy" aria-hidden="true" className={`${fill} opacity-70 blur-sm`} />
      )}
      <img
        {...photoSources(photo, '100vw')}
        alt={photoLabel(photo)}
        width={photo.width || undefined}
        height={photo.height || undefined}
        decoding="async"
        onLoad={() => setLoaded(true)}
        onError={onError}
        className={fill}
      />
      {!loaded && (
        <p
          role="status"
          className="absolute bottom-3 left-1/2 -translate-x-1/2 rounded-full bg-panel/90 px-3 py-1 text-sm text-ink"
        >
          Loading the full photo…
        </p>
      )}
    </>
  );
}
