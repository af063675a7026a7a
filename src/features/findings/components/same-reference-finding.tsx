import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { ReferenceFindingNotice } from '../../../components/reference-finding-notice';
import { SameReferenceNotice, type SameReferenceProps } from '../../../components/same-reference-notice';
import { Link } from 'react-router';
import { findingPath } from '../../../../shared/schemas/findings';

/**
 * Points out that another finding of this restoration already names the reference, with a link to the first one:
 * as a notice while the reference is being typed, and as a quiet line once it is saved (`settled`), since a part may
 * well have two faults and a choice made on purpose should not be flagged for ever.
 */
export function SameReferenceFinding({
  restorationId,
  settled = false,
  ...reference
}: SameReferenceProps & { settled?: boolean }) {
  const findings = useRestorationFindings(restorationId);
  return (
    <SameReferenceNotice rows={findings.data} {...reference}>
      {(first) =>
        settled ? (
          <p className="text-sm text-ink-soft">
            Also on {first.componentRef.trim().toUpperCase()}:{' '}
            <Link to={findingPath(first)} className="font-semibold text-glow-strong underline">
              finding #{first.number}, “{first.title}”
            </Link>
          </p>
        ) : (
          <ReferenceFindingNotice first={first} />
        )
      }
    </SameReferenceNotice>
  );
}
