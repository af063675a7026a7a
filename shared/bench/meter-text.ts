import { BenchInputError } from './bench-input-error';
import { meterCorrection, type MeterSpec } from './meter-loading';
import { parseQuantity } from './quantity-parse';

const PER_VOLT = /(\d+(?:\.\d+)?\s*[kK]?)\s*(?:Ω|ohms?)?\s*(?:\/|per\s+)\s*V(?:olt)?\b/i;
const RANGE = /(?:^|[\s,;(])(\d+(?:\.\d+)?\s*k?)\s*V(?:\s*range)?\b(?!\s*\/)/i;
const INPUT = /(\d+(?:\.\d+)?\s*[kM]?)\s*(?:Ω|ohms?)(?!\s*(?:\/|per\s))/i;

/**
 * Reads a meter as people write it: a moving-coil meter by sensitivity and range ("20 kΩ/V, 250 V range",
 * "1000 ohms per volt on 1000 V") or an electronic meter by its input resistance ("10 MΩ", "DMM 10 MΩ").
 */
export function parseMeter(text: string): MeterSpec {
  const trimmed = typeof text === 'string' ? text.trim() : '';
  const fail = (): never => {
    throw new BenchInputError(
      `'${trimmed}' is not a meter Gridleak can read: write its ohms per volt and range (20 kΩ/V 250 V) or its input resistance (10 MΩ).`,
    );
  };
  const perVolt = PER_VOLT.exec(trimmed);
  if (perVolt) {
    const rest = trimmed.replace(perVolt[0], ' ');
    const range = RANGE.exec(rest);
    if (!range) fail();
    const ohmsPerVolt = parseQuantity((perVolt[1] ?? '').replace(/\s+/g, '')).value;
    const rangeVolts = parseQuantity(`${(range?.[1] ?? '').replace(/\s+/g, '')}V`, { expectUnit: 'V' }).value;
    if (!(ohmsPerVolt > 0 && rangeVolts > 0)) fail();
    return { ohmsPerVolt, rangeVolts };
  }
  const input = INPUT.exec(trimmed);
  if (!input) {
    // A bare value ("11M") is an input resistance.
    try {
      const bare = parseQuantity(trimmed, { expectUnit: 'Ω' }).value;
      if (bare > 0) return { inputOhms: bare };
    } catch {
      // fall through to the message below
    }
    return fail();
  }
  const inputOhms = parseQuantity(`${(input[1] ?? '').replace(/\s+/g, '')}Ω`, { expectUnit: 'Ω' }).value;
  if (!(inputOhms > 0)) fail();
  return { inputOhms };
}

/** The chart's meter, your meter and the point's source resistance, as typed with a voltage reading. */
export interface MeterTexts {
  chartMeter?: string;
  meter?: string;
  source?: string;
}

/**
 * What your meter should read where the chart's meter read `chartVolts`, when all three texts are given; undefined
 * when any is blank. Throws a BenchInputError naming the field that cannot be read.
 */
export function correctedForMeter(chartVolts: number, texts: MeterTexts): { volts: number; words: string } | undefined {
  const { chartMeter = '', meter = '', source = '' } = texts;
  if (chartMeter.trim() === '' || meter.trim() === '' || source.trim() === '') return undefined;
  const named = <T>(what: string, read: () => T): T => {
    try {
      return read();
    } catch (err) {
      throw new BenchInputError(`${what}: ${(err as Error).message}`);
    }
  };
  const chart = named("Chart's meter", () => parseMeter(chartMeter));
  const yours = named('Your meter', () => parseMeter(meter));
  const sourceOhms = named('Source resistance', () => parseQuantity(source, { expectUnit: 'Ω' }).value);
  const c = meterCorrection({ chartVolts, sourceOhms, chartMeter: chart, yourMeter: yours });
  return { volts: c.expectedOnYourMeter, words: c.words };
}
