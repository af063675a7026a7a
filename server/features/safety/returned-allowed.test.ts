import { describe, expect, it } from 'vitest';
import { returnedAllowed } from './safety-tests.service';

const at = (minute: number) => new Date(Date.UTC(2026, 11, 2, 9, minute));

describe('whether a set may go to Returned', () => {
  it('when the latest test passed, then yes', () =>
    expect(returnedAllowed({ verdict: 'pass', testedAt: at(5) }, undefined)).toBe(true));
  it('when nothing is recorded, then no', () => expect(returnedAllowed(undefined, undefined)).toBe(false));
  it('when the latest test failed and no override exists, then no', () =>
    expect(returnedAllowed({ verdict: 'fail', testedAt: at(5) }, undefined)).toBe(false));
  it('when an override was recorded after the failing test, then yes', () =>
    expect(returnedAllowed({ verdict: 'fail', testedAt: at(5) }, { createdAt: at(6) })).toBe(true));
  it('when a test failed after the override, then the old override no longer counts', () =>
    expect(returnedAllowed({ verdict: 'fail', testedAt: at(7) }, { createdAt: at(6) })).toBe(false));
  it('when an override was recorded and no test at all, then yes: the technician decided', () =>
    expect(returnedAllowed(undefined, { createdAt: at(6) })).toBe(true));
});
