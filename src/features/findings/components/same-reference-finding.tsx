import { firstWithComponentRef } from '../../../../shared/natural-order';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { ReferenceFindingNotice } from '../../../components/reference-finding-notice';

/**
 * Points out that another finding of this restoration already names the reference, with a link to the first
 * one (`exceptId`: the finding being edited). Says nothing until the list is here.
 */
export function SameReferenceFinding({
  restorationId,
  componentRef,
  exceptId,
}: {
  restorationId: number;
  componentRef: string;
  exceptId?: number;
}) {
  const findings = useRestorationFindings(restorationId);
  const first = findings.data ? firstWithComponentRef(findings.data, componentRef, exceptId) : undefined;
  return first ? <ReferenceFindingNotice first={first} /> : null;
}
