import { useCallback, useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { can } from '../../../shared/permissions';
import { findingPath, type Finding } from '../../../shared/schemas/findings';
import type { Photo } from '../../../shared/schemas/photos';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { useMe } from '../../features/auth/api/get-me';
import { usePhotoFindings } from '../../features/findings/api/get-photo-findings';
import { FindingPanel } from '../../features/findings/components/finding-panel';
import { Thread } from '../../features/findings/components/thread';
import { MeasurementsForFinding } from '../../features/measurements/components/measurements-for-finding';
import { FindingsList } from '../../features/markup/components/findings-list';
import { MarkupCanvas } from '../../features/markup/components/markup-canvas';
import { NewFindingForm } from '../../features/markup/components/new-finding-form';
import { useMembers } from '../../features/members/api/get-members';
import { DuplicateFindingOffer } from '../../features/sheets/components/duplicate-finding-offer';
import { KnownReferences } from '../../components/known-references';
import { usePhotos } from '../../lib/queries/get-photos';
import { useRefreshExpiredUrls } from '../../features/photos/hooks/use-refresh-expired-urls';
import { photoLabel } from '../../lib/photo-format';
import { ApiError } from '../../lib/api-client';
import { useStoredFlag } from '../../lib/use-stored-flag';
import { useRestorationContext } from '../restoration-context';
import { usePhotoMarkupActions } from './use-photo-markup-actions';

/** Rows of the findings list drawn together with the canvas's first frame; the others follow once it is drawn. */
const FIRST_ROWS = 40;

/** One photo with its findings on the markup canvas; `/…/photos/:photoId` and `/…/photos/:photoId/findings/:findingId`. */
export function PhotoMarkupRoute() {
  const r = useRestorationContext();
  const photoId = Number(useParams().photoId);
  const photos = usePhotos(r.id);
  const findings = usePhotoFindings(photoId);
  const me = useMe();
  const refreshUrls = useRefreshExpiredUrls(photos.dataUpdatedAt, photos.refetch);
  const back = (
    <Link to={`/restorations/${r.id}/photos`} className="font-semibold text-glow-strong underline">
      Back to the photos
    </Link>
  );
  if (photos.isPending || me.isPending) return <Loading label="Fetching the photo…" />;
  if (photos.isError) return <ErrorState error={photos.error} onRetry={() => photos.refetch()} />;
  const photo = photos.data.find((p) => p.id === photoId);
  if (!photo || (findings.error instanceof ApiError && findings.error.status === 404))
    return (
      <EmptyState title="Photo not found">
        It is not in this restoration, or it is not shared with you. {back}
      </EmptyState>
    );
  if (findings.isPending) return <Loading label="Fetching the findings…" />;
  if (findings.isError) return <ErrorState error={findings.error} onRetry={() => findings.refetch()} />;
  return (
    <PhotoMarkup
      key={photo.id}
      photo={photo}
      findings={findings.data}
      meId={me.data?.id ?? 0}
      onImageError={refreshUrls}
      back={back}
    />
  );
}

function PhotoMarkup({
  photo,
  findings,
  meId,
  onImageError,
  back,
}: {
  photo: Photo;
  findings: Finding[];
  meId: number;
  onImageError: () => void;
  back: ReactNode;
}) {
  const r = useRestorationContext();
  const params = useParams();
  const navigate = useNavigate();
  const members = useMembers(r.id);
  const people = (members.data ?? []).map((m) => ({ userId: m.userId, name: m.name, role: m.role }));
  const findingId = params.findingId === undefined ? undefined : Number(params.findingId);
  const photoPath = `/restorations/${r.id}/photos/${photo.id}`;

  // Zoom onto the finding a URL names: on arrival, and when a link elsewhere opens another; not on the page's own selections.
  const [focusId, setFocusId] = useState(findingId);
  const ownNavigation = useRef(findingId);
  useEffect(() => {
    if (findingId === ownNavigation.current) return;
    ownNavigation.current = findingId;
    setFocusId(findingId);
  }, [findingId]);
  const select = (finding: Finding | undefined) => {
    ownNavigation.current = finding?.id;
    navigate(finding ? findingPath(finding) : photoPath, { replace: true });
  };

  const actions = usePhotoMarkupActions({
    photoId: photo.id,
    restorationId: r.id,
    onCreated: select,
    onDeleted: (id) => id === findingId && select(undefined),
  });
  const canCreate = can(r.role, 'findings.create');
  const canEdit = useCallback(
    (f: Finding) => can(r.role, 'findings.edit', { isAuthor: f.authorId === meId }),
    [r.role, meId],
  );
  const selected = findings.find((f) => f.id === findingId);
  // The photo and its marks come first; the finding's thread, readings and close-up are fetched after that frame.
  const [drawn, setDrawn] = useState(false);
  // On a wide screen the finding panel folds away to give the photo the width; a new finding always opens it.
  const [panelHidden, setPanelHidden] = useStoredFlag('gridleak.markup.panel-hidden');
  const panelOpen = !panelHidden || Boolean(actions.pending);
  const panelId = useId();
  const sheet = useRef<HTMLDivElement>(null);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h2 className="text-lg font-bold">{photoLabel(photo)}</h2>
        {back}
        <button
          type="button"
          aria-expanded={panelOpen}
          aria-controls={panelId}
          disabled={Boolean(actions.pending)}
          onClick={() => setPanelHidden(panelOpen)}
          className="ml-auto hidden min-h-11 rounded-lg border border-rule px-3 font-semibold hover:bg-sunken disabled:opacity-50 lg:inline-block"
        >
          {panelOpen ? 'Hide the finding panel' : 'Show the finding panel'}
        </button>
      </div>
      {actions.alert && (
        <div
          role="alert"
          className="flex items-start justify-between gap-3 rounded-lg border border-danger/40 bg-danger-soft px-4 py-2"
        >
          <p>{actions.alert}</p>
          <button type="button" className="font-semibold underline" onClick={actions.dismissAlert}>
            Dismiss
          </button>
        </div>
      )}
      <div className={`grid gap-4 ${panelOpen ? 'lg:grid-cols-[minmax(0,1fr)_24rem]' : ''}`}>
        <div className="min-w-0 space-y-3">
          <div className="h-[65dvh] min-h-72 lg:h-[calc(100dvh-19rem)] lg:min-h-[28rem]">
            <MarkupCanvas
              imageUrl={photo.urls.display}
              imageSize={{ width: photo.width, height: photo.height }}
              label={photoLabel(photo)}
              items={findings}
              selectedId={selected?.id}
              focusId={focusId}
              canCreate={canCreate}
              canEdit={canEdit}
              onSelect={(id) => {
                setFocusId(undefined);
                select(findings.find((f) => f.id === id));
              }}
              onCreate={actions.startCreate}
              onMove={actions.move}
              onDelete={actions.delete}
              onUndo={actions.undo}
              pendingMark={actions.pending}
              onImageError={onImageError}
              onFirstFrame={() => setDrawn(true)}
              pendingCover={sheet}
            />
          </div>
          <section aria-labelledby="photo-findings-heading" className="space-y-2">
            <h2 id="photo-findings-heading" className="font-bold">
              Findings on this photo ({findings.length})
            </h2>
            {findings.length > 0 ? (
              <FindingsList
                // A thousand rows would hold up the canvas's first frame: the first few come with it, the rest right after.
                items={drawn ? findings : [...findings].sort((a, b) => a.number - b.number).slice(0, FIRST_ROWS)}
                selectedId={selected?.id}
                onPick={(id) => {
                  setFocusId(id);
                  select(findings.find((f) => f.id === id));
                }}
              />
            ) : (
              <p className="text-ink-soft">{canCreate ? 'None yet.' : 'None shared with you on this photo.'}</p>
            )}
          </section>
        </div>
        <aside id={panelId} aria-label="Finding" className={`lg:self-start ${panelOpen ? '' : 'lg:hidden'}`}>
          {actions.pending ? (
            // On a phone: a sheet over the bottom of the photo, which the canvas pans the new mark clear of.
            <div
              ref={sheet}
              data-testid="new-finding-sheet"
              className="rounded-xl border border-rule bg-panel p-4 max-lg:fixed max-lg:inset-x-0 max-lg:bottom-0 max-lg:z-30 max-lg:max-h-[45dvh] max-lg:overflow-y-auto max-lg:rounded-b-none max-lg:shadow-[0_-8px_24px_rgb(0_0_0/0.25)]"
            >
              <NewFindingForm
                shape={actions.pending.shape}
                busy={actions.creating}
                error={actions.createError}
                onSubmit={actions.submitCreate}
                onCancel={actions.cancelCreate}
                refNotice={(typed) => (
                  <DuplicateFindingOffer
                    restorationId={r.id}
                    photoId={photo.id}
                    typed={typed}
                    mark={actions.pending!}
                    onAttached={actions.cancelCreate}
                  />
                )}
                referenceListId="known-references"
                referenceHelp={() => <KnownReferences restorationId={r.id} id="known-references" />}
              />
            </div>
          ) : selected && !drawn ? (
            <Loading label="Opening the finding…" />
          ) : selected ? (
            <div className="space-y-4 rounded-xl border border-rule bg-panel p-4">
              <FindingPanel
                key={selected.id}
                finding={selected}
                role={r.role}
                meId={meId}
                restorationId={r.id}
                members={people}
                onDeleted={() => select(undefined)}
              />
              <MeasurementsForFinding restorationId={r.id} findingId={selected.id} role={r.role} />
              <Thread key={`thread-${selected.id}`} finding={selected} role={r.role} meId={meId} members={people} />
            </div>
          ) : (
            <p className="rounded-xl border border-dashed border-rule bg-panel p-4 text-ink-soft">
              {findingId !== undefined
                ? 'That finding is not on this photo, or it is not shared with you.'
                : canCreate
                  ? 'Choose a tool and click the photo to mark a spot.'
                  : 'Findings shared with you are marked on the photo.'}
            </p>
          )}
        </aside>
      </div>
    </div>
  );
}
