import { stageLabels } from '../../../../shared/schemas/restorations';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { useRestorationFindings } from '../../../lib/queries/get-restoration-findings';
import { useLabour } from '../api/labour';
import { LabourEntryForm } from './labour-entry-form';
import { LabourTimer } from './labour-timer';
import { hoursText } from './money-text';
import { formatMediumDate } from '../../../lib/format';

const day = (iso: string) => formatMediumDate(iso);

/** The labour log on the Money tab: the reader's timer, typed hours, every entry and this week's totals. */
export function LabourLog({ restorationId }: { restorationId: number }) {
  const log = useLabour(restorationId);
  const findings = useRestorationFindings(restorationId);
  if (log.isPending) return <Loading label="Fetching the labour log…" />;
  if (log.isError) return <ErrorState error={log.error} onRetry={() => log.refetch()} />;
  const { entries, running, week } = log.data;
  const findingName = (id: number) => {
    const f = findings.data?.find((x) => x.id === id);
    return f ? `#${f.number} ${f.title}` : 'A finding';
  };
  return (
    <section aria-labelledby="labour-heading" className="space-y-3">
      <h2 id="labour-heading" className="text-xl font-bold">
        Labour
      </h2>
      <LabourTimer restorationId={restorationId} running={running} />
      <LabourEntryForm restorationId={restorationId} />
      <div>
        <h3 className="font-semibold">This week, from Monday</h3>
        {week.length === 0 ? (
          <p className="text-sm text-ink-soft">No time logged on this set this week.</p>
        ) : (
          <ul className="flex flex-wrap gap-3">
            {week.map((w) => (
              <li key={w.technician ?? 'former'} className="rounded-lg bg-sunken px-3 py-1">
                <span className="font-semibold">{w.technician ?? 'A former member'}</span>: {hoursText(w.minutes)} (
                {hoursText(w.billableMinutes)} billable)
              </li>
            ))}
          </ul>
        )}
      </div>
      {entries.filter((e) => e.minutes !== null).length === 0 ? (
        <EmptyState title="No time logged yet">Start the timer at the bench, or type the hours afterwards.</EmptyState>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left">
            <caption className="sr-only">Time entries, newest first</caption>
            <thead>
              <tr className="border-b border-rule text-sm text-ink-soft">
                <th scope="col">Day</th>
                <th scope="col">Technician</th>
                <th scope="col">For</th>
                <th scope="col">Note</th>
                <th scope="col" className="text-right">
                  Hours
                </th>
              </tr>
            </thead>
            <tbody>
              {entries
                .filter((e) => e.minutes !== null)
                .map((e) => (
                  <tr key={e.id} className="border-b border-rule/60">
                    <td className="py-1">{day(e.startedAt)}</td>
                    <td className="py-1">{e.technician ?? 'A former member'}</td>
                    <td className="py-1">
                      {e.stage ? stageLabels[e.stage] : e.findingId ? findingName(e.findingId) : ''}
                    </td>
                    <td className="py-1">
                      {e.note}
                      {e.billable ? '' : <span className="ml-1 text-sm text-ink-soft">(not billable)</span>}
                    </td>
                    <td className="py-1 text-right font-mono">{hoursText(e.minutes!)}</td>
                  </tr>
                ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
