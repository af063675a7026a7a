import { useQuery } from '@tanstack/react-query';
import { viewLabels } from '../../../shared/schemas/photos';
import { BringupTab } from '../../features/bringup/components/bringup-tab';
import { restorationFindingsQueryOptions } from '../../lib/queries/get-restoration-findings';
import { photosQueryOptions } from '../../lib/queries/get-photos';
import { useRestorationContext } from '../restoration-context';

/** The Bring-up tab: its checklists link to the restoration's own findings and photos. */
export function BringupRoute() {
  const r = useRestorationContext();
  const findings = useQuery(restorationFindingsQueryOptions(r.id));
  const photos = useQuery(photosQueryOptions(r.id));
  return (
    <BringupTab
      restorationId={r.id}
      role={r.role}
      liveChassis={r.liveChassis}
      findings={findings.data?.map((f) => ({ id: f.id, number: f.number, title: f.title }))}
      photos={photos.data?.map((p) => ({
        id: p.id,
        label: `${viewLabels[p.view]}${p.caption ? ` — ${p.caption}` : ''}`,
        thumbUrl: p.urls.thumb,
      }))}
    />
  );
}
