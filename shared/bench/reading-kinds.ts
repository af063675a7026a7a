import { frequencyTolerance } from './alignment';
import { esrLimitDetail } from './esr-limit';
import { leakageLimitDetail } from './leakage-limit';
import { formatQuantity } from './quantity-format';
import type { QuantityUnit } from './quantity-parse';
import type { Tolerance } from './reading-verdict';
import { formatTolerance } from '../format';

/** Every kind of reading, in the order the forms offer them (also the `measured_quantity` database enum). */
export const measuredQuantities = [
  'esr',
  'capacitance',
  'leakage',
  'resistance',
  'dc-voltage',
  'ac-voltage',
  'current',
  'insulation',
  'frequency',
] as const;
export type MeasuredQuantity = (typeof measuredQuantities)[number];

/** What a blank tolerance means for a band: a band in per cent, or (a frequency) an amount in the unit either side. */
export type UsualBand = ({ tolerance: Tolerance } | { amount: number }) & {
  /** Said in the verdict's reason, after the band. */
  words: string;
  /** Shown in the readings table beside the expected value ("−20/+50 % (electrolytic)"). */
  label: string;
};

/** How a kind of reading is judged. */
export type ReadingRule =
  /** About a nominal value within a tolerance band; "max" or "min" typed as the tolerance make the expected value a limit. */
  | {
      type: 'band';
      /** The band used when no tolerance is typed, for this expected value (SI; null when none could be read). */
      usual: (expected: number | null) => UsualBand;
      /** A part's marked tolerance may follow its value ("100n K", "47µ -20/+50"). */
      marked?: boolean;
      /** The tolerance is an amount in the unit ("2 kHz") unless a per cent is typed. */
      absolute?: boolean;
      /** Judged against what your meter should read where a chart taken with another meter says the figure. */
      meterLoading?: boolean;
    }
  /** At most a limit worked out from the capacitor's nominal capacitance (the expected field) and its rated voltage. */
  | { type: 'capacitor-limit'; limit: (farads: number, ratedVolts: number) => { value: number; source: string } }
  /** At least (or at most) the expected value, or the default when none is typed. */
  | { type: 'minimum' | 'maximum'; default?: { value: number; source: string } };

/** Which way a value may point: a size that cannot be negative, or a signed figure (a bias, a current either way). */
export interface SignRule {
  reading: 'not-negative' | 'any';
  expected: 'above-zero' | 'any';
  /** Why a minus was typed, when a reading may not have one; the usual causes when absent. */
  minusCause?: string;
}

/** How the reading form reads for a kind: labels, examples from the Cobbold Lane bench, and the caution it needs. */
export interface FormHints {
  expectedLabel: string;
  expectedPlaceholder: string;
  readingPlaceholder: string;
  /** What the tolerance field takes and what blank means (band kinds). */
  toleranceHint?: string;
  methodHint: string;
  /** Taken on a powered set (or with a test voltage applied): the live-readings caution applies. */
  live: boolean;
}

/** One kind of reading: everything the schema, the form, the tables, the history, the report and the verdict need. */
export interface ReadingKind {
  label: string;
  /** With its article, for messages ("an ESR cannot be negative"). */
  noun: string;
  /** The SI unit the reading is in. */
  unit: Exclude<QuantityUnit, ''>;
  rule: ReadingRule;
  sign: SignRule;
  form: FormHints;
  /** Where the hand-back report lists it: with the other readings, or as a safety check. */
  report: 'readings' | 'safety-checks';
}

/** ±20 %: the usual allowance on voltage charts and old carbon parts when the manual gives none (common practice, no source). */
export const DEFAULT_TOLERANCE = 0.2;
/** An electrolytic's usual tolerance, −20 %/+50 % (IEC 60062 letter S), used for capacitances of 1 µF and more when none is typed. */
const DEFAULT_ELECTROLYTIC_TOLERANCE = { minus: 0.2, plus: 0.5 } as const;
/** A minimum insulation resistance of 1 MΩ at 500 V DC (in-service testing code of practice, Class I), used when none is given. */
const DEFAULT_INSULATION_MIN = 1e6;

const plusMinus20 = (words: string) => (): UsualBand => ({
  tolerance: DEFAULT_TOLERANCE,
  words,
  label: `${formatTolerance(DEFAULT_TOLERANCE)} (usual)`,
});
const chartBand = plusMinus20('the usual allowance on service charts when the manual states none; common practice');
const toleranceForms = 'Per cent, a letter (J, K, M, Z), -20/+50, or max/min';
const usualHint = `${toleranceForms}; blank for the usual ±20 %`;
const positive: SignRule = { reading: 'not-negative', expected: 'above-zero' };
const manual = 'Expected (manual)';

/** A voltage read on a powered set against a service chart, allowing for the meter's loading. */
const chartVoltage = (
  label: string,
  noun: string,
  sign: SignRule,
  placeholders: { expected: string; reading: string },
): ReadingKind => ({
  label,
  noun,
  unit: 'V',
  sign,
  report: 'readings',
  rule: { type: 'band', meterLoading: true, usual: chartBand },
  form: {
    expectedLabel: manual,
    expectedPlaceholder: placeholders.expected,
    readingPlaceholder: placeholders.reading,
    toleranceHint: usualHint,
    methodHint: 'Meter and its Ω/V, e.g. DMM 10 MΩ or 20 kΩ/V',
    live: true,
  },
});

export const readingKinds: Record<MeasuredQuantity, ReadingKind> = {
  esr: {
    label: 'ESR',
    noun: 'an ESR',
    unit: 'Ω',
    sign: positive,
    report: 'readings',
    rule: {
      type: 'capacitor-limit',
      limit: (f, v) => {
        const d = esrLimitDetail(f, v);
        return { value: d.ohms, source: `${d.table}${d.extrapolated ? ' (extrapolated)' : ''}` };
      },
    },
    form: {
      expectedLabel: 'Nominal capacitance',
      expectedPlaceholder: 'e.g. 32µ',
      readingPlaceholder: 'e.g. 9.5 Ω',
      methodHint: 'Test frequency, e.g. 100 kHz',
      live: false,
    },
  },
  capacitance: {
    label: 'Capacitance',
    noun: 'a capacitance',
    unit: 'F',
    sign: positive,
    report: 'readings',
    rule: {
      type: 'band',
      marked: true,
      usual: (expected) =>
        expected !== null && expected >= 1e-6
          ? {
              tolerance: { ...DEFAULT_ELECTROLYTIC_TOLERANCE },
              words: 'the usual electrolytic tolerance, IEC 60062 letter S',
              label: `${formatTolerance(DEFAULT_ELECTROLYTIC_TOLERANCE)} (electrolytic)`,
            }
          : plusMinus20('usual allowance')(),
    },
    form: {
      expectedLabel: manual,
      expectedPlaceholder: 'e.g. 32µ, 22n',
      readingPlaceholder: 'e.g. 30µ',
      toleranceHint: `${toleranceForms}; blank for −20/+50 % from 1 µF up (electrolytic), else ±20 %`,
      methodHint: 'Meter and test frequency, e.g. LCR meter at 1 kHz; in or out of circuit',
      live: false,
    },
  },
  leakage: {
    label: 'Leakage current',
    noun: 'a leakage current',
    unit: 'A',
    sign: positive,
    report: 'safety-checks',
    rule: {
      type: 'capacitor-limit',
      limit: (f, v) => {
        const d = leakageLimitDetail(f, v);
        return { value: d.amps, source: d.rule };
      },
    },
    form: {
      expectedLabel: 'Nominal capacitance',
      expectedPlaceholder: 'e.g. 32µ',
      readingPlaceholder: 'e.g. 85 µA',
      methodHint: 'Time at rated voltage, e.g. 5 min',
      live: true,
    },
  },
  resistance: {
    label: 'Resistance',
    noun: 'a resistance',
    unit: 'Ω',
    sign: positive,
    report: 'readings',
    rule: { type: 'band', marked: true, usual: plusMinus20('usual allowance') },
    form: {
      expectedLabel: manual,
      expectedPlaceholder: 'e.g. 470k',
      readingPlaceholder: 'e.g. 1.3M',
      toleranceHint: usualHint,
      methodHint: 'Meter and range; in or out of circuit, set unplugged',
      live: false,
    },
  },
  'dc-voltage': chartVoltage(
    'DC voltage',
    'a DC voltage',
    { reading: 'any', expected: 'any' },
    { expected: 'e.g. 255 V', reading: 'e.g. 263 V' },
  ),
  // An AC meter reads a magnitude (RMS): a minus sign is a slip of the keyboard.
  'ac-voltage': chartVoltage(
    'AC voltage',
    'an AC voltage',
    { ...positive, minusCause: 'An AC meter shows the size of the voltage (RMS), never a sign.' },
    {
      expected: 'e.g. 6.3 V',
      reading: 'e.g. 6.2 V',
    },
  ),
  current: {
    label: 'Current',
    noun: 'a current',
    unit: 'A',
    sign: { reading: 'any', expected: 'any' },
    report: 'readings',
    rule: { type: 'band', usual: plusMinus20('usual allowance') },
    form: {
      expectedLabel: manual,
      expectedPlaceholder: 'e.g. 52 mA',
      readingPlaceholder: 'e.g. 57 mA',
      toleranceHint: usualHint,
      methodHint: 'Meter and how: in series, or from the volts across a known resistor',
      live: true,
    },
  },
  insulation: {
    label: 'Insulation resistance',
    noun: 'an insulation resistance',
    unit: 'Ω',
    sign: positive,
    report: 'safety-checks',
    rule: { type: 'minimum', default: { value: DEFAULT_INSULATION_MIN, source: '1 MΩ at 500 V DC, Class I' } },
    form: {
      expectedLabel: 'Minimum',
      expectedPlaceholder: 'blank for 1 MΩ',
      readingPlaceholder: 'e.g. 180 MΩ',
      methodHint: 'Test voltage and between what, e.g. 500 V DC, mains pins to chassis',
      live: true,
    },
  },
  frequency: {
    label: 'Frequency',
    noun: 'a frequency',
    unit: 'Hz',
    sign: positive,
    report: 'readings',
    rule: {
      type: 'band',
      absolute: true,
      usual: (expected) => {
        if (expected === null) return plusMinus20('usual allowance')();
        const amount = frequencyTolerance(expected);
        return {
          amount,
          words: 'usual alignment allowance; common practice',
          label: `±${formatQuantity(amount, 'Hz')} (usual)`,
        };
      },
    },
    form: {
      expectedLabel: manual,
      expectedPlaceholder: 'e.g. 472 kHz',
      readingPlaceholder: 'e.g. 471.2 kHz',
      toleranceHint: 'An amount in kHz (2 kHz) or per cent; blank for ±2 kHz at an AM IF, ±25 kHz at 10.7 MHz',
      methodHint: 'Instrument and where it was coupled, e.g. counter via 10 pF at the oscillator',
      live: true,
    },
  },
};
