import { describe, expect, it } from 'vitest';
import { compareRefs } from './ref-order';

describe('reference order', () => {
  it('sorts by letters, then number, then suffix, as a parts list does', () => {
    expect(['C15b', 'R2', 'C2', 'C15a', 'C10', 'c3', 'V1'].sort(compareRefs)).toEqual(['C2', 'c3', 'C10', 'C15a', 'C15b', 'R2', 'V1']);
  });
});
