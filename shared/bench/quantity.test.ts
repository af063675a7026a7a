import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { BenchInputError, formatQuantity, parseQuantity } from './index';
import { expectRelative } from './bench-test-support';

// SI values are checked against mathjs (math.unit(...).toNumber(...)), an independent unit library.
// Letter-and-digit codes are checked against IEC 60062 (RKM code: the encyclopedia article on IEC 60062 and its mirrors).

describe('parseQuantity reads SI prefixes and unit symbols', () => {
  it('reads "4.7 kΩ" as 4700 ohms', () => {
    const q = parseQuantity('4.7 kΩ');
    expectRelative(q.value, math.unit('4.7 kohm').toNumber('ohm')); // mathjs
    expect(q.unit).toBe('Ω'); // the symbol written
  });

  it('reads "250 V" as 250 volts', () => {
    const q = parseQuantity('250 V');
    expectRelative(q.value, math.unit('250 V').toNumber('V')); // mathjs
    expect(q.unit).toBe('V');
  });

  it('reads a bare prefix "68µ" with no unit', () => {
    const q = parseQuantity('68µ');
    expectRelative(q.value, math.unit('68 uF').toNumber('F')); // mathjs: micro = 1e-6
    expect(q.unit).toBe(''); // no unit written
  });

  it('reads "68uF" with u standing for micro', () => {
    const q = parseQuantity('68uF');
    expectRelative(q.value, math.unit('68 uF').toNumber('F')); // mathjs
    expect(q.unit).toBe('F');
  });

  it('reads "0.05 µF", a typical paper capacitor', () => {
    expectRelative(parseQuantity('0.05 µF').value, math.unit('0.05 uF').toNumber('F')); // mathjs
  });

  it('reads "47k" as 47 thousand', () => {
    expectRelative(parseQuantity('47k').value, math.unit('47 kohm').toNumber('ohm')); // mathjs
  });

  it('reads "4.7kohm" and "100 Ohms" spelt out', () => {
    expectRelative(parseQuantity('4.7kohm').value, math.unit('4.7 kohm').toNumber('ohm')); // mathjs
    expectRelative(parseQuantity('100 Ohms').value, math.unit('100 ohm').toNumber('ohm')); // mathjs
  });

  it('reads milliamps, kilohertz and milliseconds', () => {
    expectRelative(parseQuantity('100 mA').value, math.unit('100 mA').toNumber('A')); // mathjs
    expectRelative(parseQuantity('10 kHz').value, math.unit('10 kHz').toNumber('Hz')); // mathjs
    expectRelative(parseQuantity('5 ms').value, math.unit('5 ms').toNumber('s')); // mathjs
  });

  it('keeps the minus sign of a bias voltage', () => {
    expectRelative(parseQuantity('-7.3 V').value, math.unit('-7.3 V').toNumber('V')); // mathjs
  });

  it('reads the old American marking mfd as microfarads', () => {
    // common practice, no source: US parts are marked mfd (µF) and mmfd (pF)
    expectRelative(parseQuantity('0.05 mfd').value, math.unit('0.05 uF').toNumber('F'));
    expectRelative(parseQuantity('100 mmfd').value, math.unit('100 pF').toNumber('F'));
  });
});

describe('parseQuantity reads the IEC 60062 letter-and-digit code', () => {
  it('reads 4R7 as 4.7 ohms', () => {
    const q = parseQuantity('4R7');
    expectRelative(q.value, 4.7); // IEC 60062: R stands for the decimal point, ohms
    expect(q.unit).toBe('Ω'); // IEC 60062: R is a resistance letter
  });

  it('reads 3k3, 2M2 and 1M5 as kilohms and megohms', () => {
    expectRelative(parseQuantity('3k3').value, math.unit('3.3 kohm').toNumber('ohm')); // IEC 60062 via mathjs
    expectRelative(parseQuantity('2M2').value, math.unit('2.2 Mohm').toNumber('ohm')); // IEC 60062 via mathjs
    expectRelative(parseQuantity('1M5').value, math.unit('1.5 Mohm').toNumber('ohm')); // IEC 60062 via mathjs
  });

  it('reads R47 as 0.47 ohm', () => {
    expectRelative(parseQuantity('R47').value, 0.47); // IEC 60062: leading R = 0.x ohms
  });

  it('reads 3n3 as 3.3 nF and names farads', () => {
    const q = parseQuantity('3n3');
    expectRelative(q.value, math.unit('3.3 nF').toNumber('F')); // IEC 60062 capacitance letter n, via mathjs
    expect(q.unit).toBe('F'); // IEC 60062: lower-case letters are capacitance letters
  });

  it('reads M47 as megohms by the standard but as 0.47 µF where a capacitance is expected', () => {
    expectRelative(parseQuantity('M47').value, math.unit('0.47 Mohm').toNumber('ohm')); // IEC 60062: M = 10^6
    // common practice, no source: old European diagrams write M47 for 0.47 µF
    expectRelative(parseQuantity('M47', { expectUnit: 'F' }).value, math.unit('0.47 uF').toNumber('F'));
    expectRelative(parseQuantity('M47 F').value, math.unit('0.47 uF').toNumber('F')); // same, with the unit written
  });
});

describe('parseQuantity refuses what it cannot read, with a message a person can act on', () => {
  it('refuses words', () => {
    expect(() => parseQuantity('abc')).toThrow(/'abc' is not a value .* like 4\.7k/); // Gridleak's own message (not a computation)
  });

  it('refuses an unknown unit and names the SI prefixes', () => {
    expect(() => parseQuantity('4.7 kX')).toThrow(/'kX' is not an SI prefix \(p n µ m k M G\)/); // SI Brochure prefixes
  });

  it('refuses a decimal comma and suggests a point or the letter code', () => {
    expect(() => parseQuantity('4,7k')).toThrow(/use a point .* \(4k7\)/); // IEC 60062 letter code as the alternative
  });

  it('refuses an empty field', () => {
    expect(() => parseQuantity('  ')).toThrow(BenchInputError); // Gridleak's own error type (not a computation)
  });

  it('refuses a resistance code where a capacitance is expected', () => {
    expect(() => parseQuantity('4R7', { expectUnit: 'F' })).toThrow(/in Ω but F was expected/); // IEC 60062: R = ohms
  });
});

describe('formatQuantity writes values with SI prefixes', () => {
  // Expected strings follow the SI prefix table (SI Brochure, BIPM) applied to mathjs values.
  it('writes 4.7 kΩ, 47 µF and 250 V', () => {
    expect(formatQuantity(math.unit('4.7 kohm').toNumber('ohm'), 'Ω')).toBe('4.7 kΩ');
    expect(formatQuantity(math.unit('47 uF').toNumber('F'), 'F')).toBe('47 µF');
    expect(formatQuantity(math.unit('250 V').toNumber('V'), 'V')).toBe('250 V');
  });

  it('rounds to three figures and carries into the next prefix', () => {
    expect(formatQuantity(math.evaluate('1/(2*pi*4700*47e-9)') as number, 'Hz')).toBe('720 Hz'); // mathjs: 720.5 Hz, SI Brochure
    expect(formatQuantity(math.evaluate('1/(2*pi*1e3*100e-9)') as number, 'Hz')).toBe('1.59 kHz'); // mathjs: 1591.5 Hz
    expect(formatQuantity(999.7, 'Ω')).toBe('1 kΩ'); // SI Brochure: 1000 Ω = 1 kΩ
  });

  it('round-trips through parseQuantity', () => {
    const farads = math.unit('3.3 nF').toNumber('F'); // mathjs
    expectRelative(parseQuantity(formatQuantity(farads, 'F')).value, farads);
  });
});
