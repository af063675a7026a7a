import { HEATER_LETTERS } from './valve-letters';

export interface LiveChassisAssessment {
  likely: boolean;
  /** One line per valve or letter that points to a series-heater (AC/DC) line-up. */
  reasons: string[];
}

// American type numbers start with the heater voltage; 35 and 50 V types (and 25, 117 V)
// only make sense in a series string across the mains. 12 V types also run from 6.3 V pairs
// in AC sets, so they alone prove nothing.
const SERIES_ONLY_AMERICAN_VOLTS = new Set([25, 35, 50, 117]);

function assess(item: string): string | undefined {
  const text = item.replace(/\s/g, '').toUpperCase();
  const american = /^(\d+)[A-Z]/.exec(text);
  if (american !== null) {
    const volts = Number(american[1]);
    return SERIES_ONLY_AMERICAN_VOLTS.has(volts) ? `${text}: ${volts} V heater, made for series strings` : undefined;
  }
  const letter = text.charAt(0);
  const rule = HEATER_LETTERS[letter];
  if (rule?.supply !== 'series') return undefined;
  const amps = rule.amps === undefined ? '' : ` (${Math.round(rule.amps * 1000)} mA)`;
  return `${text}: heater letter ${letter} is a series-string heater${amps}`;
}

/**
 * Whether a line-up (European designations, bare heater letters or American type numbers) points to
 * series heaters across the mains, i.e. an AC/DC set whose chassis is likely live. Treat any 2-wire set as live anyway.
 */
export function liveChassisLikely(items: readonly string[]): LiveChassisAssessment {
  const reasons = items.flatMap((item) => {
    const reason = typeof item === 'string' ? assess(item) : undefined;
    return reason === undefined ? [] : [reason];
  });
  return { likely: reasons.length > 0, reasons };
}
