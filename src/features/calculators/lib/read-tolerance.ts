import { parseTolerance, type Tolerance } from '../../../../shared/bench';
import { formatNumber } from './format';

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
    const pct = (f: number) => formatNumber(f * 100, 4);
    const display = typeof tolerance === 'number' ? `±${pct(tolerance)} %` : `\u2212${pct(tolerance.minus)} % / +${pct(tolerance.plus)} %`;
    return { tolerance, display };
  } catch (err) {
    return { error: (err as Error).message };
  }
}
