import { useMemo, useState } from 'react';
import { readQuantity } from '../lib/read-quantity';
import type { ExpectedUnit, QuantityReading } from '../lib/read-quantity';

/** A calculator field's text and what it reads as ({ value, error }), re-read on every keystroke. */
export interface QuantityField extends QuantityReading {
  setText: (text: string) => void;
}

/** `allowNegative` for a reading that can lie below zero; every other field refuses a negative value with a message. */
export function useQuantity(initial: string, expectUnit?: ExpectedUnit, { allowNegative = false } = {}): QuantityField {
  const [text, setText] = useState(initial);
  const reading = useMemo(() => readQuantity(text, expectUnit, { allowNegative }), [text, expectUnit, allowNegative]);
  return { ...reading, setText };
}
