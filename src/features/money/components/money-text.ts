import { formatMoney, type Money } from '../../../../shared/money/currency';

/** An amount in the reader's locale, in its own currency (the workshop's). */
export const moneyText = (m: Money) =>
  formatMoney(m, typeof navigator === 'undefined' ? undefined : navigator.language);

export const rangeText = (low: Money, high: Money) =>
  low.amount === high.amount ? moneyText(low) : `${moneyText(low)} – ${moneyText(high)}`;

/** Minutes as hours the way a bench note writes them: "1.5 h". */
export const hoursText = (minutes: number) => `${Number((minutes / 60).toFixed(2))} h`;
