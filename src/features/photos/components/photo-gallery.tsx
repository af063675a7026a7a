import { useId } from 'react';
import { phaseLabels, viewLabels } from '../../../../shared/schemas/photos';
import type { ViewGroup } from '../lib/group-photos';
import { PhotoThumb } from './photo-thumb';

const photos = (n: number) => `${n} ${n === 1 ? 'photo' : 'photos'}`;

/** Photos by view, then by phase, each with its count; two columns on a phone, up to ten on a wide screen. */
export function PhotoGallery({
  groups,
  showShared,
  onOpen,
  onImageError,
}: {
  groups: readonly ViewGroup[];
  showShared: boolean;
  onOpen: (id: number) => void;
  onImageError?: () => void;
}) {
  const idPrefix = useId();
  return (
    <div className="space-y-8">
      {groups.map((group) => (
        <section key={group.view} aria-labelledby={`${idPrefix}-${group.view}`} className="space-y-4">
          <h3
            id={`${idPrefix}-${group.view}`}
            className="flex items-baseline gap-2 border-b border-rule pb-1 text-lg font-bold"
          >
            {viewLabels[group.view]}
            <span className="text-sm font-normal text-ink-soft">{photos(group.count)}</span>
          </h3>
          {group.phases.map(({ phase, photos: list }) => (
            <div key={phase} className="space-y-2">
              <h4 className="flex items-baseline gap-2 font-semibold text-ink-soft">
                {phaseLabels[phase]}
                <span className="text-sm font-normal">{photos(list.length)}</span>
              </h4>
              <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3 md:grid-cols-4 lg:grid-cols-6 xl:grid-cols-8 2xl:grid-cols-10">
                {list.map((photo) => (
                  <li key={photo.id}>
                    <PhotoThumb photo={photo} showShared={showShared} onOpen={onOpen} onImageError={onImageError} />
                  </li>
                ))}
              </ul>
            </div>
          ))}
        </section>
      ))}
    </div>
  );
}
