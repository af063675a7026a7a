import { describe, expect, it } from 'vitest';
import { expectRelative } from './bench-test-support';
import {
  capacitorCurrent,
  earthContinuityLimit,
  insulationMinimum,
  leadResistance,
  safetyTest,
  touchCurrentLimit,
  type SafetyTestInput,
} from './index';

// Sources named beside each check. "IET CoP" is the IET Code of Practice for In-service Inspection and Testing
// of Electrical Equipment, read through the pages that quote it (BENCH-REFERENCE §10): the earth limit "0.1 + R Ω"
// (Seaward's extension-lead FAQ, Test-Meter's blog), insulation "≥ 1 MΩ Class I, ≥ 2 MΩ Class II at 500 V DC"
// (the institution's magazine and a PAT reference page), and the 4th edition's touch/leakage limits
// "Class I portable 0.75 mA, Class II 0.25 mA" (IEC 60335-1 cl. 16 values; table on pat-testing-training.net's
// 5th-edition page, which notes the 5th edition relaxed both to 5 mA).

describe('earth continuity limit (IET CoP: 0.1 Ω plus the lead)', () => {
  it('when the lead is nulled, then the limit is 0.1 Ω', () => {
    expectRelative(earthContinuityLimit(0), 0.1); // IET CoP
  });
  it('when the lead is 2 m of 0.75 mm² flex, then its 26 mΩ/m adds 0.052 Ω: limit 0.152 Ω', () => {
    // IEC 60228 class 5 copper, 0.75 mm² = 26 Ω/km at 20 °C (from memory); 2 × 0.026 = 0.052 worked by hand.
    expectRelative(leadResistance(2, 0.75), 0.052);
    expectRelative(earthContinuityLimit(leadResistance(2, 0.75)), 0.152); // IET CoP 0.1 + R
  });
  it('when 1.0 mm² flex is 3 m long, then it adds 0.0585 Ω', () => {
    expectRelative(leadResistance(3, 1), 0.0585); // IEC 60228 class 5, 19.5 Ω/km (from memory); 3 × 0.0195 by hand
  });
  it('when the flex size is not a standard one, then it is refused with the sizes that would do', () => {
    expect(() => leadResistance(2, 0.8)).toThrow(/0.5, 0.75, 1, 1.5, 2.5/);
  });
});

describe('insulation minimum at 500 V DC (IET CoP)', () => {
  it('is 1 MΩ for Class I', () => expect(insulationMinimum('class-1')).toBe(1e6)); // IET CoP
  it('is 2 MΩ for Class II', () => expect(insulationMinimum('class-2')).toBe(2e6)); // IET CoP
  it('is 2 MΩ for a live-chassis set relying on insulated knobs and back', () =>
    expect(insulationMinimum('live-chassis')).toBe(2e6)); // IET CoP, Class II figure
});

describe('touch current limit for the class (IEC 60335-1 cl. 16 via IET CoP 4th ed.)', () => {
  it('is 0.75 mA for Class I portable equipment', () => expectRelative(touchCurrentLimit('class-1'), 0.75e-3));
  it('is 0.25 mA for Class II', () => expectRelative(touchCurrentLimit('class-2'), 0.25e-3));
});

describe('current through a mains-to-chassis capacitor, I = 2πfCV worked by hand', () => {
  // Hand working: 2 × 3.14159 × f × C × V; values also in BENCH-REFERENCE §10 (PHYS, ±1 %).
  it('0.2 µF at 230 V 50 Hz lets through 14.45 mA', () => {
    expectRelative(capacitorCurrent(0.2e-6, 230, 50), 14.45e-3, 0.001); // 6.28318 × 50 × 0.2e-6 × 230 = 0.014451 A
  });
  it('0.2 µF at 120 V 60 Hz lets through 9.05 mA (the "9 mA" quoted by restorers)', () => {
    expectRelative(capacitorCurrent(0.2e-6, 120, 60), 9.048e-3, 0.001); // 6.28318 × 60 × 0.2e-6 × 120 = 0.0090478 A
  });
  it('2.2 nF at 230 V 50 Hz lets through 0.159 mA', () => {
    expectRelative(capacitorCurrent(2.2e-9, 230, 50), 0.159e-3, 0.002); // 6.28318 × 50 × 2.2e-9 × 230 = 0.00015896 A
  });
  it('4.7 nF at 230 V 50 Hz lets through 0.34 mA', () => {
    expectRelative(capacitorCurrent(4.7e-9, 230, 50), 0.3396e-3, 0.001); // 6.28318 × 50 × 4.7e-9 × 230 = 0.00033960 A
  });
});

const sound: SafetyTestInput = {
  equipmentClass: 'class-1',
  earthOhms: 0.08,
  leadOhms: 0.05,
  insulationOhms: 50e6,
  insulationVolts: 500,
  mainsVolts: 230,
  mainsHertz: 50,
  fuseFittedAmps: 1,
  fuseRecommendedAmps: 1,
  leadAndStrainRelief: true,
  coversRefitted: true,
  safetyClassCapacitors: true,
};
const line = (input: SafetyTestInput, key: string) => safetyTest(input).lines.find((l) => l.key === key)!;

describe('the safety test verdicts', () => {
  it('when every reading is inside its limit, then the test passes', () => {
    expect(safetyTest(sound).verdict).toBe('pass');
  });
  it('when the earth reads 0.16 Ω with a 0.05 Ω lead, then earth continuity fails (limit 0.15 Ω, IET CoP)', () => {
    expect(line({ ...sound, earthOhms: 0.16 }, 'earth').verdict).toBe('fail');
    expect(safetyTest({ ...sound, earthOhms: 0.16 }).verdict).toBe('fail');
  });
  it('when a Class I set has no earth reading, then the test cannot pass', () => {
    expect(safetyTest({ ...sound, earthOhms: null }).verdict).toBe('fail');
  });
  it('when a Class II set reads 1.5 MΩ, then insulation fails (2 MΩ, IET CoP) though 1.5 MΩ would pass Class I', () => {
    expect(line({ ...sound, equipmentClass: 'class-2', insulationOhms: 1.5e6 }, 'insulation').verdict).toBe('fail');
    expect(line({ ...sound, insulationOhms: 1.5e6 }, 'insulation').verdict).toBe('pass');
    expect(line({ ...sound, equipmentClass: 'class-2' }, 'earth').verdict).toBe('not-applicable');
  });
  it('when insulation was tested at 250 V, then it does not count as the 500 V DC test', () => {
    expect(line({ ...sound, insulationVolts: 250 }, 'insulation').verdict).toBe('fail');
  });
  it('when a live-chassis set has a 4.7 nF mains-to-chassis capacitor, then 0.34 mA fails its 0.25 mA limit; 2.2 nF passes', () => {
    const live = { ...sound, equipmentClass: 'live-chassis' as const, earthOhms: null };
    expect(line({ ...live, yFarads: 4.7e-9 }, 'y-capacitor').verdict).toBe('fail');
    expect(line({ ...live, yFarads: 2.2e-9 }, 'y-capacitor').verdict).toBe('pass');
    expect(safetyTest({ ...live, yFarads: 2.2e-9 }).verdict).toBe('pass');
  });
  it('when a 3 A fuse is fitted where 1 A is recommended, then the fuse line fails (common practice, no source)', () => {
    expect(line({ ...sound, fuseFittedAmps: 3 }, 'fuse').verdict).toBe('fail');
    expect(line({ ...sound, fuseFittedAmps: 0.5 }, 'fuse').verdict).toBe('pass');
  });
  it('when the back cover is not refitted, then the test fails (common practice, no source)', () => {
    expect(safetyTest({ ...sound, coversRefitted: false }).verdict).toBe('fail');
  });
  it('names its source beside each limit', () => {
    const byKey = Object.fromEntries(safetyTest({ ...sound, touchAmps: 0.1e-3 }).lines.map((l) => [l.key, l.source]));
    expect(byKey.earth).toMatch(/IET Code of Practice/);
    expect(byKey.insulation).toMatch(/IET Code of Practice/);
    expect(byKey.touch).toMatch(/IEC 60335-1/);
  });
});
