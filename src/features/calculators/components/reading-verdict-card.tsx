import { useState } from 'react';
import { BenchInputError, formatQuantity, readingVerdict } from '../../../../shared/bench';
import { useQuantity } from '../hooks/use-quantity';
import { formatDifference, formatPercent } from '../../../lib/format';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { readTolerance } from '../lib/read-tolerance';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { TextInput } from './text-input';
import { VerdictMark } from './verdict-mark';

/** readingVerdict: a bench reading against the service manual's value and tolerance. */
export function ReadingVerdictCard() {
  const expected = useQuantity('180 V', undefined, { allowNegative: true });
  const reading = useQuantity('189 V', undefined, { allowNegative: true });
  const [toleranceText, setToleranceText] = useState('10');
  const tolerance = readTolerance(toleranceText);
  const outcome = calculate(
    [expected.value, reading.value, tolerance.tolerance, tolerance.display],
    ([expectedValue, readValue, band, bandText]) => {
      const written = [expected.unit, reading.unit].filter((u) => u !== undefined && u !== '');
      const unit = written[0] ?? '';
      if (written.some((u) => u !== unit)) {
        throw new BenchInputError(
          `The expected value is in ${expected.unit} but the reading is in ${reading.unit}: compare like with like.`,
        );
      }
      const result = readingVerdict({ expected: expectedValue, reading: readValue, tolerance: band });
      return {
        ...result,
        deviation: formatPercent(result.deviation, true),
        difference: formatDifference(readValue - expectedValue, unit),
        reading: formatQuantity(readValue, unit),
        band: bandText,
      };
    },
  );
  return (
    <CalculatorCard
      title="Reading against the manual"
      description="A bench reading judged against the service manual’s value and tolerance."
      formula="deviation = (reading − expected) ÷ expected; within the band ✓, up to 1.5 × the band ◐, beyond ✕"
      source="Gridleak’s verdict rule, as stored with every measurement"
    >
      <CardFields>
        <QuantityInput label="Expected (manual)" field={expected} placeholder="e.g. 180 V, 2k2" />
        <TextInput
          label="Tolerance (%)"
          value={toleranceText}
          onChange={setToleranceText}
          placeholder="e.g. 10, −20/+50, K"
          error={tolerance.error}
        />
        <QuantityInput label="Your reading" field={reading} placeholder="e.g. 189 V" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Fill in the expected value, the tolerance and your reading."
        invalid={anyInvalid(expected, reading, tolerance)}
      >
        {(r) => (
          <>
            <VerdictMark verdict={r.verdict} />
            <MainResult label="Deviation" value={r.deviation} />
            <ResultList>
              <ResultLine label="Reading">{r.reading}</ResultLine>
              <ResultLine label="Difference">{r.difference}</ResultLine>
              <ResultLine label="Tolerance">{r.band}</ResultLine>
            </ResultList>
            {r.verdict === 'marginal' && (
              <ResultNote>Marginal: read again and allow for the meter before condemning the part.</ResultNote>
            )}
            <ResultNote>
              Check which meter the voltage chart was made with: a modern high-resistance meter can read anodes and
              screens higher than the chart (see Meter loading).
            </ResultNote>
          </>
        )}
      </ResultPanel>
    </CalculatorCard>
  );
}
