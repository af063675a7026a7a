import { BenchInputError, requirePositive } from './bench-input-error';
import { valveType } from './valve-type';

export interface ChainValve {
  name: string;
  volts: number;
  amps: number;
}

export interface HeaterChain {
  /** Sum of the heater volts of the valves read (and the dial lamp), volts. */
  volts: number;
  /** The chain's current, amperes: the current most of its valves are made for (the highest when tied). */
  amps: number;
  /** Series resistor that drops the rest of the mains at that current, ohms; 0 when the heaters need the whole mains or more. */
  dropperOhms: number;
  /** Power the dropper turns to heat, watts (choose a resistor rated well above it). */
  dropperWatts: number;
  /** True when valves made for different heater currents are in one string: an error, some heaters run hot and others cold. */
  mixedCurrents: boolean;
  /** Resistor across the dial lamp that carries the chain current the lamp does not, ohms (only when a lamp is given and needs one). */
  lampShuntOhms?: number;
  valves: ChainValve[];
  /** Names that could not be read, or whose heater volts or current Gridleak does not know: reported, not ignored. */
  unknown: string[];
}

export interface HeaterChainInput {
  /** Valve type names as printed, e.g. ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'] or ['12BE6', '50C5']. */
  valves: readonly string[];
  /** Mains voltage on the bench, volts (rms). */
  mainsVolts: number;
  /** A dial lamp in the string, by its rating: volts and amperes. */
  dialLamp?: { volts: number; amps: number };
}

/** The heater volts and current of one valve, when its name gives both. */
export function heaterOf(name: string): ChainValve | undefined {
  try {
    const v = valveType(name);
    if (v.heater.volts === undefined || v.heater.amps === undefined) return undefined;
    return { name: v.designation, volts: v.heater.volts, amps: v.heater.amps };
  } catch (error) {
    if (error instanceof BenchInputError) return undefined;
    throw error;
  }
}

/**
 * A series heater string across the mains: the heaters' total volts, the chain current, the dropper resistor's value
 * and dissipation for the rest of the mains (R = (V_mains − ΣV_heater)/I, P = (V_mains − ΣV_heater)·I), whether valves
 * of different heater currents are mixed, and the shunt a lower-current dial lamp needs (R = V_lamp/(I − I_lamp)).
 */
export function heaterChain({ valves, mainsVolts, dialLamp }: HeaterChainInput): HeaterChain {
  requirePositive(mainsVolts, 'mains voltage (V)');
  if (!Array.isArray(valves) || valves.length === 0)
    throw new BenchInputError('Give the valves in the heater string, for example UCH42 UAF42 UBC41 UL41 UY41.');
  const read: ChainValve[] = [];
  const unknown: string[] = [];
  for (const name of valves) {
    const heater = typeof name === 'string' ? heaterOf(name) : undefined;
    if (heater) read.push(heater);
    else unknown.push(String(name));
  }
  const counts = new Map<number, number>();
  for (const v of read) counts.set(v.amps, (counts.get(v.amps) ?? 0) + 1);
  const ranked = [...counts].sort(([a1, n1], [a2, n2]) => n2 - n1 || a2 - a1);
  const amps = ranked[0]?.[0] ?? 0;
  let volts = read.reduce((sum, v) => sum + v.volts, 0);
  let lampShuntOhms: number | undefined;
  if (dialLamp) {
    requirePositive(dialLamp.volts, 'dial lamp voltage (V)');
    requirePositive(dialLamp.amps, 'dial lamp current (A)');
    volts += dialLamp.volts;
    if (amps > dialLamp.amps) lampShuntOhms = dialLamp.volts / (amps - dialLamp.amps);
  }
  volts = Number(volts.toFixed(6));
  const spare = Math.max(0, mainsVolts - volts);
  return {
    volts,
    amps,
    dropperOhms: amps > 0 ? spare / amps : 0,
    dropperWatts: spare * amps,
    mixedCurrents: counts.size > 1,
    ...(lampShuntOhms === undefined ? {} : { lampShuntOhms }),
    valves: read,
    unknown,
  };
}
