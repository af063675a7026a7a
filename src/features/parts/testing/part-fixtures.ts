import { partWarnings } from '../../../../shared/bench';
import { partInputSchema, type Part, type PartInput } from '../../../../shared/schemas/parts';

/**
 * A ledger line as the server answers it: what was sent, with the API's own defaults for what was not (the shared
 * input schema), warnings worked out by the bench library as the server does.
 */
export function makePart(
  id: number,
  sent: Partial<PartInput> & { componentRef: string },
  extra: Partial<Part> = {},
): Part {
  const input = partInputSchema.parse(sent);
  const p = {
    id,
    restorationId: 7,
    ...input,
    findingId: input.findingId ?? null,
    costMinor: input.costMinor ?? null,
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
