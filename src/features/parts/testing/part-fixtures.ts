import { partWarnings } from '../../../../shared/bench';
import type { Part, PartInput } from '../../../../shared/schemas/parts';

/** A ledger line as the server answers it, warnings worked out by the bench library as the server does. */
export function makePart(
  id: number,
  input: Partial<PartInput> & { componentRef: string },
  extra: Partial<Part> = {},
): Part {
  const p = {
    id,
    restorationId: 7,
    findingId: input.findingId ?? null,
    componentRef: input.componentRef,
    originalPart: input.originalPart ?? '',
    originalRating: input.originalRating ?? '',
    replacementPart: input.replacementPart ?? '',
    replacementRating: input.replacementRating ?? '',
    action: input.action ?? 'replaced',
    state: input.state ?? 'planned',
    mainsPosition: input.mainsPosition ?? 'none',
    quantity: input.quantity ?? 1,
    costMinor: input.costMinor ?? null,
    source: input.source ?? '',
    testedAfter: input.testedAfter ?? '',
    notes: input.notes ?? '',
    fittedAt: input.state === 'fitted' ? '2025-03-01T10:00:00.000Z' : null,
  };
  const goesIn = p.action === 'replaced' || p.action === 'restuffed';
  const warnings = goesIn
    ? partWarnings({
        original: `${p.originalPart} ${p.originalRating}`,
        replacement: `${p.replacementPart} ${p.replacementRating}`,
        mainsPosition: p.mainsPosition,
      })
    : [];
  return { ...p, warnings, ...extra };
}

/** What an owner receives: no cost, source or notes. */
export const asOwnerSees = (p: Part): Part => ({ ...p, costMinor: null, source: '', notes: '' });
