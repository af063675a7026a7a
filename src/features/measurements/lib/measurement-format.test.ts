import { describe, expect, it } from 'vitest';
import { expectedSummary, formatDeviation, formatTolerance } from './measurement-format';

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
    expect(expectedSummary({ ...m, quantity: 'dc-voltage', expectedText: '250 V', toleranceText: '10' })).toBe('250 V ±10 %');
    expect(expectedSummary({ ...m, quantity: 'dc-voltage', expectedText: '250 V' })).toBe('250 V ±20 % (usual)');
    expect(expectedSummary({ ...m, quantity: 'resistance' })).toBe('—');
  });
});
