import { audioSymptoms } from './symptoms-audio';
import { powerSymptoms } from './symptoms-power';
import { rfSymptoms } from './symptoms-rf';
import type { Symptom, SymptomCause } from './symptom-types';

export { NO_SOURCE, POWERED_CAUTION } from './symptom-types';
export type { CauseTest, Symptom, SymptomCause } from './symptom-types';

/**
 * The symptom checklist: for each symptom, the likely causes, most likely first, each with the test that tells
 * it apart. Written in our own words from the trade's practice (TRADE.md §5); each cause names its source.
 */
export const symptoms: readonly Symptom[] = [...audioSymptoms, ...powerSymptoms, ...rfSymptoms];

export const symptomIds = symptoms.map((s) => s.id);

export function findSymptom(id: string): Symptom | undefined {
  return symptoms.find((s) => s.id === id);
}

export function findCause(symptomId: string, causeId: string): SymptomCause | undefined {
  return findSymptom(symptomId)?.causes.find((c) => c.id === causeId);
}
