import { AMERICAN_VALVES, americanHeaterVolts, americanSuffixWords, splitAmericanName } from './american-valves';
import { BenchInputError } from './bench-input-error';
import { BRITISH_VALVES } from './british-valves';
import { VALVE_DATA } from './valve-data';
import type { ValveData } from './valve-data';
import { baseOfNumber, HEATER_LETTERS, SYSTEM_LETTERS } from './valve-letters';
import type { HeaterSupply } from './valve-letters';

export interface ValveHeater {
  /** The heater letter of the European valve type code; for an American type, its leading number ("6", "50"). */
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
  /** Which naming scheme the name follows; absent means the European valve type code. */
  scheme?: 'european' | 'american' | 'british';
  /** What an American suffix says (GT: glass T-9 bulb…). */
  suffixWords?: string[];
}

const ORDINARY = /^([A-Z])([A-Z]+)(\d{1,3})$/;
const SPECIAL_QUALITY = /^([A-Z])(\d{2,3})([A-Z]+)$/;

function malformed(text: string): never {
  const hint = /^\d/.test(text)
    ? ' (a name starting with a digit is an American type number: heater volts, letters, a digit, e.g. 6V6GT)'
    : '';
  throw new BenchInputError(
    `'${text}' does not follow the European valve type code (heater letter, system letters, base digits), e.g. EL84${hint}.`,
  );
}

function americanType(text: string): ValveType | undefined {
  const parts = splitAmericanName(text);
  if (parts === undefined) return undefined;
  const known = AMERICAN_VALVES[parts.core];
  const volts = known?.heaterVolts ?? americanHeaterVolts(parts.leading);
  const supply: HeaterSupply =
    parts.leading === 0
      ? 'none'
      : parts.leading === 1
        ? 'battery'
        : volts !== undefined && volts >= 18
          ? 'series'
          : 'parallel';
  const heater: ValveHeater = { letter: String(parts.leading), supply };
  if (volts !== undefined) heater.volts = volts;
  if (known) heater.amps = known.heaterAmps;
  if (supply === 'series') heater.note = 'a heater this high runs only in a series string across the mains';
  else if (volts === 12.6) heater.note = '12.6 V types also run in 150 mA series strings';
  const result: ValveType = {
    designation: text,
    heater,
    systems: [],
    base: known?.base ?? 'not said by the number; see the type’s data',
    equivalents: [...(known?.equivalents ?? [])],
    specialQuality: false,
    standardForm: parts.core,
    scheme: 'american',
    suffixWords: americanSuffixWords(parts.suffix),
  };
  if (known) {
    const typical = {
      ...(known.maxAnodeWatts ? { maxAnodeWatts: known.maxAnodeWatts } : {}),
      ...(known.maxDcAmps ? { maxDcAmps: known.maxDcAmps } : {}),
    };
    result.data = {
      description: known.description,
      heaterVolts: known.heaterVolts,
      heaterAmps: known.heaterAmps,
      equivalents: known.equivalents,
      confidence: known.confidence,
      source: known.source,
      typical,
    };
  }
  return result;
}

function britishType(text: string): ValveType | undefined {
  const known = BRITISH_VALVES[text];
  if (known === undefined) return undefined;
  const { base, ...data } = known;
  const heater: ValveHeater = {
    letter: '',
    supply: 'parallel',
    volts: known.heaterVolts,
    amps: known.heaterAmps,
    note: 'a British type name, not the European heater-letter code',
  };
  return {
    designation: text,
    heater,
    systems: [],
    base,
    equivalents: [],
    specialQuality: false,
    standardForm: text,
    data,
    scheme: 'british',
  };
}

/**
 * Decodes a name in the European valve type code (heater letter, system letters, base digits) such as "EL84", "PL504" or "E88CC":
 * heater (volts, amperes), electrode systems, base, American equivalents and typical data when listed.
 * American type numbers ("6V6GT", "50C5", "12AX7") are read too: heater volts from the leading number, the
 * suffix in words, European equivalents where known. A few British type names (PX4, KT66…) are known as such.
 */
export function valveType(designation: string): ValveType {
  const text = typeof designation === 'string' ? designation.replace(/[\s-]/g, '').toUpperCase() : '';
  if (text === '') malformed(String(designation));
  const other = britishType(text) ?? americanType(text);
  if (other !== undefined) return other;
  const ordinary = ORDINARY.exec(text);
  const special = ordinary === null ? SPECIAL_QUALITY.exec(text) : null;
  if (ordinary === null && special === null) malformed(text);
  // Special-quality names put the digits between the letters (E88CC); reorder to heater, systems, digits.
  const [heaterLetter = '', systemLetters = '', digits = ''] =
    ordinary !== null ? [ordinary[1], ordinary[2], ordinary[3]] : [special?.[1], special?.[3], special?.[2]];
  const heaterRule = HEATER_LETTERS[heaterLetter];
  if (heaterRule === undefined) {
    throw new BenchInputError(
      `'${text}' starts with '${heaterLetter}', which is not a heater letter of the European valve type code (${Object.keys(HEATER_LETTERS).join(' ')}).`,
    );
  }
  const systems = [...systemLetters].map((letter) => {
    const system = SYSTEM_LETTERS[letter];
    if (system === undefined) {
      throw new BenchInputError(
        `In '${text}', '${letter}' is not a system letter of the European valve type code (${Object.keys(SYSTEM_LETTERS).join(' ')}).`,
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
    scheme: 'european',
  };
  if (data !== undefined) result.data = data;
  return result;
}
