import type { TimelineEvent } from '../../../../shared/schemas/events';
import { fakeApi, ok } from '../../../testing/fake-api';

/** An event as the API answers it; tests override what they care about. */
export function makeEvent(id: number, overrides: Partial<TimelineEvent> = {}): TimelineEvent {
  return {
    id,
    kind: 'stage-changed',
    at: '2026-11-24T12:00:00.000Z',
    actorName: 'Tessa Bench',
    summary: `Event ${id}`,
    photoId: null,
    findingId: null,
    thumbUrl: null,
    caution: false,
    ...overrides,
  };
}

/**
 * Stands in for the API behind `fetch`: `routes` maps a path (without /api) to the JSON it answers; anything else
 * is a 404. Returns the calls made.
 */
export function fakeJsonApi(routes: Record<string, unknown>) {
  return fakeApi(({ path }) => (path in routes ? ok(routes[path]) : undefined));
}
