import { useMemo } from 'react';
import { FindingsTable } from '../../features/findings/components/findings-table';
import { photoLabels } from '../../features/findings/components/photo-labels';
import { usePhotos } from '../../lib/queries/get-photos';
import { useRestorationContext } from '../restoration-context';

/** The restoration's Findings tab: every mark on every photo, in one table. */
export function FindingsRoute() {
  const r = useRestorationContext();
  const photos = usePhotos(r.id);
  // Until the photos arrive the table names them "Photo 12"; it does not wait for them.
  const labels = useMemo(() => photoLabels(photos.data ?? []), [photos.data]);
  return (
    <section aria-labelledby="findings-heading" className="space-y-3">
      <h2 id="findings-heading" className="text-lg font-bold">
        Findings
      </h2>
      <FindingsTable restorationId={r.id} photos={labels} />
    </section>
  );
}
