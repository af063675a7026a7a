import type { MeasuredQuantity } from '../../../../shared/bench';

/** What the tolerance field takes for a kind of reading, and what a blank field means (the bench library's default). */
export function toleranceHint(quantity: MeasuredQuantity): string {
  const forms = 'Per cent, a letter (J, K, M, Z), -20/+50, or max/min';
  if (quantity === 'capacitance') return `${forms}; blank for −20/+50 % from 1 µF up (electrolytic), else ±20 %`;
  if (quantity === 'frequency') return 'An amount in kHz (2 kHz) or per cent; blank for ±2 kHz at an AM IF, ±25 kHz at 10.7 MHz';
  return `${forms}; blank for the usual ±20 %`;
}
