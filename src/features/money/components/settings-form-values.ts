import { z } from 'zod';
import { isCurrencyCode, minorDigits, parseMoney } from '../../../../shared/money/currency';
import { taxRoundings } from '../../../../shared/money/tax';
import { isTimeZone, type WorkshopSettings } from '../../../../shared/schemas/estimates';

const percent = /^\d+(\.\d{1,2})?$/;

/** The settings as a person types them: amounts in the currency's major unit, rates in per cent. */
export const settingsFormSchema = z
  .object({
    currency: z.string().trim().toUpperCase().refine(isCurrencyCode, 'Type an ISO 4217 code such as GBP, EUR or USD.'),
    labourRate: z.string().trim().min(1, 'Type the hourly rate.'),
    partsMarkup: z.string().trim().regex(percent, 'Type a per cent, e.g. 20 or 12.5.'),
    taxOn: z.boolean(),
    taxName: z.string().trim().min(1, 'Name the tax, e.g. VAT or GST.').max(40),
    taxRate: z.string().trim(),
    taxRounding: z.enum(taxRoundings),
    estimateApprovalRequired: z.boolean(),
    invoicePrefix: z
      .string()
      .trim()
      .max(12, 'Twelve characters at most.')
      .regex(/^[A-Za-z0-9./-]*$/, 'Use letters, digits, "-", "/" or "." only.'),
    timeZone: z.string().trim().refine(isTimeZone, 'Type an IANA time zone such as Europe/London.'),
  })
  .superRefine((v, ctx) => {
    if (isCurrencyCode(v.currency) && !parseMoney(v.labourRate, v.currency))
      ctx.addIssue({
        code: 'custom',
        path: ['labourRate'],
        message: `Type the rate in ${v.currency}, with at most ${minorDigits(v.currency)} decimals.`,
      });
    if (percent.test(v.partsMarkup) && Number(v.partsMarkup) > 1000)
      ctx.addIssue({ code: 'custom', path: ['partsMarkup'], message: 'A markup above 1000% is surely a typing slip.' });
    if (v.taxOn && (!percent.test(v.taxRate) || Number(v.taxRate) > 100))
      ctx.addIssue({ code: 'custom', path: ['taxRate'], message: 'Type the tax rate in per cent, 0 to 100, e.g. 20.' });
  });
export type SettingsFormValues = z.infer<typeof settingsFormSchema>;

const toBasisPoints = (text: string) => Math.round(Number(text) * 100);
const majorText = (minor: number, currency: string) => {
  const digits = minorDigits(currency);
  return digits ? (minor / 10 ** digits).toFixed(digits) : String(minor);
};

export function toFormValues(s: WorkshopSettings): SettingsFormValues {
  return {
    currency: s.currency,
    labourRate: majorText(s.labourRate, s.currency),
    partsMarkup: String(s.partsMarkupBasisPoints / 100),
    taxOn: s.taxRateBasisPoints !== null,
    taxName: s.taxName,
    taxRate: s.taxRateBasisPoints === null ? '20' : String(s.taxRateBasisPoints / 100),
    taxRounding: s.taxRounding,
    estimateApprovalRequired: s.estimateApprovalRequired,
    invoicePrefix: s.invoicePrefix,
    timeZone: s.timeZone,
  };
}

/** The typed values as the API stores them: minor units and basis points. */
export function toSettings(v: SettingsFormValues): WorkshopSettings {
  return {
    currency: v.currency,
    labourRate: parseMoney(v.labourRate, v.currency)!.amount,
    partsMarkupBasisPoints: toBasisPoints(v.partsMarkup),
    taxName: v.taxName,
    taxRateBasisPoints: v.taxOn ? toBasisPoints(v.taxRate) : null,
    taxRounding: v.taxRounding,
    estimateApprovalRequired: v.estimateApprovalRequired,
    invoicePrefix: v.invoicePrefix,
    timeZone: v.timeZone,
  };
}
