import { describe, expect, it } from 'vitest';
import { safetyEventLine } from './safety-events';

describe('safety lines in the history', () => {
  it('when a test failed, then its line is red and says it did not pass', () => {
    expect(safetyEventLine('safety-test', { verdict: 'fail' })).toEqual({
      summary: 'Final safety test recorded: not passed',
      alert: true,
    });
    expect(safetyEventLine('safety-test', { verdict: 'pass' })).toEqual({
      summary: 'Final safety test recorded: passed',
      alert: false,
    });
  });
  it('when a set is returned on an override, then the line is red and carries the reason', () => {
    expect(safetyEventLine('safety-override', { reason: 'Display piece only' })).toEqual({
      summary: 'Returned without a passing safety test, on override: Display piece only',
      alert: true,
    });
  });
  it('when a soak run saw a fault, then the line is red; a quiet run is not', () => {
    expect(safetyEventLine('soak-session', { hours: 2.25, fault: true })).toEqual({
      summary: 'Soak run 2.3 h: a fault was seen and a finding opened',
      alert: true,
    });
    expect(safetyEventLine('soak-session', { hours: 3, fault: false })).toEqual({
      summary: 'Soak run 3.0 h, no fault seen',
      alert: false,
    });
    expect(safetyEventLine('soak-session', { started: true })).toEqual({ summary: 'Soak run started', alert: false });
  });
  it('when the report went out with warnings, then the line says how many and is red', () => {
    expect(safetyEventLine('report-sent', { warnings: 2 })).toEqual({
      summary: 'Hand-back report e-mailed to the owner with 2 warnings shown',
      alert: true,
    });
    expect(safetyEventLine('report-sent', { warnings: 0 })).toEqual({
      summary: 'Hand-back report e-mailed to the owner',
      alert: false,
    });
  });
  it('leaves other kinds to the timeline', () => expect(safetyEventLine('photo-added', {})).toBeUndefined());
});
