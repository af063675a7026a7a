import { readingKinds, type MeasuredQuantity } from './reading-kinds';
import type { LimitKind } from './verdict-words';

/** How a reading of this kind, with this tolerance text, is judged: "max"/"min" typed as the tolerance turn a band's expected value into a limit. */
export function limitOf(quantity: MeasuredQuantity, tolerance = ''): LimitKind {
  const rule = readingKinds[quantity].rule;
  if (rule.type === 'capacitor-limit') return 'maximum';
  if (rule.type !== 'band') return rule.type;
  const typed = tolerance.trim().toLowerCase();
  if (/^(max|maximum|≤|<=)$/.test(typed)) return 'maximum';
  if (/^(min|minimum|≥|>=)$/.test(typed)) return 'minimum';
  return 'nominal';
}

/** A band kind judged by an amount in its unit (a frequency's kHz off), unless a per cent is typed. */
export function absoluteTolerance(quantity: MeasuredQuantity, tolerance = ''): boolean {
  const rule = readingKinds[quantity].rule;
  const typed = tolerance.trim().replace(/^±\s*/, '');
  return rule.type === 'band' && rule.absolute === true && (typed === '' || /[a-z]/i.test(typed));
}

/** The optional fields that mean something for a kind: a tolerance for a band, a rated voltage for a capacitor's limit, meters for a chart. */
export function applicableFields(quantity: MeasuredQuantity): {
  tolerance: boolean;
  rating: boolean;
  meterLoading: boolean;
} {
  const rule = readingKinds[quantity].rule;
  return {
    tolerance: rule.type === 'band',
    rating: rule.type === 'capacitor-limit',
    meterLoading: rule.type === 'band' && rule.meterLoading === true,
  };
}

/** The texts of a reading that depend on its kind. */
export interface KindTexts {
  quantity: MeasuredQuantity;
  tolerance?: string;
  rating?: string;
  chartMeter?: string;
  meter?: string;
  source?: string;
}

/** Blanks what a kind of reading does not use, so a value left over from another kind neither counts nor is stored. */
export function applicableTexts<T extends KindTexts>(texts: T): T {
  const applies = applicableFields(texts.quantity);
  const keep = (on: boolean, text: string | undefined) => (on ? (text ?? '') : '');
  return {
    ...texts,
    tolerance: keep(applies.tolerance, texts.tolerance),
    rating: keep(applies.rating, texts.rating),
    chartMeter: keep(applies.meterLoading, texts.chartMeter),
    meter: keep(applies.meterLoading, texts.meter),
    source: keep(applies.meterLoading, texts.source),
  };
}

/** What a reading judged out is called in the history, by the kind of limit it was judged against. */
export const outHeadings: Record<LimitKind, string> = {
  nominal: 'Out of tolerance',
  maximum: 'Over its limit',
  minimum: 'Under its minimum',
};
