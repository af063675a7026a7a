import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comments, events, findings } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let restorationId: number;
let photoId: number;
let findingId: number;
let userId: number;
/** The SQL text of every statement sent through the pool while `recording` is on. */
const statements: string[] = [];
let recording = false;

beforeAll(async () => {
  t = await startTestApp();
  const user = await createUser(t.db, { name: 'Mara Counting' });
  restorationId = (await createRestoration(t.db, [{ userId: user.id, role: 'technician' }])).id;
  photoId = await createPhotoRow(t.db, restorationId);
  const [f] = await t.db
    .insert(findings)
    .values({
      restorationId,
      photoId,
      number: 1,
      shape: 'pin',
      points: [{ x: 0.5, y: 0.5 }],
      title: 'Hum',
      kind: 'note',
      severity: 'info',
      authorId: user.id,
    })
    .returning();
  findingId = f!.id;
  userId = user.id;
  await t.db.insert(comments).values({ findingId, authorId: user.id, body: 'Checked at 250 V, fine.' });
  tech = await signedIn(t.app, user);
  // Every statement of the app (Drizzle and the session store) goes through this pool's `query`.
  const pool = t.deps.pool as unknown as { query: (...args: unknown[]) => unknown };
  const query = pool.query.bind(pool);
  pool.query = (...args: unknown[]) => {
    const first = args[0] as string | { text?: string };
    if (recording) statements.push(typeof first === 'string' ? first : (first.text ?? ''));
    return query(...args);
  };
});
afterAll(() => t.stop());

/** The statements one request sent, including those sent after its answer (express-session writes then). */
async function statementsOf(path: string) {
  statements.length = 0;
  recording = true;
  const res = await tech.get(path);
  await new Promise((r) => setTimeout(r, 100));
  recording = false;
  expect(res.status).toBe(200);
  return [...statements];
}

const touching = (table: string, list: string[]) => list.filter((s) => new RegExp(`\\b"?${table}"?\\b`).test(s));
/** Statements that look a person's membership up (a join that merely names the table, on false, is not one). */
const membershipLookups = (list: string[]) => list.filter((s) => /"memberships"\."user_id" = \$\d/.test(s));

describe('hot read routes', () => {
  const routes = () => [
    `/api/restorations/${restorationId}`,
    `/api/restorations/${restorationId}/photos`,
    `/api/restorations/${restorationId}/findings`,
    `/api/restorations/${restorationId}/measurements`,
    `/api/restorations/${restorationId}/parts`,
    `/api/restorations/${restorationId}/events`,
    `/api/photos/${photoId}/findings`,
    `/api/findings/${findingId}`,
    `/api/findings/${findingId}/comments`,
  ];

  it('when a signed-in person reads them, then the session costs one query and the membership at most one', async () => {
    await statementsOf(`/api/restorations/${restorationId}`); // a first read may move the session's expiry once
    for (const path of routes()) {
      const sent = await statementsOf(path);
      expect(sent.length, path).toBeGreaterThan(0);
      expect(touching('sessions', sent), path).toHaveLength(1);
      expect(touching('sessions', sent)[0], path).toMatch(/^\s*select/i);
      expect(membershipLookups(sent).length, path).toBeLessThanOrEqual(1);
    }
  });
});

describe("the bench's recent activity", () => {
  it('when a person is on several sets in different roles, then their activity is one query besides the session, each event judged by their role there', async () => {
    // Mara is the technician of the set above and the owner of a second; a third is not hers.
    const owned = await createRestoration(t.db, [{ userId, role: 'owner' }], { make: 'Hollin', model: 'Wren 5' });
    const other = await createRestoration(t.db, [], { make: 'Hollin', model: 'Finch 2' });
    const stage = { kind: 'stage-changed' as const, data: { from: 'intake', to: 'repair' } };
    const labour = { kind: 'labour-logged' as const, data: { minutes: 25, billable: true } };
    await t.db.insert(events).values([
      { restorationId, ...stage },
      { restorationId, ...labour },
      { restorationId: owned.id, ...stage },
      { restorationId: owned.id, ...labour }, // the labour log is the workshop's own record: not for the owner
      { restorationId: other.id, ...stage },
    ]);
    await statementsOf('/api/activity'); // a first read may move the session's expiry once
    statements.length = 0;
    recording = true;
    const res = await tech.get('/api/activity');
    await new Promise((r) => setTimeout(r, 100));
    recording = false;
    expect(res.status).toBe(200);
    const notSession = statements.filter((s) => !touching('sessions', [s]).length);
    expect(notSession).toHaveLength(1);
    const seen = (res.body as { restorationId: number; kind: string; set: string }[]).map(
      (e) => `${e.restorationId} ${e.set}: ${e.kind}`,
    );
    expect(seen).toEqual(
      expect.arrayContaining([
        `${restorationId} Farrowby Lark 3: stage-changed`,
        `${restorationId} Farrowby Lark 3: labour-logged`,
        `${owned.id} Hollin Wren 5: stage-changed`,
      ]),
    );
    expect(seen).not.toContain(`${owned.id} Hollin Wren 5: labour-logged`);
    expect(seen.filter((line) => line.startsWith(`${other.id} `))).toEqual([]);
  });
});
