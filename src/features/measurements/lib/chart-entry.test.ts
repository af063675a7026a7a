import { describe, expect, it } from 'vitest';
import { blankRow, isBlankRow, rowInput, rowPreview, rowProblem } from './chart-entry';

const row = { ...blankRow(1), location: ' V5 pin 7 ', expected: '250 V', tolerance: '10', reading: '262 V' };
const shared = {
  quantity: 'dc-voltage' as const,
  conditions: '230 V mains',
  method: '20 kΩ/V',
  chartMeter: '',
  meter: '',
  ownerVisible: true,
};

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
      location: 'V5 pin 7',
      quantity: 'dc-voltage',
      expected: '250 V',
      tolerance: '10',
      rating: '',
      reading: '262 V',
      conditions: '230 V mains',
      method: '20 kΩ/V',
      chartMeter: '',
      meter: '',
      source: '',
      ownerVisible: true,
      powerOn: true,
    });
  });

  it('previews the verdict of a row', () => {
    expect(rowPreview(row, 'dc-voltage')).toMatchObject({ status: 'ready', verdict: { verdict: 'within' } });
    expect(rowPreview({ ...row, reading: '262 Ω' }, 'dc-voltage')).toMatchObject({
      status: 'refused',
      field: 'reading',
    });
  });

  it('judges a row against what your meter should read when the chart names its meter and the row its source', () => {
    // Voltage divider worked by hand: a 1 kΩ/V meter on its 1,000 V range is 1 MΩ; 100 V through 100 kΩ into it means
    // 110 V open circuit; a 20 kΩ/V meter on 250 V (5 MΩ) reads 110 × 5 / 5.1 = 107.8 V there.
    const point = {
      ...blankRow(3),
      location: 'V3 anode',
      expected: '100',
      tolerance: '5',
      reading: '106',
      source: '100k',
    };
    expect(rowPreview(point, 'dc-voltage')).toMatchObject({ status: 'ready', verdict: { verdict: 'marginal' } }); // +6 % of 100 V
    const judged = rowPreview(point, 'dc-voltage', { chartMeter: '1k/V 1000 V', meter: '20k/V 250 V' });
    expect(judged).toMatchObject({ status: 'ready', verdict: { verdict: 'within' } });
    expect(judged.status === 'ready' && judged.verdict.reference).toBeCloseTo(107.843, 2);
    expect(rowInput(point, { ...shared, chartMeter: '1k/V 1000 V', meter: '20k/V 250 V' })).toMatchObject({
      chartMeter: '1k/V 1000 V',
      meter: '20k/V 250 V',
      source: '100k',
    });
  });
});
