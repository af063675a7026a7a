import { Fragment } from 'react';
import { formatDeviation } from '../lib/measurement-format';
import { groupPoints, voltsText, type VoltagePoint } from '../lib/voltage-points';
import { VerdictBadge } from '../../../components/verdict-badge';

const cell = 'px-3 py-1.5 align-top';
const heads = ['Point', 'Expected', 'Tolerance', 'Reading', 'Deviation', 'Verdict'];

/** The voltage chart as a table, grouped by valve: the plot's equivalent for reading aloud or copying down. */
export function VoltageTable({ points }: { points: VoltagePoint[] }) {
  return (
    <div className="overflow-x-auto rounded-xl border border-rule bg-panel">
      <table className="w-full min-w-[36rem] border-collapse text-left" aria-label="Voltage chart">
        <thead className="bg-sunken text-sm">
          <tr>
            {heads.map((h) => (
              <th key={h} scope="col" className="px-3 py-2 font-semibold">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        {groupPoints(points).map(({ group, points: list }) => (
          <Fragment key={group}>
            <tbody>
              <tr className="border-t-2 border-rule bg-paper">
                <th scope="rowgroup" colSpan={heads.length} className="px-3 py-1 text-sm font-bold">
                  {group}
                </th>
              </tr>
              {list.map((p) => (
                <tr key={p.id} className="border-t border-rule" data-verdict={p.verdict}>
                  <th scope="row" className={`${cell} font-semibold whitespace-nowrap`}>
                    {p.label}
                  </th>
                  <td className={`${cell} font-mono`}>{p.expected === null ? '—' : voltsText(p.expected)}</td>
                  <td className={`${cell} font-mono`}>{p.band || '—'}</td>
                  <td className={`${cell} font-mono`}>{voltsText(p.reading)}</td>
                  <td className={`${cell} font-mono whitespace-nowrap`}>
                    {formatDeviation(p.deviationPct === null ? null : p.deviationPct / 100)}
                  </td>
                  <td className={cell}>
                    <VerdictBadge verdict={p.verdict} reason={p.reason} />
                  </td>
                </tr>
              ))}
            </tbody>
          </Fragment>
        ))}
      </table>
    </div>
  );
}
