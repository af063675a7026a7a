import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { usePhotos } from '../../../lib/queries/get-photos';
import { useRefreshExpiredUrls } from '../hooks/use-refresh-expired-urls';
import { flattenGroups, groupPhotos } from '../lib/group-photos';
import { PhotoGallery } from './photo-gallery';
import { PhotoLightbox } from './photo-lightbox';
import { PhotoUploader } from './photo-uploader';

function Empty({ role }: { role: Role }) {
  if (role === 'owner')
    return (
      <EmptyState title="Nothing shared with you yet">
        Photos of the work appear here once the technician shares them.
      </EmptyState>
    );
  if (can(role, 'photos.upload'))
    return (
      <EmptyState title="No photos yet — photograph everything before any power: top, underside, rear…">
        They are the record to rewire from. Only the ones you share reach the owner.
      </EmptyState>
    );
  return <EmptyState title="No photos yet">The technician has not added any photos.</EmptyState>;
}

/** A restoration's photo library: the uploader for technicians, the gallery, and the lightbox. */
export function PhotoLibrary({
  restorationId,
  role,
  liveChassis,
  onUploadBusyChange,
}: {
  restorationId: number;
  role: Role;
  liveChassis?: boolean;
  onUploadBusyChange?: (busy: boolean) => void;
}) {
  const query = usePhotos(restorationId);
  const refreshUrls = useRefreshExpiredUrls(query.dataUpdatedAt, query.refetch);
  const groups = useMemo(() => groupPhotos(query.data ?? []), [query.data]);
  const ordered = useMemo(() => flattenGroups(groups), [groups]);
  const [openId, setOpenId] = useState<number | null>(null);
  const headingId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const headingRef = useRef<HTMLHeadingElement>(null);
  /** Which thumbnail gets focus once the lightbox has closed (null: the heading, when none is left). */
  const focusAfterClose = useRef<number | null | undefined>(undefined);

  useEffect(() => {
    if (openId !== null || focusAfterClose.current === undefined) return;
    const id = focusAfterClose.current;
    focusAfterClose.current = undefined;
    const thumb = id === null ? null : rootRef.current?.querySelector<HTMLElement>(`[data-photo-id="${id}"]`);
    (thumb ?? headingRef.current)?.focus();
  }, [openId, ordered]);

  const close = (focusId: number | null) => {
    focusAfterClose.current = focusId;
    setOpenId(null);
  };
  const deleted = (id: number) => {
    const at = ordered.findIndex((p) => p.id === id);
    close((ordered[at + 1] ?? ordered[at - 1])?.id ?? null);
  };
  const count = query.data ? ` (${query.data.length})` : '';

  return (
    <div ref={rootRef} className="space-y-6">
      {can(role, 'photos.upload') && (
        <PhotoUploader restorationId={restorationId} liveChassis={liveChassis} onBusyChange={onUploadBusyChange} />
      )}
      <section aria-labelledby={headingId} className="space-y-4">
        <h2 id={headingId} ref={headingRef} tabIndex={-1} className="text-lg font-bold">
          Photos{count}
        </h2>
        {query.isPending ? (
          <Loading label="Fetching photos…" />
        ) : query.isError ? (
          <ErrorState error={query.error} onRetry={() => query.refetch()} />
        ) : ordered.length === 0 ? (
          <Empty role={role} />
        ) : (
          <PhotoGallery groups={groups} showShared={role !== 'owner'} onOpen={setOpenId} onImageError={refreshUrls} />
        )}
      </section>
      {openId !== null && ordered.some((p) => p.id === openId) && (
        <PhotoLightbox
          photos={ordered}
          currentId={openId}
          role={role}
          onNavigate={setOpenId}
          onClose={() => close(openId)}
          onDeleted={deleted}
          onImageError={refreshUrls}
        />
      )}
    </div>
  );
}
