import { OnTheDiagramLink } from '../../../components/on-the-diagram-link';
import { useState } from 'react';
import { readingKinds } from '../../../../shared/bench';
import type { Measurement } from '../../../../shared/schemas/measurements';
import { buttonClass } from '../../../components/button';
import { useDeleteMeasurement } from '../api/delete-measurement';
import { deviationWords, expectedSummary, formatWhen } from '../lib/measurement-format';
import { VerdictBadge } from '../../../components/verdict-badge';

const cell = 'px-3 py-2 align-top';
const small = `${buttonClass('quiet')} min-h-9 px-3 py-1 text-sm`;

/** One reading in the table; technicians can change or delete it (delete asks once more, in place). */
export function MeasurementRow({
  restorationId,
  m,
  canRecord,
  onEdit,
}: {
  restorationId: number;
  m: Measurement;
  canRecord: boolean;
  onEdit: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteMeasurement(restorationId);
  return (
    <tr className="border-t border-rule" data-verdict={m.verdict}>
      <th scope="row" className={`${cell} text-left font-semibold`}>
        {m.location} <OnTheDiagramLink restorationId={restorationId} text={m.location} />
        {m.ownerVisible && <span className="block text-xs font-normal text-ink-soft">shared with owner</span>}
      </th>
      <td className={cell}>{readingKinds[m.quantity].label}</td>
      <td className={`${cell} font-mono`}>{expectedSummary(m)}</td>
      <td className={`${cell} font-mono whitespace-nowrap`}>{m.readingText}</td>
      <td className={`${cell} font-mono`}>{deviationWords(m)}</td>
      <td className={cell}>
        <VerdictBadge verdict={m.verdict} reason={m.verdictReason} />
        <details className="mt-1 text-sm">
          <summary className="cursor-pointer text-ink-soft">Why</summary>
          <p className="max-w-xs">{m.verdictReason}</p>
        </details>
      </td>
      <td className={`${cell} text-sm`}>
        {m.powerOn && <p className="font-semibold">Set powered</p>}
        {m.conditions && <p>{m.conditions}</p>}
        {m.method && <p className="text-ink-soft">{m.method}</p>}
        {!m.conditions && !m.method && !m.powerOn && <span className="text-ink-soft">—</span>}
      </td>
      <td className={`${cell} text-sm whitespace-nowrap`}>
        <p>{m.measuredBy ?? 'Former member'}</p>
        <p className="text-ink-soft">
          <time dateTime={m.measuredAt}>{formatWhen(m.measuredAt)}</time>
        </p>
      </td>
      {canRecord && (
        <td className={cell}>
          {confirming ? (
            <div className="flex flex-col gap-1" role="group" aria-label={`Delete the reading at ${m.location}?`}>
              <button
                type="button"
                className={`${buttonClass('danger')} min-h-9 px-3 py-1 text-sm`}
                disabled={remove.isPending}
                onClick={() => remove.mutate(m.id, { onSuccess: () => setConfirming(false) })}
              >
                {remove.isPending ? 'Deleting…' : 'Delete it'}
              </button>
              <button type="button" className={small} onClick={() => setConfirming(false)}>
                Keep
              </button>
            </div>
          ) : (
            <div className="flex flex-col gap-1">
              <button
                type="button"
                className={small}
                onClick={onEdit}
                aria-label={`Change the reading at ${m.location}`}
              >
                Change
              </button>
              <button
                type="button"
                className={small}
                onClick={() => setConfirming(true)}
                aria-label={`Delete the reading at ${m.location}`}
              >
                Delete
              </button>
            </div>
          )}
          {remove.error && (
            <p role="alert" className="mt-1 text-sm font-semibold text-danger">
              {remove.error.message}
            </p>
          )}
        </td>
      )}
    </tr>
  );
}
