import type { Part } from '../../../../shared/schemas/parts';
import { compareComponentRefs } from '../../../../shared/natural-order';

export interface ShoppingLine {
  /** The replacement as first written; blank when none is chosen yet. */
  part: string;
  rating: string;
  quantity: number;
  /** The references it is for, in schematic order. */
  refs: string[];
  /** Where the lines say they come from, each once (technicians only; owners get none). */
  sources: string[];
  /** Some line in the group carries a danger warning: check before buying. */
  danger: boolean;
}

/** Lines for the same part and rating, written a little differently ("33 µF  450V" and "33µf 450v"), are one purchase. */
const keyOf = (p: Part) => `${p.replacementPart}|${p.replacementRating}`.toLowerCase().replace(/\s+/g, '');

/** Only what goes in needs buying: a kept original or a removed part does not. */
const needsBuying = (p: Part) => p.action === 'replaced' || p.action === 'restuffed';

/**
 * What to buy for the parts in `state`, one line per replacement part and rating with the total quantity,
 * ordered by the first reference each is for.
 */
export function shoppingLines(parts: Part[], state: 'planned' | 'ordered'): ShoppingLine[] {
  const lines = new Map<string, ShoppingLine>();
  for (const p of parts) {
    if (p.state !== state || !needsBuying(p)) continue;
    const key = keyOf(p);
    const line = lines.get(key) ?? {
      part: p.replacementPart.trim(),
      rating: p.replacementRating.trim(),
      quantity: 0,
      refs: [],
      sources: [],
      danger: false,
    };
    line.quantity += p.quantity;
    line.refs.push(p.componentRef);
    line.danger ||= p.warnings.some((w) => w.level === 'danger');
    if (p.source.trim() && !line.sources.includes(p.source.trim())) line.sources.push(p.source.trim());
    lines.set(key, line);
  }
  const list = [...lines.values()];
  for (const line of list) line.refs.sort(compareComponentRefs);
  return list.sort((a, b) => compareComponentRefs(a.refs[0] ?? '', b.refs[0] ?? ''));
}
