import { describe, expect, it } from 'vitest';
import { compareComponentRefs, firstWithComponentRef } from './natural-order';

// Parts lists in service data print references with their numbers in counting order and a lettered
// sub-part after its parent (common practice, no source).
describe('component reference order', () => {
  it('when references are sorted, then numbers sort as numbers, not as text', () => {
    expect(['C14', 'C2', 'C1', 'R23', 'R3', 'V3'].sort(compareComponentRefs)).toEqual([
      'C1',
      'C2',
      'C14',
      'R3',
      'R23',
      'V3',
    ]);
  });

  it('when a reference has a lettered suffix, then it comes after the plain one and before the next number', () => {
    expect(['R2', 'R1B', 'R1A', 'R10', 'R1'].sort(compareComponentRefs)).toEqual(['R1', 'R1A', 'R1B', 'R2', 'R10']);
    expect(['C15b', 'R2', 'C2', 'C15a', 'C10', 'c3', 'V1'].sort(compareComponentRefs)).toEqual([
      'C2',
      'c3',
      'C10',
      'C15a',
      'C15b',
      'R2',
      'V1',
    ]);
  });

  it('when a line has no reference, then it goes after every referenced line', () => {
    expect(['', 'R5', ' ', 'C1'].sort(compareComponentRefs)).toEqual(['C1', 'R5', '', ' ']);
  });
});

describe('the first row with a reference', () => {
  const rows = [
    { id: 7, componentRef: 'C27' },
    { id: 3, componentRef: 'c27' },
    { id: 5, componentRef: 'R14' },
    { id: 9, componentRef: '' },
  ];

  it('when two rows carry the same reference in any case, then the one recorded first is named', () => {
    expect(firstWithComponentRef(rows, ' C27')?.id).toBe(3);
  });

  it('when the row being edited is the only other one, or the reference is blank or new, then none is named', () => {
    expect(firstWithComponentRef(rows, 'R14', 5)).toBeUndefined();
    expect(firstWithComponentRef(rows, '')).toBeUndefined();
    expect(firstWithComponentRef(rows, 'V5')).toBeUndefined();
    expect(firstWithComponentRef(rows, 'C27', 3)?.id).toBe(7);
  });
});
