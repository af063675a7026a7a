import { describe, expect, it } from 'vitest';
import type { Finding } from '../../../../shared/schemas/findings';
import type { Photo } from '../../../../shared/schemas/photos';
import { greeting, heroPhoto, repairedFindings, setName, stageInWords } from './owner-words';

const photo = (id: number, phase: Photo['phase'], takenAt: string, ownerVisible = true) =>
  ({ id, phase, takenAt, uploadedAt: takenAt, ownerVisible, view: 'front' }) as Photo;
const finding = (id: number, number: number, status: Finding['status']) => ({ id, number, status }) as Finding;

describe('owner words', () => {
  it('when the set is back with its owner, then it is ready to collect; otherwise it is with the workshop', () => {
    expect(stageInWords('returned')).toBe('Ready to collect');
    expect(stageInWords('repair')).toBe('With the workshop: repair');
    expect(stageInWords('on-hold')).toBe('With the workshop: on hold');
  });

  it('when a set is named, then make and model are joined', () => {
    expect(setName({ make: 'Aldermoor', model: 'Cantata' })).toBe('Aldermoor Cantata');
  });

  it('when greeting, then the first name and the part of the day are used', () => {
    expect(greeting('Mara Lind', new Date(2026, 10, 24, 9))).toBe('Good morning, Mara');
    expect(greeting('Mara Lind', new Date(2026, 10, 24, 15))).toBe('Good afternoon, Mara');
    expect(greeting(undefined, new Date(2026, 10, 24, 21))).toBe('Good evening');
  });

  it('when the reader is in another time zone than the server or the clock of the test, then their own hour is used', () => {
    // 08:00 UTC on 24 November 2026: 08:00 in London (GMT), 21:00 in Auckland (NZDT, UTC+13), midnight in
    // Los Angeles (PST, UTC-8); offsets from the IANA tz database.
    const at = new Date('2026-11-24T08:00:00Z');
    expect(greeting('Mara Lind', at, 'Europe/London')).toBe('Good morning, Mara');
    expect(greeting('Mara Lind', at, 'Pacific/Auckland')).toBe('Good evening, Mara');
    expect(greeting('Mara Lind', new Date('2026-11-24T22:00:00Z'), 'Pacific/Auckland')).toBe('Good morning, Mara');
    expect(greeting('Mara Lind', new Date('2026-11-24T22:00:00Z'), 'America/Los_Angeles')).toBe('Good afternoon, Mara');
  });
});

describe('heroPhoto', () => {
  it('when there are shared after photos, then the latest of them is the hero', () => {
    const hero = heroPhoto([
      photo(1, 'after', '2026-11-20T10:00:00Z'),
      photo(2, 'after', '2026-11-30T10:00:00Z'),
      photo(3, 'during', '2026-12-01T10:00:00Z'),
    ]);
    expect(hero?.id).toBe(2);
  });

  it('when no after photo is shared, then the latest shared photo is the hero, never an unshared one', () => {
    const hero = heroPhoto([
      photo(1, 'before', '2026-11-20T10:00:00Z'),
      photo(2, 'during', '2026-11-25T10:00:00Z'),
      photo(3, 'after', '2026-12-01T10:00:00Z', false),
    ]);
    expect(hero?.id).toBe(2);
    expect(heroPhoto([])).toBeUndefined();
  });
});

describe('repairedFindings', () => {
  it('when findings are at different statuses, then only repaired and verified ones remain, by number', () => {
    const list = repairedFindings([
      finding(1, 3, 'verified'),
      finding(2, 1, 'repaired'),
      finding(3, 2, 'confirmed'),
      finding(4, 4, 'dismissed'),
    ]);
    expect(list.map((f) => f.id)).toEqual([2, 1]);
  });
});
