import { describe, expect, it } from 'vitest';
import { dayLabel, groupByDay, timeOfDay } from './group-by-day';

const now = new Date('2026-12-02T12:00:00Z');

describe('groupByDay', () => {
  it('when events fall on two days, then they form two groups in the given order with weekday headings', () => {
    const groups = groupByDay(
      [
        { id: 3, at: '2026-11-25T08:00:00Z' },
        { id: 2, at: '2026-11-24T16:30:00Z' },
        { id: 1, at: '2026-11-24T09:15:00Z' },
      ],
      { timeZone: 'UTC', now },
    );
    expect(groups.map((g) => [g.label, g.events.map((e) => e.id)])).toEqual([
      ['Wednesday 25 November', [3]],
      ['Tuesday 24 November', [2, 1]],
    ]);
  });

  it('when the reader is in another time zone, then the day is theirs', () => {
    const groups = groupByDay([{ at: '2026-11-24T23:30:00Z' }], { timeZone: 'Europe/Berlin', now });
    expect(groups[0]?.label).toBe('Wednesday 25 November');
  });

  it('when a time cannot be read, then that event is left out', () => {
    expect(groupByDay([{ at: 'soon' }], { timeZone: 'UTC', now })).toEqual([]);
  });
});

describe('dayLabel and timeOfDay', () => {
  it('when the day is in an earlier year, then the year is added', () => {
    expect(dayLabel(new Date('2025-03-04T12:00:00Z'), { timeZone: 'UTC', now })).toBe('Tuesday 4 March 2025');
  });

  it('when an event has a time, then it reads on a 24-hour clock', () => {
    expect(timeOfDay('2026-11-24T16:05:00Z', 'UTC')).toBe('16:05');
  });
});
