import { and, count, eq, type SQL } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  comments,
  events,
  findingChanges,
  findings,
  measurements,
  notifications,
  parts,
  photos,
  restorations,
} from '../../server/db/schema';
import { twoToneJpeg } from '../factories/images';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { whileFailing } from '../support/fail-writes';
import { startTestApp } from '../support/test-app';

// Each check breaks one step of a write inside PostgreSQL and looks for anything the write left behind.
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent;
let restorationId: number;
let photoId: number;

beforeAll(async () => {
  t = await startTestApp();
  const [a, b] = await Promise.all([
    createUser(t.db, { name: 'Mara Bench' }),
    createUser(t.db, { name: 'Teodor Afar' }),
  ]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
    ])
  ).id;
  photoId = await createPhotoRow(t.db, restorationId);
  [tech, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
});
afterAll(() => t.stop());

const rows = async (table: PgTable, where?: SQL) => (await t.db.select({ n: count() }).from(table).where(where))[0]!.n;
const eventsOf = (kind: (typeof events.$inferSelect)['kind']) =>
  rows(events, and(eq(events.restorationId, restorationId), eq(events.kind, kind)));
const newFinding = (title: string) =>
  tech
    .post(`/api/photos/${photoId}/findings`)
    .send({ shape: 'pin', points: [{ x: 0.3, y: 0.6 }], title, componentRef: 'R23' });

describe('when the history line of a change cannot be written, the change is not kept either', () => {
  it('then creating a finding answers 500 and leaves no finding', async () => {
    const res = await whileFailing(t.db, 'events', 'insert', () => newFinding('Charred cathode resistor'));
    expect(res.status).toBe(500);
    expect(await rows(findings, eq(findings.title, 'Charred cathode resistor'))).toBe(0);
    expect((await newFinding('Charred cathode resistor')).status).toBe(201);
  });

  it('then a status change leaves the finding, its change log and its events as they were', async () => {
    const { id } = (await newFinding('Weak HT smoothing')).body as { id: number };
    const before = {
      changes: await rows(findingChanges, eq(findingChanges.findingId, id)),
      events: await eventsOf('finding-status'),
    };
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.patch(`/api/findings/${id}`).send({ status: 'confirmed' }),
    );
    expect(res.status).toBe(500);
    const [row] = await t.db.select().from(findings).where(eq(findings.id, id));
    expect(row!.status).toBe('observed');
    expect(await rows(findingChanges, eq(findingChanges.findingId, id))).toBe(before.changes);
    expect(await eventsOf('finding-status')).toBe(before.events);
  });

  it('then asking the mentors leaves no open question when their notifications cannot be written', async () => {
    const { id } = (await newFinding('Hum at full volume')).body as { id: number };
    const asked = await eventsOf('question-asked');
    const res = await whileFailing(t.db, 'notifications', 'insert', () =>
      tech.patch(`/api/findings/${id}`).send({ questionOpen: true }),
    );
    expect(res.status).toBe(500);
    const [row] = await t.db.select().from(findings).where(eq(findings.id, id));
    expect(row!.questionOpen).toBe(false);
    expect(await rows(findingChanges, eq(findingChanges.findingId, id))).toBe(0);
    expect(await eventsOf('question-asked')).toBe(asked);
  });

  it('then a comment whose notifications cannot be written is not stored', async () => {
    const { id } = (await newFinding('Dry joint on the output transformer')).body as { id: number };
    const res = await whileFailing(t.db, 'notifications', 'insert', () =>
      mentor.post(`/api/findings/${id}/comments`).send({ body: 'Reflow it first', internal: true }),
    );
    expect(res.status).toBe(500);
    expect(await rows(comments, eq(comments.findingId, id))).toBe(0);
    expect(await rows(notifications, eq(notifications.findingId, id))).toBe(0);
  });

  it('then an uploaded photo leaves neither a row nor any stored object', async () => {
    const objects = async () => {
      const keys: string[] = [];
      for await (const o of t.deps.storage.listObjects(`photos/${restorationId}/`)) keys.push(o.key);
      return keys;
    };
    const rowsBefore = await rows(photos, eq(photos.restorationId, restorationId));
    const res = await whileFailing(t.db, 'events', 'insert', async () =>
      tech
        .post(`/api/restorations/${restorationId}/photos`)
        .field('view', 'underside')
        .field('phase', 'before')
        .attach('file', await twoToneJpeg(), 'chassis.jpg'),
    );
    expect(res.status).toBe(500);
    expect(await rows(photos, eq(photos.restorationId, restorationId))).toBe(rowsBefore);
    expect(await objects()).toEqual([]);
  });

  it('then fitting a part leaves no ledger line', async () => {
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech
        .post(`/api/restorations/${restorationId}/parts`)
        .send({ componentRef: 'C31', action: 'replaced', state: 'fitted', replacementRating: '47µF 450V' }),
    );
    expect(res.status).toBe(500);
    expect(await rows(parts, eq(parts.componentRef, 'C31'))).toBe(0);
  });

  it('then marking a planned part fitted leaves it planned', async () => {
    const created = await tech
      .post(`/api/restorations/${restorationId}/parts`)
      .send({ componentRef: 'C32', action: 'replaced', state: 'planned' });
    expect(created.status).toBe(201);
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.patch(`/api/parts/${created.body.id}`).send({ state: 'fitted' }),
    );
    expect(res.status).toBe(500);
    const [row] = await t.db.select().from(parts).where(eq(parts.id, created.body.id));
    expect(row).toMatchObject({ state: 'planned', fittedAt: null });
  });

  it('then a reading out of range leaves no reading', async () => {
    // 212 Ω on a 150 Ω resistor is 41 % high, outside any carbon-composition tolerance (common practice, no source).
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech
        .post(`/api/restorations/${restorationId}/measurements`)
        .send({ location: 'R23 cathode', quantity: 'resistance', expected: '150', reading: '212' }),
    );
    expect(res.status).toBe(500);
    expect(await rows(measurements, eq(measurements.location, 'R23 cathode'))).toBe(0);
  });

  it('then a stage change leaves the restoration at its stage', async () => {
    const stageNow = async () =>
      (await t.db.select().from(restorations).where(eq(restorations.id, restorationId)))[0]!.stage;
    const [stage, changes] = [await stageNow(), await eventsOf('stage-changed')];
    const res = await whileFailing(t.db, 'events', 'insert', () =>
      tech.patch(`/api/restorations/${restorationId}`).send({ stage: stage === 'repair' ? 'testing' : 'repair' }),
    );
    expect(res.status).toBe(500);
    expect(await stageNow()).toBe(stage);
    expect(await eventsOf('stage-changed')).toBe(changes);
  });
});
