import { describe, expect, it } from 'vitest';
import { emptyDraft, readDraft } from './step-draft';

// Product rules for the power-up step form (common practice, no source: a series lamp is described by its watts and volts).
describe('readDraft', () => {
  it('when a series-lamp step has no lamp rating or decision, then it names each missing box', () => {
    const result = readDraft(emptyDraft());
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['decision', 'lampVolts', 'lampWatts']);
  });

  it('when a step is complete, then only the readings with a value are sent, and numbers are read from text', () => {
    const draft = {
      ...emptyDraft(),
      lampWatts: '60',
      lampVolts: '230',
      appliedVolts: '230',
      decision: 'go-on' as const,
    };
    draft.readings[0] = { ...draft.readings[0]!, reading: '95 V' };
    const result = readDraft(draft);
    expect(result).toMatchObject({
      ok: true,
      input: { lampWatts: 60, lampVolts: 230, appliedVolts: 230, readings: [{ location: 'HT', reading: '95 V' }] },
    });
  });

  it('when no lamp is in circuit, then the lamp boxes are not sent', () => {
    const draft = {
      ...emptyDraft(),
      supply: 'variable-transformer' as const,
      lampWatts: '60',
      appliedVolts: '120',
      decision: 'go-on' as const,
    };
    expect(readDraft(draft)).toMatchObject({
      ok: true,
      input: { lampWatts: null, lampVolts: null, lampBehaviour: 'no-lamp' },
    });
  });
});
