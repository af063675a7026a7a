import { partWarnings, type PartWarning } from '../../../../shared/bench';
import type { Part } from '../../../../shared/schemas/parts';

type Draft = Pick<
  Part,
  'action' | 'originalPart' | 'originalRating' | 'replacementPart' | 'replacementRating' | 'mainsPosition'
>;

const joined = (...texts: string[]) =>
  texts
    .map((t) => t.trim())
    .filter(Boolean)
    .join(' ');

/**
 * The warnings the server will compute for a line, worked out while it is typed (the server's are the truth once
 * saved). As on the server, only a part that goes in is judged: nothing is fitted for a kept or removed part.
 */
export function previewWarnings(d: Draft): PartWarning[] {
  if (d.action !== 'replaced' && d.action !== 'restuffed') return [];
  return partWarnings({
    original: joined(d.originalPart, d.originalRating),
    replacement: joined(d.replacementPart, d.replacementRating),
    mainsPosition: d.mainsPosition,
  });
}

/** Whether a line is about a capacitor: a C reference, a capacitance in a rating, or the word in a part's name. */
export function isCapacitor(
  d: Pick<Part, 'componentRef' | 'originalPart' | 'originalRating' | 'replacementPart' | 'replacementRating'>,
): boolean {
  if (/^C\d/i.test(d.componentRef.trim())) return true;
  const text = joined(d.originalPart, d.originalRating, d.replacementPart, d.replacementRating);
  // Capacitances as marked: 47µF, 47UF, 0.1 mfd, 8 MF (old American microfarads), 100 mmfd, 4n7.
  return /capacitor|electrolytic|\bcap\b|\d\s*[pnuµμ]F|\d\s*m{0,2}fd\b|\d\s*MF\b|\d[pnuµμ]\d/i.test(text);
}
