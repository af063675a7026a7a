import { useState } from 'react';
import { useNavigate } from 'react-router';
import { firstWithComponentRef } from '../../../../shared/natural-order';
import { findingPath, type Finding } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { ReferenceFindingNotice } from '../../../components/reference-finding-notice';
import type { NewMark } from '../../../lib/new-mark';
import { useCreateReferenceMark } from '../api/reference-marks';
import { refOf } from '../../../lib/reference-path';

interface Props {
  restorationId: number;
  photoId: number;
  /** The reference typed in the new finding. */
  typed: string;
  /** The mark drawn for the new finding. */
  mark: NewMark;
  /** The new finding is dropped once the view is attached to the existing one. */
  onAttached: () => void;
}

/** The drawn mark as a location mark: a box stays a box; any other shape becomes a pin at its first point. */
const asLocation = (mark: NewMark) =>
  mark.shape === 'rect'
    ? { shape: 'rect' as const, points: mark.points.slice(0, 2) }
    : { shape: 'pin' as const, points: mark.points.slice(0, 1) };

/**
 * The new finding's one notice when the reference typed already has a finding: a link to the first one and the
 * offer to attach this view of the part to it as a location mark instead of opening a second finding.
 */
export function DuplicateFindingOffer({ restorationId, photoId, typed, mark, onAttached }: Props) {
  const ref = refOf(typed);
  const findings = useRestorationFindings(restorationId);
  const create = useCreateReferenceMark(restorationId);
  const navigate = useNavigate();
  const [error, setError] = useState('');
  const existing = findings.data ? firstWithComponentRef(findings.data, typed) : undefined;
  if (!existing || !ref) return null;
  const attach = async (to: Finding, as: string) => {
    setError('');
    try {
      await create.mutateAsync({ photoId, ref: as, ...asLocation(mark) });
      onAttached();
      navigate(findingPath(to));
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The view was not attached.');
    }
  };
  return (
    <ReferenceFindingNotice first={existing}>
      <p>Attach this view of {ref} to it as a location mark instead of opening a second finding?</p>
      <button
        type="button"
        className={buttonClass('quiet')}
        onClick={() => void attach(existing, ref)}
        disabled={create.isPending}
      >
        {create.isPending ? 'Attaching…' : `Attach to #${existing.number}`}
      </button>
      {error && (
        <p role="alert" className="text-danger">
          {error}
        </p>
      )}
    </ReferenceFindingNotice>
  );
}
