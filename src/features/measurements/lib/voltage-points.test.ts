import { describe, expect, it } from 'vitest';
import { fivePoints, makeMeasurement, volts } from '../testing/measurement-fixtures';
import { plotRows } from './plot-rows';
import { groupOf, groupPoints, plotLimit, plotSummary, voltagePoints } from './voltage-points';

describe('voltagePoints', () => {
  it('keeps only voltages, the latest at each location, in valve then pin order', () => {
    const esr = makeMeasurement(9, {
      location: 'C26',
      quantity: 'esr',
      expected: '22µ',
      rating: '25 V',
      reading: '1.1',
    });
    const older = { ...volts(10, 'V5 pin 7', '250 V', '100 V'), measuredAt: '2026-01-01T09:00:00.000Z' };
    const points = voltagePoints([older, ...fivePoints(), esr]);
    expect(points.map((p) => p.label)).toEqual(['V1 pin 6', 'V4 pin 1', 'V5 pin 3', 'V5 pin 7', 'V5 pin 9']);
    expect(points.find((p) => p.label === 'V5 pin 7')?.reading).toBe(320);
  });

  it('keeps AC and DC at one pin apart, and uses the usual ±20 % when no tolerance is given', () => {
    const ac = makeMeasurement(1, {
      location: 'V3 pin 4',
      quantity: 'ac-voltage',
      expected: '6.3 V',
      reading: '6.5 V',
    });
    const dc = makeMeasurement(2, {
      location: 'V3 pin 4',
      quantity: 'dc-voltage',
      expected: '2 V',
      tolerance: '-10/+30',
      reading: '2.1 V',
    });
    const [d, a] = voltagePoints([ac, dc]);
    expect(a).toMatchObject({ label: 'V3 pin 4 (AC)', band: '±20 % (usual)', bandPct: [-20, 20] });
    expect(d).toMatchObject({ label: 'V3 pin 4', band: '−10/+30 %', bandPct: [-10, 30] });
  });

  it('groups by the valve the point belongs to', () => {
    expect(groupOf('V5 pin 7')).toBe('V5');
    expect(groupOf('v12 pin 1')).toBe('V12');
    expect(groupOf('HT line')).toBe('HT line');
    expect(groupPoints(voltagePoints(fivePoints())).map((g) => [g.group, g.points.length])).toEqual([
      ['V1', 1],
      ['V4', 1],
      ['V5', 3],
    ]);
  });
});

describe('the plot', () => {
  it('sizes its axis to the widest marginal zone or reading, in tens, at most ±100 %', () => {
    const points = voltagePoints(fivePoints());
    expect(plotLimit(points)).toBe(40);
    expect(plotLimit(voltagePoints([volts(1, 'V6 pin 3', '2 V', '9 V')]))).toBe(100);
  });

  it('holds an off-scale reading at the edge and says which side', () => {
    const [row] = plotRows(voltagePoints([volts(1, 'V6 pin 3', '2 V', '9 V')]), 100);
    expect(row).toMatchObject({ x: 100, offScale: 'high', band: [-10, 10], zone: [-15, 15] });
  });

  it('puts every point that is not within into the summary, in words', () => {
    const marginal = volts(6, 'V2 pin 1', '100 V', '113 V');
    expect(plotSummary(voltagePoints([...fivePoints(), marginal]))).toBe(
      'Voltage chart, 6 points: 4 within, 1 marginal, 1 out. Out of tolerance: V5 pin 7 reads 320 V against 250 V ±10 %. ' +
        'Marginal: V2 pin 1 reads 113 V against 100 V ±10 %.',
    );
    expect(plotSummary(voltagePoints([volts(1, 'V1 pin 6', '90 V', '92 V')]))).toBe(
      'Voltage chart, 1 point: 1 within. None out of tolerance.',
    );
  });

  it('names a point judged against a limit ("max" or "min" typed as its tolerance) as over or under it, not out of tolerance', () => {
    // A rectifier's HT typed as a maximum: 320 V against at most 250 V is over the limit (common practice, no source).
    const overMax = makeMeasurement(7, {
      location: 'HT line',
      quantity: 'dc-voltage',
      expected: '250 V',
      tolerance: 'max',
      reading: '320 V',
    });
    expect(plotSummary(voltagePoints([...fivePoints(), overMax]))).toBe(
      'Voltage chart, 6 points: 4 within, 2 out. Out of tolerance: V5 pin 7 reads 320 V against 250 V ±10 %. ' +
        'Over its limit: HT line reads 320 V against a maximum of 250 V.',
    );
    const underMin = makeMeasurement(8, {
      location: 'V1 pin 6',
      quantity: 'dc-voltage',
      expected: '80 V',
      tolerance: 'min',
      reading: '92 V',
    });
    expect(plotSummary(voltagePoints([volts(1, 'V5 pin 9', '250 V', '255 V'), underMin]))).toBe(
      'Voltage chart, 2 points: 2 within. None out of tolerance or under its minimum.',
    );
  });

  it('draws a limit as everything on its side of the expected value, with no band or marginal zone about it', () => {
    // A maximum passes any reading at or below it, a minimum any at or above it (common practice, no source).
    const max = makeMeasurement(7, {
      location: 'HT line',
      quantity: 'dc-voltage',
      expected: '250 V',
      tolerance: 'max',
      reading: '240 V',
    });
    const min = makeMeasurement(8, {
      location: 'V1 pin 6',
      quantity: 'dc-voltage',
      expected: '80 V',
      tolerance: 'min',
      reading: '92 V',
    });
    const points = voltagePoints([max, min]);
    expect(points.map((p) => [p.band, p.bandPct])).toEqual([
      ['maximum', null],
      ['minimum', null],
    ]);
    // Only the readings size the axis: 15 % above the minimum and 4 % below the maximum, so the ±10 % floor, widened.
    expect(plotLimit(points)).toBe(20);
    const [maxRow, minRow] = plotRows(points, 20);
    expect(maxRow).toMatchObject({ band: [-20, 0], zone: [-20, 0] });
    expect(minRow).toMatchObject({ band: [0, 20], zone: [0, 20] });
  });
});
