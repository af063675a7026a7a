import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useSearchParams } from 'react-router';
import type { Restoration } from '../../../shared/schemas/restorations';
import { ErrorState, Loading } from '../../components/states';
import { useMe } from '../../features/auth/api/get-me';
import { useRestorationFindings } from '../../lib/queries/get-restoration-findings';
import { BeforeAfter } from '../../features/history/components/before-after';
import { Timeline } from '../../features/history/components/timeline';
import { suggestPairs } from '../../features/history/lib/suggest-pairs';
import { PaymentsPanel } from '../../features/money/components/payments-panel';
import { OwnerHome } from '../../features/owner/components/owner-home';
import { OwnerSet } from '../../features/owner/components/owner-set';
import { OwnerSetCard } from '../../features/owner/components/owner-set-card';
import { RepairedFindings } from '../../features/owner/components/repaired-findings';
import { heroPhoto, repairedFindings } from '../../features/owner/lib/owner-words';
import { usePhotos } from '../../lib/queries/get-photos';
import { useRestorations } from '../../features/restorations/api/get-restorations';
import { OWNER_COLUMN_SIZES } from '../../lib/photo-sources';

/** A query's loading and error states, else what its data draws. */
function Loaded<T>({
  query,
  label,
  children,
}: {
  query: UseQueryResult<T>;
  label: string;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <Loading label={label} />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => query.refetch()} />;
  return children(query.data);
}

function SetCard({ set, to }: { set: Restoration; to: string }) {
  const photos = usePhotos(set.id);
  return <OwnerSetCard restoration={set} hero={heroPhoto(photos.data ?? [])} to={to} />;
}

function SetPage({ set }: { set: Restoration }) {
  const photos = usePhotos(set.id);
  const findings = useRestorationFindings(set.id);
  // Owners receive only shared photos; the filter keeps this page owner-facing whatever the list holds.
  const shared = (photos.data ?? []).filter((p) => p.ownerVisible);
  const pairs = suggestPairs(shared);
  return (
    <OwnerSet
      restoration={set}
      hero={heroPhoto(shared)}
      comparisons={
        photos.isSuccess && pairs.length === 0 ? null : (
          <Loaded query={photos} label="Fetching the photos…">
            {() => (
              <div className="space-y-8">
                {pairs.map((pair) => (
                  <BeforeAfter
                    key={`${pair.before.id}-${pair.after.id}`}
                    before={pair.before}
                    after={pair.after}
                    sizes={OWNER_COLUMN_SIZES}
                  />
                ))}
              </div>
            )}
          </Loaded>
        )
      }
      repairs={
        <Loaded query={findings} label="Fetching the repairs…">
          {(list) => <RepairedFindings findings={repairedFindings(list.filter((f) => f.ownerVisible))} />}
        </Loaded>
      }
      timeline={<Timeline restorationId={set.id} />}
      payments={<PaymentsPanel restorationId={set.id} role="owner" />}
    />
  );
}

/** The owner's home (/home): calm and read-only, their sets' pictures, progress, repairs, history and report. */
export function OwnerHomeRoute() {
  const me = useMe();
  const restorations = useRestorations();
  const selectedId = Number(useSearchParams()[0].get('set')) || undefined;
  return (
    <Loaded query={restorations} label="Fetching your sets…">
      {(list) => (
        <OwnerHome
          name={me.data?.name}
          sets={list.filter((r) => r.role === 'owner')}
          selectedId={selectedId}
          renderSet={(set) => <SetPage key={set.id} set={set} />}
          renderCard={(set, to) => <SetCard set={set} to={to} />}
        />
      )}
    </Loaded>
  );
}
