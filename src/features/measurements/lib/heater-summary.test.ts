import { describe, expect, it } from 'vitest';
import { heaterSummary } from './heater-summary';

// Heater ratings per type as recalled from valve data handbooks (from memory); totals worked by hand.

describe('heaterSummary', () => {
  it('when the line-up is a 100 mA series string, then its total and current are given', () => {
    // from memory: UCH81 19 + UF89 12.6 + UABC80 28 + UL84 45 + UY85 38 = 142.6 V at 100 mA
    expect(heaterSummary(['UCH81', 'UF89', 'UABC80', 'UL84', 'UY85'])).toEqual({
      line: '5 valves in series: 142.6 V at 100 mA',
      mixed: false,
      unknown: [],
    });
  });

  it('when the line-up is a 6.3 V transformer set, then the winding’s load is given', () => {
    // from memory: ECH81 0.3 A + EF89 0.2 A + EL84 0.76 A (encyclopedia) = 1.26 A at 6.3 V
    expect(heaterSummary(['ECH81', 'EF89', 'EL84']).line).toBe('3 valves in parallel: 1.26 A at 6.3 V');
  });

  it('when a 300 mA valve joins a 100 mA string and a name is unknown, then both are said', () => {
    const s = heaterSummary(['UCH81', 'UL84', 'UY85', 'ECC85', 'QQ7']);
    expect(s.mixed).toBe(true); // from memory: ECC85 0.435 A among 100 mA valves
    expect(s.unknown).toEqual(['QQ7']);
  });
});
