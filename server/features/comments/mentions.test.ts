import { describe, expect, it } from 'vitest';
import { findMentions } from './mentions';

// Product rules for @mentions (no outside source: these are Gridleak's own conventions).
const members = [
  { userId: 1, name: 'Mara Ellingsworth' },
  { userId: 2, name: 'Teodor Brask' },
  { userId: 3, name: 'Teo Vance' },
];

describe('findMentions', () => {
  it('when a full name or a first name follows @, then that member is mentioned', () => {
    expect(findMentions('@Teodor Brask can you look at R23?', members)).toEqual([2]);
    expect(findMentions('thanks @mara, measuring now', members)).toEqual([1]);
  });

  it('when a shorter name is a prefix of a longer one, then only the exact one matches', () => {
    expect(findMentions('@Teo what do you think', members)).toEqual([3]);
    expect(findMentions('@Teodor what do you think', members)).toEqual([2]);
  });

  it('when @ is part of an e-mail address or a word, then nobody is mentioned', () => {
    expect(findMentions('mail mara@cobbold-lane.test or x@Teodor', members)).toEqual([]);
  });
});
