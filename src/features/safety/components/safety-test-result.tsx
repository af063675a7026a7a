import { equipmentClassLabels, formatQuantity } from '../../../../shared/bench';
import { specificationLabels, type SafetyLineView, type SafetyTest } from '../../../../shared/schemas/safety';
import { formatDateTime as when } from '../../../lib/format';

const verdictStyle: Record<SafetyLineView['verdict'], { text: string; className: string }> = {
  pass: { text: 'Pass', className: 'text-ok' },
  fail: { text: 'Fail', className: 'font-bold text-danger' },
  'not-applicable': { text: 'Not applicable', className: 'text-ink-soft' },
  'not-measured': { text: 'Not measured', className: 'text-ink-soft' },
};

/** One recorded test: each line with the value, its limit and the source of the limit, and the verdict. */
export function SafetyTestResult({ test, heading }: { test: SafetyTest; heading: string }) {
  const passed = test.verdict === 'pass';
  return (
    <section
      aria-label={heading}
      className="space-y-2 rounded-xl border border-rule bg-panel p-4"
      data-testid="safety-test-result"
    >
      <div className="flex flex-wrap items-baseline gap-2">
        <h3 className="text-lg font-bold">{heading}</h3>
        <span
          className={`rounded-full px-3 py-0.5 text-sm font-bold ${passed ? 'bg-ok/15 text-ok' : 'bg-danger-soft text-danger'}`}
        >
          {passed ? 'Passed' : 'Not passed'}
        </span>
      </div>
      <p className="text-sm text-ink-soft">
        <time dateTime={test.testedAt}>{when(test.testedAt)}</time>
        {test.testedBy && <> · {test.testedBy}</>} · {equipmentClassLabels[test.equipmentClass]}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className="py-1 pr-3 font-semibold">
                Check
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Reading
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Limit
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Verdict
              </th>
              <th scope="col" className="py-1 font-semibold">
                Source of the limit
              </th>
            </tr>
          </thead>
          <tbody>
            {test.lines.map((l) => (
              <tr key={l.key} className="border-b border-rule/60 align-top">
                <th scope="row" className="py-1 pr-3 font-normal">
                  {l.label}
                </th>
                <td className="py-1 pr-3 font-mono">
                  {l.value === null || l.unit === '' ? '—' : formatQuantity(l.value, l.unit)}
                </td>
                <td className="py-1 pr-3 font-mono">{l.limitText}</td>
                <td className={`py-1 pr-3 ${verdictStyle[l.verdict].className}`}>{verdictStyle[l.verdict].text}</td>
                <td className="py-1 text-ink-soft">{l.source}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-sm">
        {specificationLabels[test.specification]}
        {test.modifications && `: ${test.modifications}`}
      </p>
      {test.notes && <p className="text-sm text-ink-soft">{test.notes}</p>}
    </section>
  );
}
