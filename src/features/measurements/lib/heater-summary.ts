import { formatQuantity, heaterChain, liveChassisLikely } from '../../../../shared/bench';

/** What a line-up's heaters add up to, in words, and the names whose heaters Gridleak cannot read. */
export interface HeaterSummary {
  /** "5 valves in series: 142.6 V at 100 mA" or "6 valves in parallel: 2.93 A at 6.3 V"; undefined when none could be read. */
  line?: string;
  /** Valves made for different heater currents in one series string. */
  mixed: boolean;
  unknown: string[];
}

// Any mains will do here: only the heaters' own totals are read, never the dropper.
const ANY_MAINS = 230;

export function heaterSummary(types: readonly string[]): HeaterSummary {
  const names = types.map((t) => t.trim()).filter((t) => t !== '');
  if (names.length === 0) return { mixed: false, unknown: [] };
  const chain = heaterChain({ valves: names, mainsVolts: ANY_MAINS });
  const series = liveChassisLikely(names).likely;
  const count = (n: number) => `${n} valve${n === 1 ? '' : 's'}`;
  let line: string | undefined;
  if (chain.valves.length > 0 && series) {
    line = `${count(chain.valves.length)} in series: ${formatQuantity(chain.volts, 'V', 4)} at ${formatQuantity(chain.amps, 'A')}`;
  } else if (chain.valves.length > 0) {
    const amps = chain.valves.reduce((sum, v) => sum + v.amps, 0);
    const volts = [...new Set(chain.valves.map((v) => formatQuantity(v.volts, 'V')))].join(' and ');
    line = `${count(chain.valves.length)} in parallel: ${formatQuantity(amps, 'A')} at ${volts}`;
  }
  return { ...(line === undefined ? {} : { line }), mixed: series && chain.mixedCurrents, unknown: chain.unknown };
}
