import type { MeasuredQuantity } from '../reading-kinds';

/** "common practice, no source" when a line rests on the trade's habit rather than a text we read. */
export const NO_SOURCE = 'common practice, no source';

/** The test that tells one cause from the others: where to measure, how, and what a healthy set reads. */
export interface CauseTest {
  /** Where, in the terms a service sheet uses ("V3 anode, pin 6", "across the reservoir capacitor"). */
  where: string;
  /** What to do there, and with what. */
  how: string;
  /** The reading that clears this cause; anything else points at it. */
  expected: string;
  /** The test is made with the set switched on: the safety cautions are shown beside it. */
  powered: boolean;
  /** When the answer is a meter reading: what kind, so it can be entered as a reading with its verdict. */
  quantity?: MeasuredQuantity;
  /** A starting location for that reading (the person changes it to the set's own reference). */
  location?: string;
}

export interface SymptomCause {
  /** Stable within its symptom: results are stored against `${symptom.id}/${cause.id}`. */
  id: string;
  cause: string;
  test: CauseTest;
  /** Source keys from the trade notes (S60, W2…) or NO_SOURCE; "(from memory)" where it is. */
  source: string;
}

export interface Symptom {
  id: string;
  title: string;
  /** What the restorer notices, in a sentence. */
  description: string;
  /** Most likely first. */
  causes: SymptomCause[];
}

/** Shown beside every test made with the set powered. */
export const POWERED_CAUTION =
  'Measured with the set switched on: HT is often 250 V or more and a live-chassis (AC/DC) set has mains on its chassis. ' +
  'Work through an isolating transformer and a lamp limiter, clip the meter on with the set off, keep one hand away from the chassis, ' +
  'and discharge the capacitors before touching anything. Follow your local codes and licensed practice; if in doubt, have a qualified person do it.';
