import type { SymptomCheckReading } from '../../../shared/schemas/symptom-checks';
import type { measurements } from '../../db/schema';

/** A reading as a checklist result or an answered request shows it: where, what was read against what, the verdict. */
export const readingSummary = (m: typeof measurements.$inferSelect): SymptomCheckReading => ({
  id: m.id,
  location: m.location,
  reading: m.readingText,
  expected: m.expectedText,
  verdict: m.verdict,
  verdictReason: m.verdictReason,
});
