// Small rules of thumb the calculators add around the library's results. Each says where it comes from.

export type Verdict = 'within' | 'marginal' | 'out';

/**
 * An ESR reading against the table's expected maximum. Table A's own advice is to be wary of a part
 * reading more than double its figure, so: at or under the figure is within, up to double is marginal,
 * beyond double is out.
 */
export function esrVerdict(readingOhms: number, limitOhms: number): Verdict {
  if (readingOhms <= limitOhms) return 'within';
  if (readingOhms <= 2 * limitOhms) return 'marginal';
  return 'out';
}

// Common resistor power ratings, watts (common practice, no single source).
const RATINGS = [0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 25, 50] as const;

/** The first common rating of at least twice the dissipation (common practice: a resistor run at half its rating). */
export function suggestedRating(watts: number): number | undefined {
  return RATINGS.find((rating) => rating >= 2 * watts);
}

/** Splits a line-up typed as "UCH42 UAF42, UBC41; UL41 + UY41" into its valve names. */
export function lineUpItems(text: string): string[] {
  return text.split(/[\s,;+/]+/).filter((item) => item !== '');
}
