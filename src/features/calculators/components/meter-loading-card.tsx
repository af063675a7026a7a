import { useId, useState } from 'react';
import { formatQuantity, meterCorrection, readingVerdict, DEFAULT_TOLERANCE } from '../../../../shared/bench';
import type { MeterSpec } from '../../../../shared/bench';
import { inputClass } from '../../../components/field';
import { useQuantity } from '../hooks/use-quantity';
import { calculate } from '../lib/outcome';
import { anyInvalid } from '../lib/read-quantity';
import { CalculatorCard, CardFields } from './calculator-card';
import { QuantityInput } from './quantity-input';
import { ResultPanel } from './result-panel';
import { MainResult, ResultLine, ResultList, ResultNote } from './result-line';
import { SafetyNote } from './safety-note';
import { VerdictMark } from './verdict-mark';

/** meterCorrection: what your meter should read where the service chart's meter read the chart's value. */
export function MeterLoadingCard() {
  const kindId = useId();
  const chartVolts = useQuantity('180 V', 'V');
  const source = useQuantity('100k', 'Ω');
  const chartSensitivity = useQuantity('1k');
  const chartRange = useQuantity('300 V', 'V');
  const [digital, setDigital] = useState(true);
  const yourInput = useQuantity('10M', 'Ω');
  const yourSensitivity = useQuantity('20k');
  const yourRange = useQuantity('300 V', 'V');
  const reading = useQuantity('', 'V');
  const yourMeter: MeterSpec | undefined = digital
    ? yourInput.value === undefined
      ? undefined
      : { inputOhms: yourInput.value }
    : yourSensitivity.value === undefined || yourRange.value === undefined
      ? undefined
      : { ohmsPerVolt: yourSensitivity.value, rangeVolts: yourRange.value };
  const outcome = calculate(
    [chartVolts.value, source.value, chartSensitivity.value, chartRange.value, yourMeter],
    ([volts, ohms, perVolt, range, meter]) => {
      const c = meterCorrection({
        chartVolts: volts,
        sourceOhms: ohms,
        chartMeter: { ohmsPerVolt: perVolt, rangeVolts: range },
        yourMeter: meter,
      });
      const verdict =
        reading.value === undefined
          ? undefined
          : readingVerdict({ expected: c.expectedOnYourMeter, reading: reading.value, tolerance: DEFAULT_TOLERANCE });
      return {
        ...c,
        expected: formatQuantity(c.expectedOnYourMeter, 'V'),
        open: formatQuantity(c.openCircuitVolts, 'V'),
        chartOhms: formatQuantity(c.chartMeterOhms, 'Ω'),
        yourOhms: formatQuantity(c.yourMeterOhms, 'Ω'),
        verdict: verdict?.verdict,
      };
    },
  );
  return (
    <CalculatorCard
      title="Meter loading"
      description="Service charts were measured with a stated meter; yours loads the point differently."
      formula="R_meter = Ω/V × range; V_open = V_chart × (R_s + R_chart) ÷ R_chart; V_yours = V_open × R_yours ÷ (R_s + R_yours)"
      source="Voltage-divider (Thévenin) formula, as in textbook worked examples of voltmeter loading"
    >
      <CardFields>
        <QuantityInput label="Chart says (V)" field={chartVolts} placeholder="e.g. 180 V" />
        <QuantityInput label="Source resistance there (Ω)" field={source} placeholder="e.g. 100k anode load" />
        <QuantityInput label="Chart’s meter (Ω/V)" field={chartSensitivity} placeholder="e.g. 1k" />
        <QuantityInput label="Chart’s meter range (V)" field={chartRange} placeholder="e.g. 300 V" />
      </CardFields>
      <div className="space-y-1">
        <label htmlFor={kindId} className="block font-semibold">
          Your meter
        </label>
        <select
          id={kindId}
          value={digital ? 'digital' : 'analogue'}
          onChange={(e) => setDigital(e.target.value === 'digital')}
          className={inputClass}
        >
          <option value="digital">Digital (fixed input resistance)</option>
          <option value="analogue">Analogue (ohms per volt)</option>
        </select>
      </div>
      <CardFields>
        {digital ? (
          <QuantityInput label="Your meter’s input (Ω)" field={yourInput} placeholder="e.g. 10M" />
        ) : (
          <>
            <QuantityInput label="Your meter (Ω/V)" field={yourSensitivity} placeholder="e.g. 20k" />
            <QuantityInput label="Your meter’s range (V)" field={yourRange} placeholder="e.g. 300 V" />
          </>
        )}
        <QuantityInput label="Your reading (V), optional" field={reading} placeholder="e.g. 236 V" />
      </CardFields>
      <ResultPanel
        outcome={outcome}
        waiting="Fill in the chart’s value and meter, the source resistance and your meter."
        invalid={anyInvalid(
          chartVolts,
          source,
          chartSensitivity,
          chartRange,
          yourInput,
          yourSensitivity,
          yourRange,
          reading,
        )}
      >
        {(r) => (
          <>
            <MainResult label="Your meter should read" value={r.expected} />
            <p className="text-sm">{r.words}</p>
            {r.verdict && <VerdictMark verdict={r.verdict} />}
            <ResultList>
              <ResultLine label="With no meter at all">{r.open}</ResultLine>
              <ResultLine label="Chart’s meter">{r.chartOhms}</ResultLine>
              <ResultLine label="Your meter">{r.yourOhms}</ResultLine>
            </ResultList>
            {r.verdict && (
              <ResultNote>
                Your reading is judged against what your meter should read, ±20 % (common practice for service charts).
              </ResultNote>
            )}
          </>
        )}
      </ResultPanel>
      <SafetyNote>
        <p>
          Clip the meter on with the set off and its capacitors discharged, then power up; keep one hand away from the
          chassis.
        </p>
      </SafetyNote>
    </CalculatorCard>
  );
}
