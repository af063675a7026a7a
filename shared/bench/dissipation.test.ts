import { describe, expect, it } from 'vitest';
import { anodeDissipation, rectifierLoad, resistorDissipation } from './index';
import { expectRelative } from './bench-test-support';

// P = V²/R = I²R = V·I (Joule's law, any circuits textbook); ratings as noted per check; expected values by hand.

describe('resistorDissipation', () => {
  it('when 100 V stands across 10 kΩ, then it dissipates 1 W (V²/R)', () => {
    expectRelative(resistorDissipation({ volts: 100, ohms: 10e3 }).value, 1); // by hand: 100² / 10,000
  });

  it('when 50 mA flows through 150 Ω rated 0.25 W, then 0.375 W is out (I²R)', () => {
    const r = resistorDissipation({ amps: 0.05, ohms: 150, ratingWatts: 0.25 });
    expectRelative(r.value, 0.375); // by hand: 0.05² × 150
    expect(r.verdict).toBe('out'); // 1.5 × the rating
  });

  it('when 0.375 W runs in a 0.5 W resistor, then it is within at three quarters of its rating', () => {
    const r = resistorDissipation({ amps: 0.05, ohms: 150, ratingWatts: 0.5 });
    expectRelative(r.fraction!, 0.75); // by hand
    expect(r.verdict).toBe('within');
  });

  it('when only volts and amps are known, then it is V·I', () => {
    expectRelative(resistorDissipation({ volts: 20, amps: 0.03 }).value, 0.6); // by hand
  });
});

describe('anodeDissipation', () => {
  it('when an EL84 runs 250 V at 48 mA, then its 12 W is right at the 12 W maximum', () => {
    // encyclopedia article on the EL84: Pa max 12 W
    const a = anodeDissipation({ valve: 'EL84', anodeVolts: 250, anodeAmps: 0.048 });
    expectRelative(a.value, 12); // by hand: 250 × 0.048
    expect(a.verdict).toBe('within');
  });

  it('when an ECL86 pentode runs 250 V at 44 mA, then 11 W is out against its 9 W maximum', () => {
    // maker's 1962 ECL86 type announcement: Pa max 9 W
    const a = anodeDissipation({ valve: 'ECL86', anodeVolts: 250, anodeAmps: 0.044 });
    expectRelative(a.fraction!, 11 / 9); // by hand
    expect(a.verdict).toBe('out');
  });

  it('when the type has no maximum in the table, then the verdict is unknown', () => {
    expect(anodeDissipation({ valve: 'EF89', anodeVolts: 250, anodeAmps: 0.009 }).verdict).toBe('unknown'); // EF89 Pa max not in Gridleak's table
  });
});

describe('rectifierLoad', () => {
  it('when an EZ80 delivers 95 mA, then it is marginal against its 90 mA; at 120 mA it is out', () => {
    // valve data site quoting maker data (as EZ40): 90 mA DC maximum
    expect(rectifierLoad({ valve: 'EZ80', dcAmps: 0.095 }).verdict).toBe('marginal');
    expect(rectifierLoad({ valve: 'EZ80', dcAmps: 0.12 }).verdict).toBe('out');
  });
});
