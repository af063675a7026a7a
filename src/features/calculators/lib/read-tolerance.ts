import { parseTolerance, type Tolerance } from '../../../../shared/bench';
import { formatTolerance } from '../../../lib/format';

/** A tolerance field read: the fraction(s) for readingVerdict and how it was understood, or why not. */
export interface ToleranceReading {
  tolerance?: Tolerance;
  display?: string;
  error?: string;
}

/** Reads a tolerance typed in per cent ("10", "±10 %", "-20/+50") with the bench library, for display in a form. */
export function readTolerance(text: string): ToleranceReading {
  if (text.trim() === '') return {};
  try {
    const tolerance = parseTolerance(text);
    return { tolerance, display: formatTolerance(tolerance, 4) };
  } catch (err) {
    return { error: (err as Error).message };
  }
}
