import { parse } from 'csv-parse/sync';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Part } from '../../shared/schemas/parts';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let restorationId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
      { userId: c.id, role: 'owner' },
    ])
  ).id;
  [tech, mentor, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
  const res = await tech
    .post(`/api/restorations/${restorationId}/parts`)
    .send({ componentRef: 'C7', originalPart: 'Wax paper', replacementPart: 'Film', state: 'fitted', costMinor: 385 });
  expect(res.status).toBe(201);
});
afterAll(() => t.stop());

const rowsOf = (text: string) => parse(text, { bom: true, columns: true }) as Record<string, string>[];
const headerOf = (text: string) => (parse(text, { bom: true, to: 1 }) as string[][])[0]!;

describe('mentors see no money in the parts ledger', () => {
  it('when a mentor reads the ledger, then no line carries a cost; the technician still sees it', async () => {
    const asTech = (await tech.get(`/api/restorations/${restorationId}/parts`)).body as Part[];
    expect(asTech.map((p) => p.costMinor)).toEqual([385]);
    const res = await mentor.get(`/api/restorations/${restorationId}/parts`);
    expect(res.status).toBe(200);
    const asMentor = res.body as Part[];
    expect(asMentor.map((p) => p.componentRef)).toEqual(['C7']);
    expect(asMentor.map((p) => p.costMinor)).toEqual([null]);
    expect(JSON.stringify(asMentor)).not.toContain('385');
  });

  it('when a mentor exports the CSV, then it has no cost column at all; the technician’s has one and the owner’s keeps it blank', async () => {
    const mentorCsv = await mentor.get(`/api/restorations/${restorationId}/parts.csv`);
    expect(mentorCsv.status).toBe(200);
    const header = headerOf(mentorCsv.text);
    expect(header).toContain('Reference');
    expect(header.filter((h) => h.startsWith('Cost'))).toEqual([]);
    expect(rowsOf(mentorCsv.text).map((r) => r.Reference)).toEqual(['C7']);
    expect(mentorCsv.text).not.toContain('3.85');
    // Asking for a currency does not bring the column back.
    expect(
      headerOf((await mentor.get(`/api/restorations/${restorationId}/parts.csv?currency=EUR`)).text).filter((h) =>
        h.startsWith('Cost'),
      ),
    ).toEqual([]);
    expect(rowsOf((await tech.get(`/api/restorations/${restorationId}/parts.csv`)).text)[0]!['Cost (GBP)']).toBe(
      '3.85',
    );
    expect(rowsOf((await owner.get(`/api/restorations/${restorationId}/parts.csv`)).text)[0]!['Cost (GBP)']).toBe('');
  });
});
