import { Link } from 'react-router';
import { usePhotos } from '../../../lib/queries/get-photos';
import { photoLabel } from '../../../lib/photo-format';

/** The chassis photos, each opening it to mark where a reference sits (a location mark). */
export function ChassisPhotoPicker({ restorationId }: { restorationId: number }) {
  const photos = usePhotos(restorationId);
  if (photos.isPending) return <p className="text-sm text-ink-soft">Fetching the photos…</p>;
  if (photos.isError) return <p className="text-sm text-danger">The photos did not load: {photos.error.message}</p>;
  if (!photos.data.length)
    return <p className="text-sm text-ink-soft">Add chassis photos to mark where each reference sits.</p>;
  return (
    <nav aria-label="Mark references on a chassis photo">
      <h3 className="font-semibold">Mark references on a chassis photo</h3>
      <ul className="mt-2 flex flex-wrap gap-2">
        {photos.data.map((p) => (
          <li key={p.id}>
            <Link
              to={`/restorations/${restorationId}/sheets/chassis/${p.id}`}
              className="block w-28 overflow-hidden rounded-lg border border-rule hover:border-glow"
            >
              <img src={p.urls.thumb} alt="" className="aspect-square w-full object-cover" loading="lazy" />
              <span className="block truncate px-2 py-1 text-xs">{photoLabel(p)}</span>
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
