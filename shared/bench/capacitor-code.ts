import { BenchInputError, scaleByPowerOfTen } from './bench-input-error';

// Tolerance letters of IEC 60062 that may follow the three digits (B…Z, as the IEC 60062 summary pages list them).
const TOLERANCE_LETTERS = 'BCDFGJKMNSZPQT';

// Third digit → power of ten on the picofarad value. 8 and 9 are the small-value
// multipliers ×0.01 and ×0.1 (so 479 is 4.7 pF); 6 and 7 appear on tantalum parts (106 = 10 µF).
const MULTIPLIER_EXPONENTS = [0, 1, 2, 3, 4, 5, 6, 7, -2, -1] as const;

function checkLetter(text: string, letter: string): void {
  if (letter !== '' && !TOLERANCE_LETTERS.includes(letter)) {
    throw new BenchInputError(
      `Capacitor code '${text}' ends in '${letter}', which is not a tolerance letter; expected one of ${TOLERANCE_LETTERS.split('').join(' ')} (e.g. J = ±5 %, K = ±10 %, M = ±20 %).`,
    );
  }
}

/**
 * Reads a capacitor code and returns the capacitance in farads: three digits such as "104", "473K" or "479"
 * (picofarads, third digit the multiplier); one or two digits printed as the value itself ("47" = 47 pF);
 * or R as the decimal point in picofarads ("2R2" = 2.2 pF, IEC 60062). An IEC 60062 tolerance letter may follow.
 */
export function capacitorCode(text: string): number {
  const trimmed = typeof text === 'string' ? text.trim().toUpperCase() : '';
  const plain = /^(\d{1,2})([A-Z]?)$/.exec(trimmed);
  const decimal = plain === null ? /^(\d*)R(\d+)([A-Z]?)$/.exec(trimmed) : null;
  if (plain !== null) {
    checkLetter(trimmed, plain[2] ?? '');
    return scaleByPowerOfTen(plain[1] ?? '', -12);
  }
  if (decimal !== null) {
    checkLetter(trimmed, decimal[3] ?? '');
    return scaleByPowerOfTen(`${decimal[1] || '0'}.${decimal[2] ?? ''}`, -12);
  }
  const match = /^(\d)(\d)(\d)([A-Z]?)$/.exec(trimmed);
  if (match === null) {
    throw new BenchInputError(
      `Capacitor code '${String(text)}' is not three digits and an optional tolerance letter, e.g. 104 or 473K.`,
    );
  }
  const [, first = '', second = '', multiplier = '', letter = ''] = match;
  checkLetter(trimmed, letter);
  const exponent = MULTIPLIER_EXPONENTS[Number(multiplier)] ?? 0;
  // Picofarads to farads is a further 10^-12; one scaling keeps the decimal exact.
  return scaleByPowerOfTen(`${first}${second}`, exponent - 12);
}
