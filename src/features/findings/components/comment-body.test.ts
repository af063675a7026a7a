import { describe, expect, it } from 'vitest';
import { insertMention, matchMembers, mentionQueryAt, tokenizeComment } from './comment-body';

// Gridleak's own rules for comment text (no outside source): the same mention rule as the server's.
const members = [
  { userId: 1, name: 'Tessa Bench' },
  { userId: 2, name: 'Teodor Brask' },
  { userId: 3, name: 'Mara Lind' },
];

describe('tokenizeComment', () => {
  it('when a link ends a sentence, then the full stop is not part of the link', () => {
    expect(tokenizeComment('see https://example.org/a?b=1.', [])).toEqual([
      { kind: 'text', text: 'see ' },
      { kind: 'link', text: 'https://example.org/a?b=1', href: 'https://example.org/a?b=1' },
      { kind: 'text', text: '.' },
    ]);
  });

  it('when only a scheme other than http(s) is written, then nothing becomes a link', () => {
    expect(tokenizeComment('javascript:alert(1) ftp://x.org', []).every((t) => t.kind === 'text')).toBe(true);
  });

  it('when a full or first name follows @, then that is a mention, but not an e-mail address or a longer word', () => {
    const tokens = tokenizeComment('@Teodor Brask and @mara, not tessa@bench.test or @Teodorx', members);
    expect(tokens.filter((t) => t.kind === 'mention').map((t) => t.text)).toEqual(['@Teodor Brask', '@mara']);
    expect(tokens.map((t) => t.text).join('')).toBe('@Teodor Brask and @mara, not tessa@bench.test or @Teodorx');
  });

  it('when there are line breaks, then they stay in the text', () => {
    expect(tokenizeComment('a\nb', members)).toEqual([{ kind: 'text', text: 'a\nb' }]);
  });
});

describe('mention helpers', () => {
  it('when the caret follows "@te", then the query is "te" from the @', () => {
    expect(mentionQueryAt('ask @te', 7)).toEqual({ start: 4, query: 'te' });
    expect(mentionQueryAt('mail me@te', 10)).toBeNull();
    expect(mentionQueryAt('@te now', 7)).toBeNull();
  });

  it('when members are matched, then names starting with the query come before names with a later word starting with it', () => {
    expect(matchMembers(members, 'l').map((m) => m.name)).toEqual(['Mara Lind']);
    expect(matchMembers(members, 'te').map((m) => m.name)).toEqual(['Teodor Brask', 'Tessa Bench']);
    expect(matchMembers(members, 'b').map((m) => m.name)).toEqual(['Teodor Brask', 'Tessa Bench']);
  });

  it('when a member is picked, then the typed @query becomes the full name and a space', () => {
    expect(insertMention('ask @te', 4, 7, 'Teodor Brask')).toEqual({ text: 'ask @Teodor Brask ', caret: 18 });
    expect(insertMention('ask @te please', 4, 7, 'Teodor Brask')).toEqual({
      text: 'ask @Teodor Brask please',
      caret: 17,
    });
  });
});
