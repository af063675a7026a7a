import { describe, expect, it } from 'vitest';
import { fieldOfMessage, previewVerdict } from './verdict-preview';

const texts = { quantity: 'dc-voltage' as const, expected: '250 V', tolerance: '10', rating: '', reading: '' };

describe('previewVerdict', () => {
  it('waits for a reading', () => {
    expect(previewVerdict(texts)).toEqual({ status: 'waiting' });
  });

  // Worst-case ESR for new electrolytics at 100 kHz, 20 °C: 22 µF 25 V reads at most 2.1 Ω
  // (widely circulated technicians' table, reproduced at glodark.com/design/esrchart.htm).
  it('judges ESR 1.1 Ω on 22 µF 25 V within the limit, ignoring a tolerance left from another kind', () => {
    const p = previewVerdict({
      quantity: 'esr',
      expected: '22µ',
      tolerance: 'nonsense',
      rating: '25 V',
      reading: '1.1',
    });
    expect(p).toMatchObject({ status: 'ready', verdict: { verdict: 'within' } });
  });

  it('ignores a rating for a voltage, where it does not apply', () => {
    expect(previewVerdict({ ...texts, rating: 'xyz', reading: '262 V' })).toMatchObject({
      status: 'ready',
      verdict: { verdict: 'within' },
    });
  });

  it('names the field the library refuses', () => {
    expect(previewVerdict({ ...texts, reading: '262 A' })).toMatchObject({ status: 'refused', field: 'reading' });
    expect(previewVerdict({ ...texts, expected: '4k7', reading: '262 V' })).toMatchObject({
      status: 'refused',
      field: 'expected',
    });
    expect(previewVerdict({ ...texts, tolerance: 'ten', reading: '262 V' })).toMatchObject({
      status: 'refused',
      field: 'tolerance',
    });
    expect(
      previewVerdict({ quantity: 'leakage', expected: '32µ', tolerance: '', rating: '350 Ω', reading: '1 mA' }),
    ).toMatchObject({
      status: 'refused',
      field: 'rating',
    });
  });
});

describe('fieldOfMessage', () => {
  it.each([
    ['Reading: a esr cannot be negative.', 'reading'],
    ['Expected value: must be above zero.', 'expected'],
    ['Rating: it is in Ω but V was expected here', 'rating'],
    ['location: Say where: a component reference or test point', 'location'],
    ['findingId: no such finding on this restoration.', 'findingId'],
    ["'x' is not a tolerance: write it in per cent", 'tolerance'],
    ['The expected value is 0, so a relative tolerance means nothing', 'expected'],
    ["'150': a value cannot fall more than 100 % below what is expected.", 'tolerance'],
  ])('reads %s as about %s', (message, field) => {
    expect(fieldOfMessage(message)).toBe(field);
  });

  it('leaves a message about nothing in particular alone', () => {
    expect(fieldOfMessage('Gridleak could not be reached.')).toBeUndefined();
  });
});
