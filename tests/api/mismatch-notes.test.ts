import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { sheetPages, sheets } from '../../server/db/schema';
import { twoToneJpeg } from '../factories/images';
import { servicePdf } from '../factories/pdfs';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { sweepOrphanedSheetObjects } from '../../server/features/sheets/sweep-sheet-orphans';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent, otherTech: Agent;
let restorationId: number, otherId: number;

type Note = { id: number; ref: string; kind: string; diagramSays: string; chassisHas: string; ownerVisible: boolean };
type Line = { kind: string; summary: string };
const notes = async (agent: Agent, id = restorationId, ref = '') =>
  (await agent.get(`/api/restorations/${id}/mismatch-notes${ref ? `?ref=${ref}` : ''}`)).body as Note[];
const history = async (agent: Agent, id = restorationId) =>
  (await agent.get(`/api/restorations/${id}/events`)).body as Line[];
const sheetObjects = async (restoration: number) => {
  const keys: string[] = [];
  for await (const o of t.deps.storage.listObjects(`sheets/${restoration}/`)) keys.push(o.key);
  return keys.length;
};

beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c, d] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
      { userId: c.id, role: 'owner' },
    ])
  ).id;
  otherId = (
    await createRestoration(t.db, [
      { userId: d.id, role: 'technician' },
      { userId: a.id, role: 'technician' },
    ])
  ).id;
  [tech, mentor, owner, otherTech] = await Promise.all([
    signedIn(t.app, a),
    signedIn(t.app, b),
    signedIn(t.app, c),
    signedIn(t.app, d),
  ]);
});
afterAll(() => t.stop());

describe('mismatch notes', () => {
  it('when a technician notes that R23 differs from the diagram, then it is listed against R23 and written in the history', async () => {
    const res = await tech.post(`/api/restorations/${restorationId}/mismatch-notes`).send({
      ref: 'r23',
      kind: 'value-differs',
      diagramSays: '47k',
      chassisHas: '39k',
      note: 'Factory fit, original joints',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ref: 'R23', kind: 'value-differs', ownerVisible: false });
    expect((await notes(tech, restorationId, 'R23')).map((n) => n.id)).toEqual([res.body.id]);
    expect((await notes(mentor)).map((n) => n.id)).toContain(res.body.id);
    expect((await history(tech)).find((l) => l.kind === 'mismatch-noted')?.summary).toBe(
      'Differs from the diagram: R23: different value fitted; the diagram says 47k; the chassis has 39k; Factory fit, original joints',
    );
  });

  it('when a note is not shared, then the owner neither lists it nor reads its history line; once shared, both', async () => {
    const { id } = (
      await tech
        .post(`/api/restorations/${restorationId}/mismatch-notes`)
        .send({ ref: 'C14', kind: 'unlisted-part', chassisHas: '10 nF across the mains switch' })
    ).body as Note;
    expect((await notes(owner)).map((n) => n.id)).not.toContain(id);
    expect((await history(owner)).some((l) => l.kind === 'mismatch-noted')).toBe(false);
    expect((await tech.patch(`/api/mismatch-notes/${id}`).send({ ownerVisible: true })).status).toBe(200);
    expect((await notes(owner)).map((n) => n.id)).toContain(id);
    expect((await history(owner)).filter((l) => l.kind === 'mismatch-noted').map((l) => l.summary)).toEqual([
      'Differs from the diagram: C14: part not on the diagram; the chassis has 10 nF across the mains switch',
    ]);
  });

  it('when a note says nothing of what differs, then it is refused with 400', async () => {
    expect(
      (await tech.post(`/api/restorations/${restorationId}/mismatch-notes`).send({ ref: 'R5', kind: 'misprint' }))
        .status,
    ).toBe(400);
  });

  it('when the same reference has notes in two restorations, then each lists only its own, and one cannot be changed from the other', async () => {
    const here = (await notes(tech, restorationId, 'R23')).map((n) => n.id);
    const there = (
      await otherTech
        .post(`/api/restorations/${otherId}/mismatch-notes`)
        .send({ ref: 'R23', kind: 'misprint', note: 'Printed as 4k7, reads 47k' })
    ).body as Note;
    expect((await notes(otherTech, otherId, 'R23')).map((n) => n.id)).toEqual([there.id]);
    expect((await notes(tech, restorationId, 'R23')).map((n) => n.id)).toEqual(here);
    expect((await owner.delete(`/api/mismatch-notes/${there.id}`)).status).toBe(404);
  });
});

describe('sheet history and clean-up', () => {
  it('when a reference is marked, then the history says where; an owner reads it only once the page is shared', async () => {
    const page = (
      await tech.post(`/api/restorations/${restorationId}/sheets`).attach('file', await twoToneJpeg(), 'sheet.jpg')
    ).body.pages[0];
    expect(
      (
        await tech
          .post(`/api/restorations/${restorationId}/reference-marks`)
          .send({ sheetPageId: page.id, ref: 'V3', shape: 'pin', points: [{ x: 0.2, y: 0.2 }] })
      ).status,
    ).toBe(201);
    expect((await history(tech)).map((l) => l.summary)).toContain('V3 marked on the diagram');
    expect((await history(owner)).map((l) => l.summary)).not.toContain('V3 marked on the diagram');
    await tech.patch(`/api/sheet-pages/${page.id}`).send({ ownerVisible: true });
    expect((await history(owner)).map((l) => l.summary)).toContain('V3 marked on the diagram');
  });

  it('when a restoration is deleted, then its service sheet objects are deleted after the rows', async () => {
    await otherTech.post(`/api/restorations/${otherId}/sheets`).attach('file', await twoToneJpeg(), 'sheet.jpg');
    expect(await sheetObjects(otherId)).toBeGreaterThan(0);
    expect((await otherTech.delete(`/api/restorations/${otherId}`)).status).toBe(204);
    expect(await sheetObjects(otherId)).toBe(0);
  });

  it('when sheet objects are left with no row (a crash after a commit), then the sweep removes them and keeps the rest', async () => {
    await tech.post(`/api/restorations/${restorationId}/sheets`).attach('file', await twoToneJpeg(), 'kept.jpg');
    const kept = await sheetObjects(restorationId);
    await t.deps.storage.putObject(`sheets/${restorationId}/left-behind/original`, Buffer.from('x'), 'image/png');
    expect(await sweepOrphanedSheetObjects(t.db, t.deps.storage, -1000)).toBe(1);
    expect(await sheetObjects(restorationId)).toBe(kept);
  });

  it("when a page of a longer sheet is deleted and its objects are left (a crash after the commit), then the sweep removes that page's objects only", async () => {
    const res = await tech
      .post(`/api/restorations/${restorationId}/sheets`)
      .attach('file', await servicePdf(['Circuit diagram', 'Layout']), {
        filename: 'sheet.pdf',
        contentType: 'application/pdf',
      });
    expect(res.status).toBe(201);
    const [first, second] = res.body.pages as { id: number; pageNumber: number }[];
    const [sheet] = await t.db
      .select({ key: sheets.storageKey })
      .from(sheets)
      .innerJoin(sheetPages, eq(sheetPages.sheetId, sheets.id))
      .where(eq(sheetPages.id, second!.id));
    const objectsUnder = async (prefix: string) => {
      const keys: string[] = [];
      for await (const o of t.deps.storage.listObjects(prefix)) keys.push(o.key);
      return keys.sort();
    };
    const pageTwo = `sheets/${sheet!.key}/p${second!.pageNumber}/`;
    const pageOne = await objectsUnder(`sheets/${sheet!.key}/p${first!.pageNumber}/`);
    const left = await objectsUnder(pageTwo);
    expect(left.length).toBeGreaterThan(0);
    // The page's row goes in its transaction; the process stops before the objects are deleted.
    await t.db.delete(sheetPages).where(eq(sheetPages.id, second!.id));
    const before = await sheetObjects(restorationId);
    expect(await sweepOrphanedSheetObjects(t.db, t.deps.storage, -1000)).toBe(left.length);
    expect(await objectsUnder(pageTwo)).toEqual([]);
    expect(await objectsUnder(`sheets/${sheet!.key}/p${first!.pageNumber}/`)).toEqual(pageOne);
    expect(await objectsUnder(`sheets/${sheet!.key}/original`)).toEqual([`sheets/${sheet!.key}/original`]);
    expect(await sheetObjects(restorationId)).toBe(before - left.length);
    expect((await tech.get(`/api/sheet-pages/${first!.id}`)).status).toBe(200);
  });
});
