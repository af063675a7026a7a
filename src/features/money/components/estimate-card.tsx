import type { Estimate } from '../../../../shared/schemas/estimates';
import { estimateExtraLabels } from '../../../../shared/schemas/estimates';
import { taxRoundingLabels } from '../../../../shared/money/tax';
import { Button } from '../../../components/button';
import { useSendEstimate } from '../api/estimates';
import { EstimateDecision } from './estimate-decision';
import { hoursText, moneyText, rangeText } from './money-text';
import { formatDateTime } from '../../../lib/format';

/** One version of an estimate: its range, its lines, and where it stands (draft, sent, approved, declined). */
export function EstimateCard({
  restorationId,
  estimate: e,
  latest,
  canEdit,
  canDecide,
}: {
  restorationId: number;
  estimate: Estimate;
  latest: boolean;
  canEdit: boolean;
  canDecide: boolean;
}) {
  const send = useSendEstimate(restorationId);
  const headingId = `estimate-${e.id}`;
  return (
    <section
      aria-labelledby={headingId}
      className={`space-y-3 rounded-xl border p-4 ${latest ? 'border-glow bg-panel' : 'border-rule bg-sunken'}`}
    >
      <header className="flex flex-wrap items-baseline gap-3">
        <h3 id={headingId} className="text-lg font-bold">
          Estimate, version {e.version}
          {latest ? '' : ' (earlier)'}
        </h3>
        <p className="font-mono text-lg">{rangeText(e.low, e.high)}</p>
        <p className="text-sm text-ink-soft">
          {e.tax ? `including ${e.tax.name} at ${e.tax.rateBasisPoints / 100}%` : 'no tax charged'}
        </p>
      </header>
      {e.note && <p>{e.note}</p>}
      <table className="w-full text-left">
        <caption className="sr-only">Lines of version {e.version}</caption>
        <thead>
          <tr className="border-b border-rule text-sm text-ink-soft">
            <th scope="col">Line</th>
            <th scope="col">Detail</th>
            <th scope="col" className="text-right">
              Low – high (before tax)
            </th>
          </tr>
        </thead>
        <tbody>
          {e.lines.map((l) => (
            <tr key={l.id} className="border-b border-rule/60">
              <td className="py-1">{l.description}</td>
              <td className="py-1 text-sm text-ink-soft">
                {l.kind === 'labour' &&
                  `${hoursText(l.minutesLow ?? 0)} – ${hoursText(l.minutesHigh ?? 0)} at ${moneyText(e.labourRate)}/h`}
                {l.kind === 'part' && 'Parts expected'}
                {l.kind === 'extra' && l.extra && `Extra: ${estimateExtraLabels[l.extra]}`}
              </td>
              <td className="py-1 text-right font-mono">{rangeText(l.low, l.high)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {e.tax && (
        <p className="text-sm text-ink-soft">
          {e.tax.name}: {taxRoundingLabels[e.tax.rounding].toLowerCase()}.
        </p>
      )}
      <p className="text-sm">
        {!e.sent
          ? 'Draft: not yet sent to the owner.'
          : e.decision
            ? `${e.decision === 'approved' ? 'Approved' : 'Declined'} by ${e.decidedByName} on ${formatDateTime(e.decidedAt!)}.`
            : `Sent ${e.sentAt ? formatDateTime(e.sentAt) : ''}; waiting for the owner's answer.`}
      </p>
      {canEdit && !e.sent && (
        <div className="space-y-1">
          <Button onClick={() => send.mutate(e.id)} disabled={send.isPending}>
            {send.isPending ? 'Sending…' : 'Send to the owner'}
          </Button>
          {send.isError && (
            <p role="alert" className="font-semibold text-danger">
              {send.error.message}
            </p>
          )}
        </div>
      )}
      {canDecide && latest && e.sent && !e.decision && <EstimateDecision restorationId={restorationId} estimate={e} />}
    </section>
  );
}
