import { Link } from 'react-router';
import type { Finding } from '../../../../shared/schemas/findings';
import type { Photo } from '../../../../shared/schemas/photos';
import {
  sheetKindLabels,
  type MismatchNote,
  type ReferenceMark,
  type SheetPage,
} from '../../../../shared/schemas/sheets';
import { photoLabel } from '../../../lib/photo-format';
import { canvasId, chassisLocationsOf, chosen, diagramMarksOf, type ChassisLocation } from '../lib/reference-locations';
import { referencePath, refOf, type ReferenceView } from '../../../lib/reference-path';
import { ReferencePane } from './reference-pane';

interface Props {
  restorationId: number;
  refName: string;
  view: ReferenceView;
  marks: ReferenceMark[];
  pages: SheetPage[];
  photos: Photo[];
  findings: Finding[];
  mismatches: MismatchNote[];
  canMark: boolean;
  onImageError: () => void;
}

const pageLabel = (p: SheetPage) => `${p.title || `Page ${p.pageNumber}`} (${sheetKindLabels[p.kind]})`;

/**
 * The diagram and the chassis side by side on a wide screen (one after the other on a phone, the one asked
 * for first), each zoomed onto the reference; a choice of photos with thumbnails when it is on several.
 */
export function ReferenceSideBySide({
  restorationId,
  refName,
  view,
  marks,
  pages,
  photos,
  findings,
  mismatches,
  canMark,
  onImageError,
}: Props) {
  const diagram = diagramMarksOf(refName, marks, pages);
  const chassis = chassisLocationsOf(refName, marks, findings, new Set(photos.map((p) => p.id)));
  const pick = chosen(view, diagram, chassis);
  const page = pick.diagram && pages.find((p) => p.id === pick.diagram!.sheetPageId);
  const photo = pick.chassis && photos.find((p) => p.id === pick.chassis!.photoId);
  const onPhotos = [...new Map(chassis.map((l) => [l.photoId, l])).values()];
  const chassisFirst = view.first === 'chassis';
  const linkTo = (l: ChassisLocation) =>
    referencePath(restorationId, refName, {
      diagram: pick.diagram?.id,
      ...(l.kind === 'mark' ? { chassis: l.id } : { finding: l.id }),
      first: view.first,
    });

  const diagramPane = page ? (
    <ReferencePane
      key={`d-${pick.diagram!.id}`}
      restorationId={restorationId}
      refName={refName}
      side="diagram"
      label={`${refName} on the diagram: ${pageLabel(page)}`}
      imageUrl={page.urls.large}
      imageSize={{ width: page.width, height: page.height }}
      target={{ sheetPageId: page.id }}
      marks={marks.filter((m) => m.sheetPageId === page.id)}
      focusId={pick.diagram!.id}
      mismatches={mismatches}
      canMark={canMark}
      onImageError={onImageError}
    />
  ) : (
    <p className="rounded-xl border border-dashed border-rule p-4 text-ink-soft">
      {refName} is not marked on a service sheet page yet.{' '}
      <Link to={`/restorations/${restorationId}/sheets`} className="font-semibold text-glow-strong underline">
        Open the service sheet
      </Link>{' '}
      to mark it.
    </p>
  );
  const chassisPane = photo ? (
    <ReferencePane
      key={`c-${pick.chassis!.kind}-${pick.chassis!.id}`}
      restorationId={restorationId}
      refName={refName}
      side="chassis"
      label={`${refName} on the chassis: ${photoLabel(photo)}`}
      imageUrl={photo.urls.display}
      imageSize={{ width: photo.width, height: photo.height }}
      target={{ photoId: photo.id }}
      marks={marks.filter((m) => m.photoId === photo.id)}
      findings={findings.filter((f) => f.photoId === photo.id && refOf(f.componentRef) === refName)}
      focusId={canvasId(pick.chassis!)}
      mismatches={mismatches}
      canMark={canMark}
      onImageError={onImageError}
    />
  ) : (
    <p className="rounded-xl border border-dashed border-rule p-4 text-ink-soft">
      {refName} is not marked on a chassis photo yet: mark it from the service sheet page, or name it in a finding.
    </p>
  );

  return (
    <div className="space-y-4">
      {onPhotos.length > 1 && (
        <nav aria-label={`Photos showing ${refName}`}>
          <p className="font-semibold">
            {refName} is on {onPhotos.length} photos: choose one
          </p>
          <ul className="mt-2 flex flex-wrap gap-2">
            {onPhotos.map((l) => {
              const p = photos.find((x) => x.id === l.photoId)!;
              const current = l.photoId === photo?.id;
              return (
                <li key={l.photoId}>
                  <Link
                    to={linkTo(l)}
                    aria-current={current ? 'true' : undefined}
                    className={`block w-28 overflow-hidden rounded-lg border ${current ? 'border-glow' : 'border-rule'}`}
                  >
                    <img src={p.urls.thumb} alt="" className="aspect-square w-full object-cover" loading="lazy" />
                    <span className="block truncate px-2 py-1 text-xs">{photoLabel(p)}</span>
                  </Link>
                </li>
              );
            })}
          </ul>
        </nav>
      )}
      <div className="grid gap-4 lg:grid-cols-2">
        <div className={chassisFirst ? 'order-2 lg:order-none' : ''}>{diagramPane}</div>
        <div className={chassisFirst ? 'order-1 lg:order-none' : ''}>{chassisPane}</div>
      </div>
    </div>
  );
}
