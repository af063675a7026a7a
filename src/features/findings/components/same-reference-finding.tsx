import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { ReferenceFindingNotice } from '../../../components/reference-finding-notice';
import { SameReferenceNotice, type SameReferenceProps } from '../../../components/same-reference-notice';

/** Points out that another finding of this restoration already names the reference, with a link to the first one. */
export function SameReferenceFinding({ restorationId, ...reference }: SameReferenceProps) {
  const findings = useRestorationFindings(restorationId);
  return (
    <SameReferenceNotice rows={findings.data} {...reference}>
      {(first) => <ReferenceFindingNotice first={first} />}
    </SameReferenceNotice>
  );
}
