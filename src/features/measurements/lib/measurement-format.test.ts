import { describe, expect, it } from 'vitest';
import { deviationWords, expectedSummary, formatDeviation, formatTolerance } from './measurement-format';

describe('formatDeviation', () => {
  it('signs a fraction as per cent with a true minus', () => {
    expect(formatDeviation(0.06)).toBe('+6.0 %');
    expect(formatDeviation(-0.375)).toBe('−37.5 %');
    expect(formatDeviation(0)).toBe('0.0 %');
    expect(formatDeviation(null)).toBe('—');
  });
});

describe('formatTolerance', () => {
  it('writes what was typed as a band', () => {
    expect(formatTolerance('10')).toBe('±10 %');
    expect(formatTolerance('-20/+50')).toBe('−20/+50 %');
    expect(formatTolerance('')).toBe('');
    expect(formatTolerance('ten')).toBe('ten');
  });
});

describe('expectedSummary', () => {
  const m = { expectedText: '', toleranceText: '', ratingText: '' };
  it('gives capacitance and rating for ESR and leakage, a minimum for insulation, and the band otherwise', () => {
    expect(expectedSummary({ ...m, quantity: 'esr', expectedText: '22µ', ratingText: '25 V' })).toBe('22µ 25 V');
    expect(expectedSummary({ ...m, quantity: 'insulation' })).toBe('min 1 MΩ');
    expect(expectedSummary({ ...m, quantity: 'insulation', expectedText: '2M' })).toBe('min 2M');
    expect(expectedSummary({ ...m, quantity: 'dc-voltage', expectedText: '250 V', toleranceText: '10' })).toBe(
      '250 V ±10 %',
    );
    expect(expectedSummary({ ...m, quantity: 'dc-voltage', expectedText: '250 V' })).toBe('250 V ±20 % (usual)');
    expect(expectedSummary({ ...m, quantity: 'resistance' })).toBe('—');
  });

  it('names the band the library applies when none is typed, and a stated maximum', () => {
    // IEC 60062 letter S for electrolytics; ±2 kHz for an AM IF (common practice, no source)
    expect(expectedSummary({ ...m, quantity: 'capacitance', expectedText: '47µ', expected: 47e-6 })).toBe(
      '47µ −20/+50 % (electrolytic)',
    );
    expect(expectedSummary({ ...m, quantity: 'frequency', expectedText: '470k', expected: 470e3 })).toBe(
      '470k ±2 kHz (usual)',
    );
    expect(expectedSummary({ ...m, quantity: 'resistance', expectedText: '0.1', toleranceText: 'max' })).toBe(
      'max 0.1',
    );
  });
});

describe('deviationWords', () => {
  const r = { toleranceText: '', readingText: '', reading: 0, reference: null, deviation: null };
  it('says an insulation reading is above its minimum rather than a per cent', () => {
    // in-service inspection code of practice: Class II minimum 2 MΩ
    expect(
      deviationWords({
        ...r,
        quantity: 'insulation',
        readingText: '200M',
        reading: 200e6,
        reference: 2e6,
        deviation: 99,
      }),
    ).toBe('200 MΩ, above the 2 MΩ minimum');
  });

  it('keeps an over-range reading as such', () => {
    expect(
      deviationWords({
        ...r,
        quantity: 'insulation',
        readingText: 'OL',
        reading: 1e6,
        reference: 1e6,
        deviation: null,
      }),
    ).toBe('over range, above the 1 MΩ minimum');
  });

  it('gives an IF its kHz off and a voltage its per cent', () => {
    expect(
      deviationWords({
        ...r,
        quantity: 'frequency',
        readingText: '395k',
        reading: 395e3,
        reference: 470e3,
        deviation: -75 / 470,
      }),
    ).toBe('\u221275 kHz');
    expect(
      deviationWords({
        ...r,
        quantity: 'dc-voltage',
        readingText: '200',
        reading: 200,
        reference: 180,
        deviation: 20 / 180,
      }),
    ).toBe('+11.1 %');
  });
});
