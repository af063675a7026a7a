import { Link } from 'react-router';
import { sheetKindLabels, type SheetPage } from '../../../../shared/schemas/sheets';

/** The restoration's service sheet pages as thumbnails, each opening its viewer. */
export function SheetPageList({ restorationId, pages }: { restorationId: number; pages: SheetPage[] }) {
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" aria-label="Service sheet pages">
      {pages.map((p) => (
        <li key={p.id}>
          <Link
            to={`/restorations/${restorationId}/sheets/${p.id}`}
            className="block overflow-hidden rounded-xl border border-rule bg-panel hover:border-glow"
          >
            <img src={p.urls.thumb} alt="" className="aspect-[4/3] w-full bg-white object-contain" loading="lazy" />
            <span className="block px-3 py-2">
              <span className="block font-semibold">{p.title || `Page ${p.pageNumber}`}</span>
              <span className="block text-sm text-ink-soft">
                {sheetKindLabels[p.kind]}
                {p.ownerVisible ? ' · shared with owner' : ''}
              </span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
