import { can } from '../../../shared/permissions';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { useSheetPages } from '../../features/sheets/api/get-sheet-pages';
import { ChassisPhotoPicker } from '../../features/sheets/components/chassis-photo-picker';
import { ReferenceTable } from '../../features/sheets/components/reference-table';
import { SheetPageList } from '../../features/sheets/components/sheet-page-list';
import { SheetUploader } from '../../features/sheets/components/sheet-uploader';
import { useRestorationContext } from '../restoration-context';

/** The service sheet: its pages, adding a page, and every reference known in the restoration. */
export function SheetsRoute() {
  const r = useRestorationContext();
  const pages = useSheetPages(r.id);
  return (
    <section className="space-y-6" aria-labelledby="sheets-heading">
      <h2 id="sheets-heading" className="text-xl font-bold">
        Service sheet
      </h2>
      {can(r.role, 'sheets.upload') && <SheetUploader restorationId={r.id} />}
      {pages.isPending ? (
        <Loading label="Fetching the service sheet…" />
      ) : pages.isError ? (
        <ErrorState error={pages.error} onRetry={() => pages.refetch()} />
      ) : pages.data.length === 0 ? (
        <EmptyState title="No service sheet pages yet">
          {can(r.role, 'sheets.upload')
            ? 'Add the circuit diagram and the layout page above.'
            : 'Nothing from the service sheet has been shared with you yet.'}
        </EmptyState>
      ) : (
        <SheetPageList restorationId={r.id} pages={pages.data} />
      )}
      {can(r.role, 'references.mark') && <ChassisPhotoPicker restorationId={r.id} />}
      <ReferenceTable restorationId={r.id} />
    </section>
  );
}
