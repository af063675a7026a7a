import { describe, expect, it } from 'vitest';
import { nextPosition, valveWords } from './valve-words';

describe('valveWords', () => {
  it('decodes heater, systems and base in words', () => {
    expect(valveWords('EL84')).toMatchObject({
      ok: true,
      heater: '6.3 V parallel',
      base: expect.stringMatching(/noval/),
    });
    expect(valveWords('UCH42')).toMatchObject({
      ok: true,
      heater: '100 mA series (14 V)',
      systems: 'small-signal triode; hexode or heptode (hexode type)',
    });
    expect(valveWords('DK92')).toMatchObject({ ok: true, heater: expect.stringMatching(/V battery$/) });
  });

  it('passes on the library’s words for a type it cannot read', () => {
    expect(valveWords('6')).toEqual({ ok: false, message: expect.stringMatching(/American type number/) });
    expect(valveWords('6V6GT')).toMatchObject({ ok: true, heater: '6.3 V parallel', systems: 'glass T-9 bulb (GT)' }); // RETMA numbering page
    expect(valveWords(' ')).toEqual({ ok: false, message: 'Enter the type printed on the valve.' });
  });
});

describe('nextPosition', () => {
  it('follows the highest position used', () => {
    expect(nextPosition([])).toBe('V1');
    expect(nextPosition([{ position: 'V1' }, { position: 'V5' }, { position: 'V3' }])).toBe('V6');
  });
});
