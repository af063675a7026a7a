import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { BenchInputError, capacitorCode } from './index';
import { expectRelative } from './bench-test-support';

// Three-digit code: two figures and a multiplier, value in picofarads, multipliers 8 = ×0.01 and
// 9 = ×0.1 (EIA-style capacitor code tables: bookofengineering.com capacitor value reading table and two retailers' tables); farads via mathjs.

describe('capacitorCode reads three-digit picofarad codes', () => {
  it('reads 104 as 100 nF', () => {
    expectRelative(capacitorCode('104'), math.unit('100 nF').toNumber('F')); // code table: 10 × 10^4 pF
  });

  it('reads 101 as 100 pF and 100 as 10 pF', () => {
    expectRelative(capacitorCode('101'), math.unit('100 pF').toNumber('F')); // code table
    expectRelative(capacitorCode('100'), math.unit('10 pF').toNumber('F')); // code table: multiplier 0 = ×1
  });

  it('reads 479 as 4.7 pF, multiplier 9 being ×0.1', () => {
    expectRelative(capacitorCode('479'), math.unit('4.7 pF').toNumber('F')); // code table: 9 = ×0.1
  });

  it('reads 228 as 0.22 pF, multiplier 8 being ×0.01', () => {
    expectRelative(capacitorCode('228'), math.unit('0.22 pF').toNumber('F')); // code table: 8 = ×0.01
  });

  it('reads 106 on a tantalum part as 10 µF', () => {
    expectRelative(capacitorCode('106'), math.unit('10 uF').toNumber('F')); // from memory: tantalum marking 106 = 10 µF
  });
});

describe('capacitorCode accepts a trailing IEC 60062 tolerance letter', () => {
  it('reads 473K as 47 nF', () => {
    expectRelative(capacitorCode('473K'), math.unit('47 nF').toNumber('F')); // code table; K = ±10 % (IEC 60062)
  });

  it('reads 223J as 22 nF', () => {
    expectRelative(capacitorCode('223J'), math.unit('22 nF').toNumber('F')); // code table; J = ±5 % (IEC 60062)
  });

  it('accepts a lower-case letter and surrounding spaces', () => {
    expectRelative(capacitorCode(' 104k '), math.unit('100 nF').toNumber('F')); // code table
  });
});

describe('capacitorCode refuses malformed codes with a readable message', () => {
  it('explains what a code looks like', () => {
    // Gridleak's own message, word for word (not a computation)
    expect(() => capacitorCode('1a3')).toThrow(
      "Capacitor code '1a3' is not three digits and an optional tolerance letter, e.g. 104 or 473K.",
    );
  });

  it('refuses four digits', () => {
    expect(() => capacitorCode('1043')).toThrow(BenchInputError); // code tables: exactly three digits
  });

  it('names the tolerance letters when the last letter is not one', () => {
    expect(() => capacitorCode('104X')).toThrow(/'X', which is not a tolerance letter/); // IEC 60062 letter list
  });
});
