/**
 * Finds the members a comment @mentions: "@Teodor Brask" or "@Teodor" (first name), case-insensitive.
 * Full names are tried first so "@Teo" does not match "Teodor".
 */
export function findMentions(body: string, members: { userId: number; name: string }[]): number[] {
  const found = new Set<number>();
  const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  for (const m of members) {
    const first = m.name.split(/\s+/)[0] ?? m.name;
    for (const candidate of [m.name, first])
      if (new RegExp(`(^|[^\\w@])@${escape(candidate)}(?![\\w])`, 'i').test(body)) found.add(m.userId);
  }
  return [...found];
}
