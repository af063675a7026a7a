import { BenchInputError } from './bench-input-error';
import { VALVE_DATA } from './valve-data';
import type { ValveData } from './valve-data';
import { baseOfNumber, HEATER_LETTERS, SYSTEM_LETTERS } from './valve-letters';
import type { HeaterSupply } from './valve-letters';

export interface ValveHeater {
  letter: string;
  supply: HeaterSupply;
  /** Heater voltage, volts (from the type's data when known, else what the letter fixes). */
  volts?: number;
  /** Heater current, amperes (from the type's data when known, else what the letter fixes). */
  amps?: number;
  note?: string;
}

export interface ValveType {
  /** The designation as normalised (upper case, no spaces). */
  designation: string;
  heater: ValveHeater;
  /** Electrode systems in words, one per system letter. */
  systems: string[];
  base: string;
  equivalents: string[];
  /** Special-quality form with digits between letters (E80F); standardForm is the ordinary name (EF80). */
  specialQuality: boolean;
  standardForm: string;
  /** Typical data when the type is in Gridleak's table; a valid but unlisted type still decodes. */
  data?: ValveData;
}

const ORDINARY = /^([A-Z])([A-Z]+)(\d{1,3})$/;
const SPECIAL_QUALITY = /^([A-Z])(\d{2,3})([A-Z]+)$/;

function malformed(text: string): never {
  const hint = /^\d/.test(text) ? ' (a name starting with a digit is an American type number)' : '';
  throw new BenchInputError(
    `'${text}' is not a European valve designation: expected a heater letter, one or more system letters and digits, e.g. EL84${hint}.`,
  );
}

/**
 * Decodes a European (Mullard–Philips) valve designation such as "EL84", "PL504" or "E88CC":
 * heater (volts, amperes), electrode systems, base, American equivalents and typical data when listed.
 */
export function valveType(designation: string): ValveType {
  const text = typeof designation === 'string' ? designation.replace(/[\s-]/g, '').toUpperCase() : '';
  if (text === '') malformed(String(designation));
  const ordinary = ORDINARY.exec(text);
  const special = ordinary === null ? SPECIAL_QUALITY.exec(text) : null;
  if (ordinary === null && special === null) malformed(text);
  // Special-quality names put the digits between the letters (E88CC); reorder to heater, systems, digits.
  const [heaterLetter = '', systemLetters = '', digits = ''] = ordinary !== null
    ? [ordinary[1], ordinary[2], ordinary[3]]
    : [special?.[1], special?.[3], special?.[2]];
  const heaterRule = HEATER_LETTERS[heaterLetter];
  if (heaterRule === undefined) {
    throw new BenchInputError(
      `'${text}' starts with '${heaterLetter}', which is not a heater letter of the European designation (${Object.keys(HEATER_LETTERS).join(' ')}).`,
    );
  }
  const systems = [...systemLetters].map((letter) => {
    const system = SYSTEM_LETTERS[letter];
    if (system === undefined) {
      throw new BenchInputError(
        `In '${text}', '${letter}' is not a system letter of the European designation (${Object.keys(SYSTEM_LETTERS).join(' ')}).`,
      );
    }
    return system;
  });
  const data = VALVE_DATA[text];
  const heater: ValveHeater = { letter: heaterLetter, ...heaterRule };
  if (data !== undefined) {
    heater.volts = data.heaterVolts;
    heater.amps = data.heaterAmps;
  }
  const result: ValveType = {
    designation: text,
    heater,
    systems,
    base: baseOfNumber(digits, heaterLetter),
    equivalents: [...(data?.equivalents ?? [])],
    specialQuality: special !== null,
    standardForm: `${heaterLetter}${systemLetters}${digits}`,
  };
  if (data !== undefined) result.data = data;
  return result;
}
