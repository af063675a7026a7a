import { parse } from 'csv-parse/sync';
import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parts } from '../../server/db/schema';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let restorationId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'owner' },
    ])
  ).id;
  [tech, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
});
afterAll(() => t.stop());

const addPart = async (body: object) => {
  const res = await tech.post(`/api/restorations/${restorationId}/parts`).send(body);
  expect(res.status).toBe(201);
  return res.body as { id: number };
};
const rowsOf = (text: string) => parse(text, { bom: true, columns: true }) as Record<string, string>[];

describe('CSV export, ready for a spreadsheet', () => {
  it('when parsed by a CSV parser, then references come in parts-list order, dates are ISO 8601 dates, the finding has a column and costs are in the chosen currency', async () => {
    const hiddenPhoto = await createPhotoRow(t.db, restorationId, false);
    const finding = (
      await tech
        .post(`/api/photos/${hiddenPhoto}/findings`)
        .send({ shape: 'pin', points: [{ x: 0.2, y: 0.3 }], title: 'Leaky coupling capacitor', componentRef: 'C14' })
    ).body as { id: number; number: number };
    for (const componentRef of ['R1A', 'C14', 'R1', 'C2', 'C1', 'R10']) {
      await addPart({
        componentRef,
        originalPart: 'Wax paper',
        replacementPart: 'Film',
        state: 'fitted',
        costMinor: 250,
        ...(componentRef === 'C14' ? { findingId: finding.id } : {}),
      });
    }
    // 23:30 UTC on 8 March 2026 is already 9 March in Berlin (CET, UTC+1 until the last Sunday of March: IANA tz database).
    await t.db
      .update(parts)
      .set({ fittedAt: new Date('2026-03-08T23:30:00Z') })
      .where(eq(parts.restorationId, restorationId));

    const inUtc = rowsOf((await tech.get(`/api/restorations/${restorationId}/parts.csv`)).text);
    // Parts lists number references in counting order, a lettered sub-part after its parent (common practice, no source).
    expect(inUtc.map((r) => r.Reference)).toEqual(['C1', 'C2', 'C14', 'R1', 'R1A', 'R10']);
    expect(inUtc.map((r) => r.Fitted)).toEqual(Array(6).fill('2026-03-08'));
    expect(inUtc.find((r) => r.Reference === 'C14')!.Finding).toBe(`#${finding.number} Leaky coupling capacitor`);
    expect(inUtc.find((r) => r.Reference === 'C2')!.Finding).toBe('');
    expect(inUtc[0]!['Cost (GBP)']).toBe('2.50'); // without ?currency, the workshop's currency (GBP by default)

    const berlin = await tech.get(`/api/restorations/${restorationId}/parts.csv?currency=EUR&timeZone=Europe/Berlin`);
    const rows = rowsOf(berlin.text);
    expect(rows.map((r) => r.Fitted)).toEqual(Array(6).fill('2026-03-09'));
    // ISO 4217: the euro has two minor digits, the yen none.
    expect(rows[0]!['Cost (EUR)']).toBe('2.50');
    expect(
      rowsOf((await tech.get(`/api/restorations/${restorationId}/parts.csv?currency=JPY`)).text)[0]!['Cost (JPY)'],
    ).toBe('250');
  });

  it('when the currency or time zone is not a real one, then 400', async () => {
    expect((await tech.get(`/api/restorations/${restorationId}/parts.csv?currency=XQZ`)).status).toBe(400);
    expect((await tech.get(`/api/restorations/${restorationId}/parts.csv?timeZone=Mars/Olympus`)).status).toBe(400);
  });

  it('when the owner exports, then a finding they may not see is not named', async () => {
    const rows = rowsOf((await owner.get(`/api/restorations/${restorationId}/parts.csv`)).text);
    expect(rows.find((r) => r.Reference === 'C14')?.Finding).toBe('');
    expect(rows.map((r) => r['Cost (GBP)']).every((c) => c === '')).toBe(true);
  });
});
