/** A piece of a comment's text as it is drawn: plain words, a link, or an @mention of a member. */
export type CommentToken =
  { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string } | { kind: 'mention'; text: string };

const urlPattern = /\bhttps?:\/\/[^\s<>"]+/gi;
/** Punctuation that usually ends the sentence around a link rather than the link itself. */
const trailingPunctuation = /[.,;:!?')\]}]+$/;
const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The names a member can be mentioned by: the full name, and the first name alone (as the server reads them). */
export function mentionNames(members: readonly { name: string }[]): string[] {
  const names = new Set<string>();
  for (const m of members) {
    if (!m.name.trim()) continue;
    names.add(m.name.trim());
    names.add(m.name.trim().split(/\s+/)[0]!);
  }
  return [...names].sort((a, b) => b.length - a.length);
}

function splitMentions(text: string, names: string[], out: CommentToken[]) {
  if (!text) return;
  if (!names.length) return void out.push({ kind: 'text', text });
  const pattern = new RegExp(`(^|[^\\w@])(@(?:${names.map(escapeRegExp).join('|')}))(?!\\w)`, 'gi');
  let last = 0;
  for (const m of text.matchAll(pattern)) {
    const start = m.index + (m[1]?.length ?? 0);
    if (start > last) out.push({ kind: 'text', text: text.slice(last, start) });
    out.push({ kind: 'mention', text: m[2]! });
    last = start + m[2]!.length;
  }
  if (last < text.length) out.push({ kind: 'text', text: text.slice(last) });
}

/** Splits a comment into text, http(s) links and @mentions of the given members. Line breaks stay in the text. */
export function tokenizeComment(body: string, members: readonly { name: string }[]): CommentToken[] {
  const names = mentionNames(members);
  const out: CommentToken[] = [];
  let last = 0;
  for (const m of body.matchAll(urlPattern)) {
    const url = m[0].replace(trailingPunctuation, '');
    splitMentions(body.slice(last, m.index), names, out);
    out.push({ kind: 'link', text: url, href: url });
    last = m.index + url.length;
  }
  splitMentions(body.slice(last), names, out);
  return out;
}

/** The "@name" being typed just before the caret, if any: where it starts and what follows the @. */
export function mentionQueryAt(text: string, caret: number): { start: number; query: string } | null {
  const m = /(^|[^\w@])@([^\s@]{0,40})$/.exec(text.slice(0, caret));
  if (!m) return null;
  const query = m[2] ?? '';
  return { start: caret - query.length - 1, query };
}

/** Members whose name (or any word of it) begins with the query, best first. */
export function matchMembers<M extends { name: string }>(members: readonly M[], query: string, limit = 6): M[] {
  const q = query.toLowerCase();
  const score = (m: M) => {
    const name = m.name.toLowerCase();
    if (name.startsWith(q)) return 0;
    if (name.split(/\s+/).some((w) => w.startsWith(q))) return 1;
    return name.includes(q) ? 2 : 3;
  };
  return members
    .map((m) => ({ m, s: score(m) }))
    .filter((x) => x.s < 3)
    .sort((a, b) => a.s - b.s || a.m.name.localeCompare(b.m.name))
    .slice(0, limit)
    .map((x) => x.m);
}

/** Replaces the "@query" typed from `start` to `caret` with the member's full name, and a space unless one follows. */
export function insertMention(
  text: string,
  start: number,
  caret: number,
  name: string,
): { text: string; caret: number } {
  const inserted = /^\s/.test(text.slice(caret)) ? `@${name}` : `@${name} `;
  return { text: text.slice(0, start) + inserted + text.slice(caret), caret: start + inserted.length };
}
