import { describe, expect, it } from 'vitest';
import { measuredQuantities } from '../reading-kinds';
import { findCause, NO_SOURCE, symptoms } from './index';

// The order of the causes follows the trade notes' "check in this order" column (TRADE.md §5, sources S1–S65
// and W1–W14 listed in §7); symptoms the notes lack are marked "common practice, no source".
const SOURCE_KEY = /^(S\d+[a-c]?|W\d+)$/;

describe('the symptom checklist data', () => {
  it('when read, then every symptom has an id used once, a title, a description and at least one cause', () => {
    expect(new Set(symptoms.map((s) => s.id)).size).toBe(symptoms.length);
    for (const s of symptoms) {
      expect(s.title.trim(), s.id).not.toBe('');
      expect(s.description.trim(), s.id).not.toBe('');
      expect(s.causes.length, s.id).toBeGreaterThan(0);
      expect(new Set(s.causes.map((c) => c.id)).size, s.id).toBe(s.causes.length);
    }
  });

  it('when read, then each cause has a test saying where, how and the expected reading, and names its source', () => {
    for (const s of symptoms)
      for (const c of s.causes) {
        const at = `${s.id}/${c.id}`;
        expect(c.cause.trim(), at).not.toBe('');
        expect(c.test.where.trim(), at).not.toBe('');
        expect(c.test.how.trim(), at).not.toBe('');
        expect(c.test.expected.trim(), at).not.toBe('');
        expect(typeof c.test.powered, at).toBe('boolean');
        const keys = c.source.replace(/\s*\(from memory\)$/, '');
        if (!keys.startsWith(NO_SOURCE)) for (const key of keys.split(/,\s*/)) expect(key, at).toMatch(SOURCE_KEY);
      }
  });

  it('when a test is answered by a meter reading, then it names a kind of reading the bench judges and a starting location', () => {
    for (const s of symptoms)
      for (const c of s.causes)
        if (c.test.quantity) {
          expect(measuredQuantities, `${s.id}/${c.id}`).toContain(c.test.quantity);
          expect(c.test.location?.trim(), `${s.id}/${c.id}`).toBeTruthy();
        }
  });

  it('when the symptoms a restorer most often brings are looked for, then each is on the list', () => {
    const titles = symptoms.map((s) => s.id);
    for (const id of [
      'silent-valves-light',
      'hum',
      'crackle-volume',
      'fades-warm',
      'one-band-dead',
      'distortion-loud',
      'dead-dial-dark',
      'whistle-tuning',
      'motorboating',
      'lamp-bright-fuse',
      'red-plating',
      'charred-cathode',
      'hiss-no-stations',
      'weak-double-peaks',
      'crackle-random',
      'static-tuning',
      'avc-distortion',
      'microphonic',
    ])
      expect(titles).toContain(id);
  });

  it("when the causes are listed, then they keep the trade notes' order of likelihood (TRADE.md §5)", () => {
    const order = (id: string) => symptoms.find((s) => s.id === id)!.causes.map((c) => c.id);
    // S60, S41: electrolytics, then earths, then heater-cathode leakage.
    expect(order('hum')).toEqual(['smoothing-caps', 'poor-earth', 'heater-cathode-leak']);
    // S33, S12b: the coupling capacitor, then the bias, then the screen resistor.
    expect(order('red-plating')).toEqual(['coupling-positive', 'lost-bias', 'screen-resistor']);
    // S26, S43: alignment is the last thing to touch.
    expect(order('weak-double-peaks').at(-1)).toBe('alignment');
    // S1, S12a: reservoir short before the rectifier before the transformer.
    expect(order('lamp-bright-fuse')).toEqual(['reservoir-short', 'rectifier-short', 'transformer-fault']);
  });

  it('when a cause is looked up by its symptom and id, then it is found, and an unknown one is not', () => {
    expect(findCause('hum', 'poor-earth')?.test.quantity).toBe('resistance');
    expect(findCause('hum', 'no-such-cause')).toBeUndefined();
    expect(findCause('no-such-symptom', 'poor-earth')).toBeUndefined();
  });
});
