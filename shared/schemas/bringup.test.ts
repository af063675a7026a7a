import { describe, expect, it } from 'vitest';
import { prePowerItems, prePowerMissing, prePowerCheckInputSchema } from './bringup';

// Product rules (the pre-power checklist as the trade describes it; common practice, no source).
describe('prePowerMissing', () => {
  it('when nothing is marked, then every item is listed, each saying what to do', () => {
    const missing = prePowerMissing([]);
    expect(missing).toHaveLength(prePowerItems.length);
    expect(missing.every((m) => /mark it done, not applicable or waived/.test(m))).toBe(true);
  });

  it('when every item is done, not applicable with a reason or waived with a reason, then nothing is missing', () => {
    const items = prePowerItems.map((item, i) =>
      i === 0
        ? { item, status: 'waived' as const, reason: 'Tap fixed at 240 V' }
        : i === 1
          ? { item, status: 'not-applicable' as const, reason: 'No filter capacitors' }
          : { item, status: 'done' as const, reason: '' },
    );
    expect(prePowerMissing(items)).toEqual([]);
  });

  it('when a waived item has no reason, then it asks for the reason', () => {
    const items = prePowerItems.map((item) => ({ item, status: 'done' as const, reason: '' }));
    const [first, ...rest] = items;
    expect(prePowerMissing([{ ...first!, status: 'waived', reason: ' ' }, ...rest])).toEqual([
      'Mains tap matched to the local mains: give the reason it is waived',
    ]);
  });
});

describe('prePowerCheckInputSchema', () => {
  it('refuses "not applicable" without a reason and accepts "done" without one', () => {
    expect(prePowerCheckInputSchema.safeParse({ item: 'discharge-method', status: 'not-applicable' }).success).toBe(
      false,
    );
    expect(prePowerCheckInputSchema.safeParse({ item: 'discharge-method', status: 'done' }).success).toBe(true);
  });
});
