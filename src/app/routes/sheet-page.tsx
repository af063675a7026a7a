import { Link, useParams, useSearchParams } from 'react-router';
import { can } from '../../../shared/permissions';
import { sheetKindLabels } from '../../../shared/schemas/sheets';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { usePhotos } from '../../lib/queries/get-photos';
import { photoLabel } from '../../lib/photo-format';
import { useSheetPages } from '../../features/sheets/api/get-sheet-pages';
import { ReferenceViewer } from '../../features/sheets/components/reference-viewer';
import { SheetPageDetails } from '../../features/sheets/components/sheet-page-details';
import { useRestorationContext } from '../restoration-context';
import { WithMarkupCanvas } from './sheet-canvas-provider';

const focusOf = (params: URLSearchParams) => {
  const mark = Number(params.get('mark'));
  return Number.isInteger(mark) && mark > 0 ? mark : undefined;
};

/** One service sheet page with its reference marks; `?mark=` zooms onto one. */
export function SheetPageRoute() {
  const r = useRestorationContext();
  const pageId = Number(useParams().pageId);
  const [search] = useSearchParams();
  const pages = useSheetPages(r.id);
  const back = (
    <Link to={`/restorations/${r.id}/sheets`} className="font-semibold text-glow-strong underline">
      Back to the service sheet
    </Link>
  );
  if (pages.isPending) return <Loading label="Fetching the page…" />;
  if (pages.isError) return <ErrorState error={pages.error} onRetry={() => pages.refetch()} />;
  const page = pages.data.find((p) => p.id === pageId);
  if (!page)
    return (
      <EmptyState title="Page not found">
        It is not in this restoration, or it is not shared with you. {back}
      </EmptyState>
    );
  const label = `${page.title || `Page ${page.pageNumber}`} (${sheetKindLabels[page.kind]})`;
  return (
    <section className="space-y-3" aria-label={label}>
      <p>{back}</p>
      <h2 className="text-xl font-bold">{label}</h2>
      <SheetPageDetails
        key={`${page.id}-${page.kind}-${page.title}-${page.ownerVisible}`}
        page={page}
        canEdit={can(r.role, 'sheets.edit')}
      />
      <WithMarkupCanvas>
        <ReferenceViewer
          key={`${page.id}-${search.get('mark') ?? ''}`}
          restorationId={r.id}
          label={label}
          imageUrl={page.urls.large}
          imageSize={{ width: page.width, height: page.height }}
          target={{ sheetPageId: page.id }}
          canMark={can(r.role, 'references.mark')}
          focusMarkId={focusOf(search)}
          onImageError={() => void pages.refetch()}
        />
      </WithMarkupCanvas>
    </section>
  );
}

/** One chassis photo with its reference (location) marks; `?mark=` zooms onto one. */
export function ChassisReferencesRoute() {
  const r = useRestorationContext();
  const photoId = Number(useParams().photoId);
  const [search] = useSearchParams();
  const photos = usePhotos(r.id);
  const back = (
    <Link to={`/restorations/${r.id}/sheets`} className="font-semibold text-glow-strong underline">
      Back to the service sheet
    </Link>
  );
  if (photos.isPending) return <Loading label="Fetching the photo…" />;
  if (photos.isError) return <ErrorState error={photos.error} onRetry={() => photos.refetch()} />;
  const photo = photos.data.find((p) => p.id === photoId);
  if (!photo)
    return (
      <EmptyState title="Photo not found">
        It is not in this restoration, or it is not shared with you. {back}
      </EmptyState>
    );
  const label = `References on ${photoLabel(photo)}`;
  return (
    <section className="space-y-3" aria-label={label}>
      <p>
        {back} ·{' '}
        <Link to={`/restorations/${r.id}/photos/${photo.id}`} className="font-semibold text-glow-strong underline">
          Findings on this photo
        </Link>
      </p>
      <h2 className="text-xl font-bold">{label}</h2>
      <WithMarkupCanvas>
        <ReferenceViewer
          key={`${photo.id}-${search.get('mark') ?? ''}`}
          restorationId={r.id}
          label={label}
          imageUrl={photo.urls.display}
          imageSize={{ width: photo.width, height: photo.height }}
          target={{ photoId: photo.id }}
          canMark={can(r.role, 'references.mark')}
          focusMarkId={focusOf(search)}
          onImageError={() => void photos.refetch()}
        />
      </WithMarkupCanvas>
    </section>
  );
}
