import { esrLimitDetail, formatQuantity } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { esrVerdict } from '../lib/bench-advice';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { VerdictMark } from './verdict-mark';

const VERDICT_WORDS = {
  within: 'at or under the table’s figure.',
  marginal: 'above the table’s figure but under double it: measure again, and compare with a new part.',
  out: 'more than double the table’s figure: the table says to be wary of this part.',
} as const;

/** esrLimitDetail: the highest ESR a healthy new electrolytic should show, and a reading judged against it. */
export function EsrCard() {
  const capacitance = useQuantity('32µ', 'F');
  const rated = useQuantity('350 V', 'V');
  const reading = useQuantity('', 'Ω');
  const outcome = calculate([capacitance.value, rated.value], ([farads, volts]) => {
    const detail = esrLimitDetail(farads, volts);
    return { ...detail, limit: formatQuantity(detail.ohms, 'Ω'), hertz: formatQuantity(detail.testHertz, 'Hz') };
  });
  return (
    <CalculatorCard
      title="Expected ESR"
      description="The most a healthy new electrolytic should read on an ESR meter."
      formula="Table A by capacitance (1 µF to 10,000 µF) and rated voltage, log-log between rows and columns; edge value beyond the table"
      source="Table A, a widely circulated technicians’ table of worst-case ESR for new aluminium electrolytics (100 kHz, 20 °C)"
    >
      <CardFields>
        <QuantityInput label="Capacitance (F)" field={capacitance} placeholder="e.g. 32µ, 8 mfd, 100UF" />
        <QuantityInput label="Rated voltage (V)" field={rated} placeholder="e.g. 350 WV" />
      </CardFields>
      <QuantityInput
        label="Your reading (Ω), optional"
        field={reading}
        placeholder="e.g. 1.1"
        hint="Measure with the set unplugged and its capacitors discharged."
      />
      <ResultPanel
        outcome={outcome}
        waiting="Enter the capacitance and the rated voltage."
        invalid={anyInvalid(capacitance, rated)}
      >
        {(r) => {
          const verdict = reading.value === undefined ? undefined : esrVerdict(reading.value, r.ohms);
          return (
            <>
              <MainResult label="Expected at most" value={r.limit} />
              {verdict !== undefined && (
                <div className="space-y-1">
                  <VerdictMark verdict={verdict} />
                  <ResultNote>{`Your ${reading.display ?? 'reading'}: ${VERDICT_WORDS[verdict]}`}</ResultNote>
                </div>
              )}
              <ResultList>
                <ResultLine label="Meter frequency">{r.hertz}</ResultLine>
                <ResultLine label="Within the table">{r.extrapolated ? '◇ no: extrapolated' : '✓ yes'}</ResultLine>
              </ResultList>
              <ResultNote>{r.table}.</ResultNote>
              <ResultNote>{r.note}</ResultNote>
            </>
          );
        }}
      </ResultPanel>
    </CalculatorCard>
  );
}
