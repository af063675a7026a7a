import { z } from 'zod';
import { partInputSchema, type Part, type PartInput } from '../../../../shared/schemas/parts';
import { minorToText, parseCost, type Currency } from './money';

const quantityMessage = 'A whole number from 1 to 999';

/**
 * The API's own rules, with the fields as a form holds them: the finding link, quantity and cost as typed text
 * ('' for none). The cost is typed in major units of the chosen currency and sent in minor units.
 */
export const partFormSchema = (currency: Currency) =>
  partInputSchema.omit({ findingId: true, quantity: true, costMinor: true }).extend({
    findingId: z.string(),
    quantity: z
      .string()
      .trim()
      .regex(/^\d{1,3}$/, quantityMessage)
      .refine((v) => Number(v) >= 1, quantityMessage),
    cost: z.string().superRefine((text, ctx) => {
      const read = parseCost(text, currency);
      if (!read.ok) ctx.addIssue({ code: 'custom', message: read.message });
    }),
  });

export type PartFormValues = z.input<ReturnType<typeof partFormSchema>>;
export type PartFormOutput = z.output<ReturnType<typeof partFormSchema>>;
/** Every field present: what the form holds at any moment. */
export type PartDraft = Required<PartFormValues>;

export const blankPart: PartDraft = {
  componentRef: '',
  action: 'replaced',
  state: 'planned',
  originalPart: '',
  originalRating: '',
  replacementPart: '',
  replacementRating: '',
  mainsPosition: 'none',
  quantity: '1',
  cost: '',
  source: '',
  testedAfter: '',
  notes: '',
  findingId: '',
};

export const valuesOf = (p: Part, currency: Currency): PartDraft => ({
  componentRef: p.componentRef,
  action: p.action,
  state: p.state,
  originalPart: p.originalPart,
  originalRating: p.originalRating,
  replacementPart: p.replacementPart,
  replacementRating: p.replacementRating,
  mainsPosition: p.mainsPosition,
  quantity: String(p.quantity),
  cost: minorToText(p.costMinor, currency),
  source: p.source,
  testedAfter: p.testedAfter,
  notes: p.notes,
  findingId: p.findingId === null ? '' : String(p.findingId),
});

/** The checked form as the API takes it, for a new line or (every field sent) a change to one. */
export function toInput(
  { findingId, quantity, cost, ...rest }: PartFormOutput,
  currency: Currency,
): PartInput & { costMinor: number | null; findingId: number | null } {
  const read = parseCost(cost, currency);
  return {
    ...rest,
    findingId: findingId === '' ? null : Number(findingId),
    quantity: Number(quantity),
    costMinor: read.ok ? read.minor : null,
  };
}

/** After saving a new line the form is ready for the next, as a recap runs: same action, state and supplier. */
export const nextBlank = (last: PartDraft): PartDraft => ({
  ...blankPart,
  action: last.action,
  state: last.state,
  source: last.source,
});
