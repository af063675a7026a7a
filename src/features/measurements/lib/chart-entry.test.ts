import { describe, expect, it } from 'vitest';
import { blankRow, isBlankRow, rowInput, rowPreview, rowProblem } from './chart-entry';

const row = { ...blankRow(1), location: ' V5 pin 7 ', expected: '250 V', tolerance: '10', reading: '262 V' };
const shared = { quantity: 'dc-voltage' as const, conditions: '230 V mains', method: '20 kΩ/V', ownerVisible: true };

describe('chart entry rows', () => {
  it('tells a blank row from a filled one, and what a filled one still lacks', () => {
    expect(isBlankRow(blankRow(2))).toBe(true);
    expect(isBlankRow({ ...blankRow(2), tolerance: '5' })).toBe(false);
    expect(rowProblem({ ...row, location: '' })).toMatch(/Say where/);
    expect(rowProblem({ ...row, reading: ' ' })).toMatch(/reading/);
    expect(rowProblem(row)).toBeUndefined();
  });

  it('turns a row into the API’s input with what the chart shares', () => {
    expect(rowInput(row, shared)).toEqual({
      location: 'V5 pin 7', quantity: 'dc-voltage', expected: '250 V', tolerance: '10', rating: '', reading: '262 V',
      conditions: '230 V mains', method: '20 kΩ/V', ownerVisible: true, powerOn: true,
    });
  });

  it('previews the verdict of a row', () => {
    expect(rowPreview(row, 'dc-voltage')).toMatchObject({ status: 'ready', verdict: { verdict: 'within' } });
    expect(rowPreview({ ...row, reading: '262 Ω' }, 'dc-voltage')).toMatchObject({ status: 'refused', field: 'reading' });
  });
});
