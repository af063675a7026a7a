import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  capacitorCode,
  isOverRange,
  parseQuantity,
  parseReading,
  parseTolerance,
  partWarnings,
  readRating,
} from './index';
import { expectRelative } from './bench-test-support';

// Markings as they are printed on parts and in old parts lists. Each check names its source.

describe('parseQuantity reads the letter-and-digit code with R as the decimal marker', () => {
  it('when R ends the code (47R, 330R, 470R), then it is whole ohms', () => {
    // IEC 60062 letter-and-digit code: R stands where the decimal point would, so 47R = 47 Ω
    expect(parseQuantity('47R')).toEqual({ value: 47, unit: 'Ω' });
    expect(parseQuantity('330R')).toEqual({ value: 330, unit: 'Ω' }); // IEC 60062
    expect(parseQuantity('470R')).toEqual({ value: 470, unit: 'Ω' }); // IEC 60062
  });

  it('when R leads or sits inside (R47, 4R7), then it is a fraction of an ohm or ohms and tenths', () => {
    expectRelative(parseQuantity('R47').value, 0.47); // IEC 60062: R47 = 0.47 Ω
    expectRelative(parseQuantity('4R7').value, 4.7); // IEC 60062: 4R7 = 4.7 Ω
  });
});

describe('parseQuantity reads ratings with the words printed beside them', () => {
  it('when a voltage carries VDC, WV, WVDC or VAC, then it is volts', () => {
    // common practice, no source: "working volts" (WV, WVDC) and VDC/VAC markings on capacitors
    expect(parseQuantity('400 VDC')).toEqual({ value: 400, unit: 'V' });
    expect(parseQuantity('250 WV')).toEqual({ value: 250, unit: 'V' });
    expect(parseQuantity('350 WVDC')).toEqual({ value: 350, unit: 'V' });
    expect(parseQuantity('250 VAC')).toEqual({ value: 250, unit: 'V' });
  });

  it('when a voltage is in kilovolts (1 kV, 1.6 kV), then it is thousands of volts', () => {
    expectRelative(parseQuantity('1 kV').value, math.unit('1 kV').toNumber('V')); // SI prefix kilo, via mathjs
    expectRelative(parseQuantity('1.6 kV').value, math.unit('1.6 kV').toNumber('V')); // SI prefix kilo, via mathjs
  });

  it('when a capacitor says 0.1 mfd or 8 MF, then it is microfarads, never megafarads', () => {
    // common practice, no source: old American parts mark microfarads as mfd or MF
    expectRelative(parseQuantity('0.1 mfd').value, math.unit('0.1 uF').toNumber('F'));
    expectRelative(parseQuantity('8 MF').value, math.unit('8 uF').toNumber('F'));
    expectRelative(parseQuantity('8 MF', { expectUnit: 'F' }).value, math.unit('8 uF').toNumber('F'));
  });

  it('when micro is typed as a capital U (47UF), then it is still microfarads', () => {
    expectRelative(parseQuantity('47UF').value, math.unit('47 uF').toNumber('F')); // common practice, no source: "UF" on parts lists
  });

  it('when a resistor is written 4.7 meg, then it is megohms', () => {
    const q = parseQuantity('4.7 meg');
    expectRelative(q.value, math.unit('4.7 Mohm').toNumber('ohm')); // common practice, no source: "meg" in old parts lists
    expect(q.unit).toBe('Ω');
  });

  it('when the true minus sign (U+2212) leads a bias, then it is negative', () => {
    // Unicode: U+2212 MINUS SIGN, the character Gridleak itself prints
    expectRelative(parseQuantity('\u22127.3 V').value, -7.3);
  });
});

describe('parseTolerance reads tolerances as they are printed', () => {
  it('when an electrolytic is marked above first (+50/-20), then it is the S band', () => {
    expect(parseTolerance('+50/-20')).toEqual({ minus: 0.2, plus: 0.5 }); // IEC 60062 letter S: −20 %/+50 %
  });

  it('when marked -20/+80 with a true minus, then it is the Z band', () => {
    expect(parseTolerance('\u221220/+80')).toEqual({ minus: 0.2, plus: 0.8 }); // IEC 60062 letter Z: −20 %/+80 %
  });

  it('when a letter is given, then it is the IEC 60062 band', () => {
    expect(parseTolerance('F')).toBe(0.01); // IEC 60062: F = ±1 %
    expect(parseTolerance('G')).toBe(0.02); // IEC 60062: G = ±2 %
    expect(parseTolerance('J')).toBe(0.05); // IEC 60062: J = ±5 %
    expect(parseTolerance('k')).toBe(0.1); // IEC 60062: K = ±10 %
    expect(parseTolerance('M')).toBe(0.2); // IEC 60062: M = ±20 %
    expect(parseTolerance('Z')).toEqual({ minus: 0.2, plus: 0.8 }); // IEC 60062: Z = −20 %/+80 %
  });

  it('when the text is no tolerance, then the message names the letters too', () => {
    expect(() => parseTolerance('X')).toThrow(/as a letter \(J, K, M, Z\)/); // IEC 60062 has no letter X
  });
});

describe('capacitorCode reads R codes and two-digit codes', () => {
  it('when a ceramic is marked 2R2, then it is 2.2 pF', () => {
    expectRelative(capacitorCode('2R2'), math.unit('2.2 pF').toNumber('F')); // IEC 60062: R as decimal marker, picofarads on small ceramics
  });

  it('when a code has two digits (47), then it is the value in pF', () => {
    expectRelative(capacitorCode('47'), math.unit('47 pF').toNumber('F')); // capacitor code tables: two digits = pF as printed
    expectRelative(capacitorCode('10J'), math.unit('10 pF').toNumber('F')); // same, with IEC 60062 letter J
  });
});

describe('parseReading keeps over-range readings', () => {
  it('when the meter shows OL, then it is over range with no bound', () => {
    // common practice, no source: meters show OL (overload) beyond the range
    expect(parseReading('OL', { expectUnit: 'Ω' })).toEqual({ value: null, unit: 'Ω', overRange: true });
    expect(isOverRange('O.L.')).toBe(true);
  });

  it('when typed "> 200 M", then it is over range above 200 MΩ', () => {
    const r = parseReading('> 200 M', { expectUnit: 'Ω' });
    expect(r.overRange).toBe(true);
    expectRelative(r.value!, math.unit('200 Mohm').toNumber('ohm')); // SI prefix mega, via mathjs
  });

  it('when parseQuantity is given OL, then it explains that it is a reading', () => {
    expect(() => parseQuantity('OL')).toThrow(/over-range reading/); // Gridleak's own message (not a computation)
  });
});

describe('readRating and partWarnings read ratings as written', () => {
  it('when 0.1 mfd 400 VDC is replaced by 0.1 µF 250 V, then the voltage rule fires', () => {
    // common practice, no source: never lower a capacitor's voltage rating when replacing it
    expect(readRating('0.1 mfd 400 VDC')).toEqual({ farads: 1e-7, volts: 400 });
    expect(partWarnings({ original: '0.1 mfd 400 VDC', replacement: '0.1 µF 250 V' })[0]).toMatchObject({
      level: 'danger',
    });
  });

  it('when 0.01 µF 1 kV is replaced by a 630 V part, then the voltage rule fires', () => {
    expect(readRating('0.01 µF 1 kV').volts).toBe(1000); // SI prefix kilo
    expect(partWarnings({ original: '0.01 µF 1 kV', replacement: '630 V' })[0]!.message).toMatch(
      /630 V, below the original's 1000 V/,
    ); // common practice, no source
  });

  it('when ratings say 8 MF 350 WV or 250 VAC, then the values and the AC marking are read', () => {
    expect(readRating('8 MF 350 WV')).toEqual({ farads: 8e-6, volts: 350 }); // common practice, no source: MF = µF, WV = working volts
    expect(readRating('4n7 250 VAC')).toEqual({ farads: 4.7e-9, volts: 250, ac: true }); // IEC 60062: 4n7 = 4.7 nF
  });
});
