import { Link, useParams, useSearchParams } from 'react-router';
import { can } from '../../../shared/permissions';
import { ErrorState, Loading } from '../../components/states';
import { useRestorationFindings } from '../../lib/queries/get-restoration-findings';
import { usePhotos } from '../../lib/queries/get-photos';
import { useSheetPages } from '../../features/sheets/api/get-sheet-pages';
import { useMismatchNotes } from '../../features/sheets/api/mismatch-notes';
import { useReferenceMarks } from '../../features/sheets/api/reference-marks';
import { MismatchNotesPanel } from '../../features/sheets/components/mismatch-notes-panel';
import { ReferenceSideBySide } from '../../features/sheets/components/reference-side-by-side';
import type { ReferenceView } from '../../lib/reference-path';
import { useRestorationContext } from '../restoration-context';
import { WithMarkupCanvas } from './sheet-canvas-provider';

const idOf = (v: string | null) => (v && /^\d+$/.test(v) ? Number(v) : undefined);

/** One reference (R23): the diagram beside the chassis, zoomed onto it, with its mismatch notes. */
export function ReferenceRoute() {
  const r = useRestorationContext();
  const refName = (useParams().ref ?? '').toUpperCase();
  const [search] = useSearchParams();
  const first = search.get('first');
  const view: ReferenceView = {
    diagram: idOf(search.get('diagram')),
    chassis: idOf(search.get('chassis')),
    finding: idOf(search.get('finding')),
    first: first === 'chassis' || first === 'diagram' ? first : undefined,
  };
  const marks = useReferenceMarks(r.id);
  const pages = useSheetPages(r.id);
  const photos = usePhotos(r.id);
  const findings = useRestorationFindings(r.id);
  const notes = useMismatchNotes(r.id);
  const queries = [marks, pages, photos, findings, notes] as const;
  const failed = queries.find((q) => q.isError);
  return (
    <section className="space-y-4" aria-labelledby="reference-heading">
      <p>
        <Link to={`/restorations/${r.id}/sheets`} className="font-semibold text-glow-strong underline">
          Back to the service sheet
        </Link>
      </p>
      <h2 id="reference-heading" className="font-mono text-xl font-bold">
        {refName}
      </h2>
      {failed ? (
        <ErrorState error={failed.error} onRetry={() => queries.forEach((q) => void q.refetch())} />
      ) : !marks.data || !pages.data || !photos.data || !findings.data || !notes.data ? (
        <Loading label={`Finding ${refName} on the diagram and the chassis…`} />
      ) : (
        <>
          <WithMarkupCanvas>
            <ReferenceSideBySide
              restorationId={r.id}
              refName={refName}
              view={view}
              marks={marks.data}
              pages={pages.data}
              photos={photos.data}
              findings={findings.data}
              mismatches={notes.data.filter((n) => n.ref === refName)}
              canMark={can(r.role, 'references.mark')}
              onImageError={() => void Promise.all([pages.refetch(), photos.refetch()])}
            />
          </WithMarkupCanvas>
          <MismatchNotesPanel
            restorationId={r.id}
            refName={refName}
            notes={notes.data.filter((n) => n.ref === refName)}
            canEdit={can(r.role, 'references.mark')}
          />
        </>
      )}
    </section>
  );
}
