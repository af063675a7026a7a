import { useMemo } from 'react';
import { ErrorState, Loading } from '../../components/states';
import { BeforeAfter } from '../../features/history/components/before-after';
import { PairPicker } from '../../features/history/components/pair-picker';
import { Timeline } from '../../features/history/components/timeline';
import { suggestPairs } from '../../features/history/lib/suggest-pairs';
import { usePhotos } from '../../lib/queries/get-photos';
import { useRestorationContext } from '../restoration-context';

/** The History tab: before/after pairs of each view, any two photos compared (not for owners), then the timeline. */
export function HistoryRoute() {
  const r = useRestorationContext();
  const photos = usePhotos(r.id);
  const pairs = useMemo(() => suggestPairs(photos.data ?? []), [photos.data]);
  return (
    <div className="space-y-10">
      <section aria-labelledby="before-after-heading" className="space-y-3">
        <h2 id="before-after-heading" className="text-lg font-bold">
          Before and after
        </h2>
        {photos.isPending ? (
          <Loading label="Fetching the photos…" />
        ) : photos.isError ? (
          <ErrorState error={photos.error} onRetry={() => photos.refetch()} />
        ) : pairs.length === 0 ? (
          <p className="text-ink-soft">A pair appears here once a view has both a “before” and an “after” photo.</p>
        ) : (
          <div className="grid gap-8 lg:grid-cols-2">
            {pairs.map((pair) => (
              <BeforeAfter key={`${pair.before.id}-${pair.after.id}`} before={pair.before} after={pair.after} />
            ))}
          </div>
        )}
      </section>
      {r.role !== 'owner' && photos.data && photos.data.length > 0 && (
        <section aria-labelledby="compare-heading" className="space-y-3">
          <h2 id="compare-heading" className="text-lg font-bold">
            Compare any two
          </h2>
          <PairPicker photos={photos.data} />
        </section>
      )}
      <section aria-labelledby="timeline-heading" className="space-y-3">
        <h2 id="timeline-heading" className="text-lg font-bold">
          Timeline
        </h2>
        <Timeline restorationId={r.id} />
      </section>
    </div>
  );
}
