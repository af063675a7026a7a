import { BenchInputError, formatQuantity, valveType } from '../../../../shared/bench';
import type { ValveHeater } from '../../../../shared/bench';
import type { Valve } from '../../../../shared/schemas/measurements';

/** A valve type decoded in words, or the library's reason it cannot be. */
export type ValveWords =
  { ok: true; heater: string; systems: string; base: string; description?: string } | { ok: false; message: string };

const mA = (amps: number) => `${Number((amps * 1000).toPrecision(3))} mA`;

/** "6.3 V parallel", "100 mA series (14 V)", "1.4 V battery", "no heater". */
export function heaterWords(heater: ValveHeater): string {
  switch (heater.supply) {
    case 'series':
      return [
        heater.amps === undefined ? 'series' : `${mA(heater.amps)} series`,
        heater.volts === undefined ? '' : `(${formatQuantity(heater.volts, 'V')})`,
      ]
        .filter(Boolean)
        .join(' ');
    case 'parallel':
    case 'battery':
      return `${heater.volts === undefined ? '' : `${formatQuantity(heater.volts, 'V')} `}${heater.supply}`;
    case 'none':
      return 'no heater';
  }
}

export function valveWords(type: string): ValveWords {
  if (type.trim() === '') return { ok: false, message: 'Enter the type printed on the valve.' };
  try {
    const v = valveType(type);
    // American type numbers name no electrode systems; their suffix (GT, A…) is said instead.
    const systems = v.systems.join('; ') || v.suffixWords?.join('; ') || 'not said by the name; see the type’s data';
    const words: ValveWords = { ok: true, heater: heaterWords(v.heater), systems, base: v.base };
    if (v.data) words.description = v.data.description;
    return words;
  } catch (error) {
    if (error instanceof BenchInputError) return { ok: false, message: error.message };
    throw error;
  }
}

/** The next free position after the highest used: V1 for an empty line-up, V6 after V5. */
export function nextPosition(valves: readonly Pick<Valve, 'position'>[]): string {
  const numbers = valves.map((v) => Number(/^V(\d+)$/i.exec(v.position.trim())?.[1] ?? 0));
  return `V${Math.max(0, ...numbers) + 1}`;
}
