import { useState } from 'react';
import { useNavigate } from 'react-router';
import { findingPath } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
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
  mark.shape === 'rect' ? { shape: 'rect' as const, points: mark.points.slice(0, 2) } : { shape: 'pin' as const, points: mark.points.slice(0, 1) };

/**
 * When the reference typed for a new finding already has a finding, offers to attach this view of the part to
 * it as a location mark instead of opening a second finding for the same part.
 */
export function DuplicateFindingOffer({ restorationId, photoId, typed, mark, onAttached }: Props) {
  const ref = refOf(typed);
  const findings = useRestorationFindings(restorationId);
  const create = useCreateReferenceMark(restorationId);
  const navigate = useNavigate();
  const [error, setError] = useState('');
  const existing = ref ? findings.data?.find((f) => refOf(f.componentRef) === ref) : undefined;
  if (!ref || !existing) return null;
  const attach = async () => {
    setError('');
    try {
      await create.mutateAsync({ photoId, ref, ...asLocation(mark) });
      onAttached();
      navigate(findingPath(existing));
    } catch (err) {
      setError(err instanceof Error ? err.message : 'The view was not attached.');
    }
  };
  return (
    <div className="space-y-2 rounded-lg border border-glow bg-sunken p-3 text-sm" role="group" aria-label={`${ref} already has a finding`}>
      <p>
        {ref} already has finding #{existing.number} “{existing.title}”. Attach this view of {ref} to it as a location mark instead of opening a second finding?
      </p>
      <button type="button" className={buttonClass('quiet')} onClick={() => void attach()} disabled={create.isPending}>
        {create.isPending ? 'Attaching…' : `Attach to #${existing.number}`}
      </button>
      {error && <p role="alert" className="text-danger">{error}</p>}
    </div>
  );
}
