import { describe, expect, it } from 'vitest';
import { expectRelative } from './bench-test-support';
import { measurementVerdict, type MeasurementInput } from './measurement-verdict';
import { applicableFields, applicableTexts, limitOf, outHeadings } from './reading-kind-rules';
import { measuredQuantities, readingKinds, type MeasuredQuantity } from './reading-kinds';

describe('readingKinds', () => {
  it('when the kinds are listed, then each has exactly one descriptor, in the order the forms offer them', () => {
    expect(Object.keys(readingKinds)).toEqual([...measuredQuantities]);
  });

  it.each(measuredQuantities)(
    'when %s is described, then it has a label, an SI unit, a rule, a sign rule and the form’s words',
    (q) => {
      const kind = readingKinds[q];
      expect(kind.label).not.toBe('');
      expect(kind.noun).toMatch(/^an? /);
      expect(['Ω', 'F', 'A', 'V', 'Hz']).toContain(kind.unit);
      expect(['band', 'capacitor-limit', 'minimum', 'maximum']).toContain(kind.rule.type);
      expect(['not-negative', 'any']).toContain(kind.sign.reading);
      expect(['above-zero', 'any']).toContain(kind.sign.expected);
      expect(kind.form.expectedLabel).not.toBe('');
      expect(kind.form.readingPlaceholder).toMatch(/^e\.g\. /);
      expect(kind.form.methodHint).not.toBe('');
      // A tolerance field is shown only for a band, and then it says what blank means.
      expect(applicableFields(q).tolerance).toBe(kind.rule.type === 'band');
      if (kind.rule.type === 'band') expect(kind.form.toleranceHint).toMatch(/blank for/);
      else expect(kind.form.toleranceHint).toBeUndefined();
    },
  );
});

// One reading of each kind, each from the verdict tests' sources, judged by the rule its descriptor names.
const examples: Record<MeasuredQuantity, { input: MeasurementInput; reference: number; verdict: string }> = {
  // Worst-case ESR chart for new electrolytics, 100 kHz, 20 °C (glodark.com/design/esrchart.htm): 47 µF, 250 V column = 0.8 Ω
  esr: {
    input: { quantity: 'esr', expected: '47µ', rating: '450 V', reading: '0.6 Ω' },
    reference: 0.8,
    verdict: 'within',
  },
  // General-purpose radial series datasheet rule: 0.01 × 22 µF × 25 V = 5.5 µA (by hand)
  leakage: {
    input: { quantity: 'leakage', expected: '22u', rating: '25V', reading: '4u' },
    reference: 5.5e-6,
    verdict: 'within',
  },
  // In-service inspection code of practice: Class I insulation at least 1 MΩ at 500 V DC, used when none is given
  insulation: { input: { quantity: 'insulation', reading: '400k' }, reference: 1e6, verdict: 'out' },
  // IEC 60062 letter S (−20/+50 %) for an electrolytic with no tolerance typed: 65 µF for 47 µF is +38.3 % (by hand)
  capacitance: {
    input: { quantity: 'capacitance', expected: '47u', reading: '65u' },
    reference: 47e-6,
    verdict: 'within',
  },
  // IEC 60062 letter J = ±5 %: 2.35 kΩ for 2k2 is +6.8 % (by hand), inside 1.5 × the band
  resistance: {
    input: { quantity: 'resistance', expected: '2k2', tolerance: 'J', reading: '2.35k' },
    reference: 2200,
    verdict: 'marginal',
  },
  // common practice, no source: ±20 % on service charts; 290 V for 250 V is +16 % (by hand)
  'dc-voltage': {
    input: { quantity: 'dc-voltage', expected: '250', reading: '290 V' },
    reference: 250,
    verdict: 'within',
  },
  // common practice, no source: ±20 % on service charts; 6.2 V for a 6.3 V heater is −1.6 % (by hand)
  'ac-voltage': {
    input: { quantity: 'ac-voltage', expected: '6.3', reading: '6.2' },
    reference: 6.3,
    verdict: 'within',
  },
  // common practice, no source: ±20 % when the manual gives none; 57 mA for 52 mA is +9.6 % (by hand)
  current: { input: { quantity: 'current', expected: '52m', reading: '57m' }, reference: 0.052, verdict: 'within' },
  // common practice, no source: an AM IF is set within about 2 kHz; 395 kHz for 470 kHz is out
  frequency: { input: { quantity: 'frequency', expected: '470k', reading: '395k' }, reference: 470e3, verdict: 'out' },
};

describe('the verdict follows the descriptor’s rule', () => {
  it.each(measuredQuantities)('when %s is judged, then it is judged against the kind of limit its rule names', (q) => {
    const { input, reference, verdict } = examples[q];
    const v = measurementVerdict(input);
    const rule = readingKinds[q].rule;
    expect(v.limit).toBe(rule.type === 'band' ? 'nominal' : rule.type === 'capacitor-limit' ? 'maximum' : rule.type);
    expect(v.limit).toBe(limitOf(q));
    expectRelative(v.reference!, reference);
    expect(v.verdict).toBe(verdict);
  });

  it('when a negative reading is typed, then only a kind whose sign rule allows it takes it', () => {
    for (const q of measuredQuantities) {
      const judge = () => measurementVerdict({ ...examples[q].input, reading: `-${examples[q].input.reading}` });
      if (readingKinds[q].sign.reading === 'not-negative')
        expect(judge, q).toThrow(new RegExp(`${readingKinds[q].noun} cannot be negative`));
      else expect(judge, q).not.toThrow();
    }
  });

  it('when a band is given "max" as its tolerance, then it is a limit; a rule of its own ignores the word', () => {
    // from memory: in-service inspection code of practice, earth continuity at most 0.1 Ω plus the lead
    expect(limitOf('resistance', 'max')).toBe('maximum');
    expect(limitOf('dc-voltage', 'min')).toBe('minimum');
    expect(limitOf('insulation', 'max')).toBe('minimum');
    expect(limitOf('esr', 'min')).toBe('maximum');
  });
});

describe('applicableTexts', () => {
  const leftOver = { tolerance: '10', rating: '350 V', chartMeter: '1k/V 250 V', meter: '10M', source: '100k' };
  it('when a kind does not use a field, then a value left from another kind is blanked', () => {
    expect(applicableTexts({ quantity: 'esr', ...leftOver })).toEqual({
      quantity: 'esr',
      tolerance: '',
      rating: '350 V',
      chartMeter: '',
      meter: '',
      source: '',
    });
    expect(applicableTexts({ quantity: 'dc-voltage', ...leftOver })).toEqual({
      quantity: 'dc-voltage',
      ...leftOver,
      rating: '',
    });
    expect(applicableTexts({ quantity: 'insulation', ...leftOver })).toEqual({
      quantity: 'insulation',
      tolerance: '',
      rating: '',
      chartMeter: '',
      meter: '',
      source: '',
    });
  });
});

describe('outHeadings', () => {
  it('when a reading is out, then the history names the kind of limit it missed', () => {
    expect(outHeadings[limitOf('dc-voltage')]).toBe('Out of tolerance');
    expect(outHeadings[limitOf('esr')]).toBe('Over its limit');
    expect(outHeadings[limitOf('insulation')]).toBe('Under its minimum');
  });
});
