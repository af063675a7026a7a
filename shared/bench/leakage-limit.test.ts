import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { leakageLimit, leakageLimitDetail } from './index';
import { expectRelative } from './bench-test-support';

// Rule stated by a general-purpose 105 °C radial series datasheet (a maker's data sheet, cited without the brand),
// C in µF, U in V, I in µA; each expected value evaluated with mathjs and converted to amperes.
const microamps = (expression: string) => math.unit(math.evaluate(expression) as number, 'uA').toNumber('A');

describe('leakageLimit up to 100 V rated', () => {
  it('allows 0.01·C·U: 16 µA for 100 µF 16 V', () => {
    expectRelative(leakageLimit(100e-6, 16), microamps('0.01 * 100 * 16')); // datasheet rule
    expect(leakageLimitDetail(100e-6, 16).rule).toBe('general-purpose ≤100 V: 0.01·C·V or 3 µA'); // datasheet rule, named
  });

  it('never goes below the 3 µA floor', () => {
    expectRelative(leakageLimit(1e-6, 10), microamps('max(0.01 * 1 * 10, 3)')); // datasheet rule: 3 µA floor
  });

  it('reads the current after two minutes', () => {
    expect(leakageLimitDetail(100e-6, 16).measureAfterSeconds).toBe(120); // datasheet: 2 min
  });
});

describe('leakageLimit above 100 V rated', () => {
  it('uses 0.03·C·U + 15 µA when C·U ≤ 1000', () => {
    expectRelative(leakageLimit(2.2e-6, 350), microamps('0.03 * 2.2 * 350 + 15')); // datasheet rule
    expect(leakageLimitDetail(2.2e-6, 350).rule).toMatch(/C·V ≤ 1000: 0\.03·C·V \+ 15 µA/); // datasheet rule, named
  });

  it('uses 0.02·C·U + 25 µA for a 47 µF 400 V reservoir', () => {
    expectRelative(leakageLimit(47e-6, 400), microamps('0.02 * 47 * 400 + 25')); // datasheet rule
    expect(leakageLimitDetail(47e-6, 400).rule).toMatch(/C·V > 1000: 0\.02·C·V \+ 25 µA/); // datasheet rule, named
  });

  it('meets itself at C·U = 1000, where both rules give 45 µA', () => {
    expectRelative(leakageLimit(4e-6, 250), microamps('0.03 * 1000 + 15')); // datasheet rule, C·U = 1000
    expectRelative(leakageLimit(4.0001e-6, 250), microamps('0.02 * 1000 + 25'), 1e-4); // datasheet rule just above
  });
});

describe('leakageLimit refuses nonsense', () => {
  it('refuses a negative rated voltage', () => {
    expect(() => leakageLimit(47e-6, -400)).toThrow(/rated voltage \(V\) must be a number above zero/); // Gridleak's own message (not a computation)
  });
});
