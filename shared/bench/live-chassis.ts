import { heaterOf, type ChainValve } from './heater-chain';
import { HEATER_LETTERS } from './valve-letters';
import { valveType } from './valve-type';

export interface LiveChassisAssessment {
  likely: boolean;
  /** One line per valve or letter that points to a series-heater (AC/DC) line-up, and one for the chain's total. */
  reasons: string[];
  /** Names Gridleak could not read or has no heater data for: check them by hand. */
  unknown: string[];
}

// A heater of 18 V or more (American 18, 25, 32, 35, 50, 70, 117 V types; European 100 mA types of 19–45 V) cannot
// run from a receiver's heater winding: it only makes sense in a series string across the mains.
const SERIES_ONLY_VOLTS = 18;
// The 100, 150 and 300 mA series currents: a string of such valves adding up past half the lowest mains (110 V)
// runs across the mains (common practice, no source).
const SERIES_CURRENTS = [0.1, 0.15, 0.3];
const HALF_LOW_MAINS = 55;

const mA = (amps: number) => `${Math.round(amps * 1000)} mA`;

function seriesScheme(name: string): boolean {
  try {
    const v = valveType(name);
    return v.scheme !== 'british' && v.heater.supply === 'series';
  } catch {
    return false;
  }
}

function americanVolts(name: string): number | undefined {
  try {
    const v = valveType(name);
    return v.scheme === 'american' ? v.heater.volts : undefined;
  } catch {
    return undefined;
  }
}

/**
 * Whether a line-up (European valve type code, American type numbers, or bare heater letters) points to series
 * heaters across the mains, i.e. an AC/DC set whose chassis is likely live. Judged by the heaters' current and total
 * rather than the first letter alone: a British name that only begins with U, P, X or H is not a series type. Names
 * it cannot read are listed in `unknown`. Treat any 2-wire set as live anyway.
 */
export function liveChassisLikely(items: readonly string[]): LiveChassisAssessment {
  const reasons: string[] = [];
  const unknown: string[] = [];
  const known: ChainValve[] = [];
  for (const item of items) {
    if (typeof item !== 'string' || item.trim() === '') continue;
    const text = item.replace(/\s/g, '').toUpperCase();
    const letter = HEATER_LETTERS[text];
    if (text.length === 1 && letter !== undefined) {
      // A bare heater letter: the person says which heater scheme the set's valves follow.
      if (letter.supply === 'series')
        reasons.push(
          `${text}: heater letter ${text} is a series-string heater${letter.amps ? ` (${mA(letter.amps)})` : ''}`,
        );
      continue;
    }
    const heater = heaterOf(text);
    if (heater === undefined) {
      unknown.push(text);
      // Decodes, but its heater current is not in the table: an American number of 18 V or more still says series;
      // a European series letter alone says so too, with a request to check.
      const volts = americanVolts(text);
      if (volts !== undefined && volts >= SERIES_ONLY_VOLTS)
        reasons.push(`${text}: ${volts} V heater, made for series strings`);
      else if (seriesScheme(text))
        reasons.push(
          `${text}: heater letter ${text.charAt(0)} reads as a series-string heater, but the type is not in Gridleak’s table: check its data`,
        );
      continue;
    }
    known.push(heater);
    if (heater.volts >= SERIES_ONLY_VOLTS)
      reasons.push(`${heater.name}: ${heater.volts} V heater at ${mA(heater.amps)}, made for series strings`);
    else if (seriesScheme(text))
      reasons.push(`${heater.name}: ${mA(heater.amps)} series-string heater (${heater.volts} V)`);
  }
  const byCurrent = new Map<number, ChainValve[]>();
  for (const v of known)
    if (SERIES_CURRENTS.includes(v.amps)) byCurrent.set(v.amps, [...(byCurrent.get(v.amps) ?? []), v]);
  for (const [amps, chain] of byCurrent) {
    const total = Number(chain.reduce((sum, v) => sum + v.volts, 0).toFixed(3));
    const seriesEvidence = chain.some((v) => v.volts >= SERIES_ONLY_VOLTS || seriesScheme(v.name));
    if (chain.length > 1 && seriesEvidence && total >= HALF_LOW_MAINS)
      reasons.push(
        `${chain.length} valves at ${mA(amps)} add up to ${total} V of heaters: a series string across the mains`,
      );
  }
  return { likely: reasons.length > 0, reasons, unknown };
}
