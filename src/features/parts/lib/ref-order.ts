const split = (ref: string) => /^([A-Za-z]*)(\d*)(.*)$/.exec(ref.trim()) ?? ['', ref, '', ''];

/** Orders references as a schematic's parts list does: by letters, then by number (C2 before C10), then suffix (C15a, C15b). */
export function compareRefs(a: string, b: string): number {
  const [, la = '', na = '', ra = ''] = split(a);
  const [, lb = '', nb = '', rb = ''] = split(b);
  const letters = la.toUpperCase().localeCompare(lb.toUpperCase());
  if (letters !== 0) return letters;
  const numbers = (na === '' ? Infinity : Number(na)) - (nb === '' ? Infinity : Number(nb));
  if (numbers !== 0 && !Number.isNaN(numbers)) return numbers;
  return ra.localeCompare(rb);
}
