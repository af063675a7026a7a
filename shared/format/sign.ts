/** The minus sign every displayed negative number uses (U+2212), never the hyphen-minus. Defined only here. */
export const MINUS = '\u2212';

/** "+" above zero, "−" below; at zero `zero` ("" unless a caller shows "+0"). */
export const signOf = (value: number, zero = ''): string => (value > 0 ? '+' : value < 0 ? MINUS : zero);

/** A number already written as text, with a true minus; "+" in front when `plus` and it is not negative. */
export function withSign(text: string, plus = false): string {
  if (text.startsWith('-')) return `${MINUS}${text.slice(1)}`;
  return plus ? `+${text}` : text;
}

/** Every hyphen-minus in a number's text as a true minus: "-12 V" → "−12 V". */
export const trueMinus = (text: string): string => text.replace(/-/g, MINUS);
