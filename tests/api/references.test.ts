import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent, otherTech: Agent;
let restorationId: number, otherId: number;
let pageId: number, photoId: number, otherPageId: number, otherPhotoId: number;

const pin = (x: number, y: number) => ({ shape: 'pin', points: [{ x, y }] });
const sheet = async (agent: Agent, id: number) =>
  (
    await agent
      .post(`/api/restorations/${id}/sheets`)
      .field('kind', 'circuit-diagram')
      .attach('file', await twoToneJpeg(), 'sheet.jpg')
  ).body.pages[0].id as number;
const photo = async (agent: Agent, id: number) =>
  (
    await agent
      .post(`/api/restorations/${id}/photos`)
      .field('view', 'underside')
      .attach('file', await twoToneJpeg(), 'chassis.jpg')
  ).body.id as number;
const summary = async (agent: Agent, id = restorationId) =>
  (await agent.get(`/api/restorations/${id}/references`)).body as {
    ref: string;
    diagramMarks: number;
    chassisMarks: number;
    findings: number;
    parts: number;
    readings: number;
  }[];

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
  [pageId, photoId, otherPageId, otherPhotoId] = [
    await sheet(tech, restorationId),
    await photo(tech, restorationId),
    await sheet(otherTech, otherId),
    await photo(otherTech, otherId),
  ];
});
afterAll(() => t.stop());

describe('linking by reference', () => {
  it('when R23 is marked on the diagram and the chassis and named by a finding, a ledger row and a reading, then the references list counts each', async () => {
    const mark = (body: object) => tech.post(`/api/restorations/${restorationId}/reference-marks`).send(body);
    expect((await mark({ sheetPageId: pageId, ref: 'r23', ...pin(0.42, 0.31) })).status).toBe(201);
    expect(
      (
        await mark({
          photoId,
          ref: 'R23',
          shape: 'rect',
          points: [
            { x: 0.5, y: 0.5 },
            { x: 0.6, y: 0.58 },
          ],
        })
      ).status,
    ).toBe(201);
    expect(
      (
        await tech
          .post(`/api/photos/${photoId}/findings`)
          .send({ ...pin(0.55, 0.54), title: 'Cathode resistor runs hot', componentRef: 'R23' })
      ).status,
    ).toBe(201);
    expect(
      (
        await tech
          .post(`/api/restorations/${restorationId}/parts`)
          .send({ componentRef: 'R23', replacementRating: '150 Ω 1 W' })
      ).status,
    ).toBe(201);
    expect(
      (
        await tech
          .post(`/api/restorations/${restorationId}/measurements`)
          .send({ location: 'R23', quantity: 'resistance', expected: '150', reading: '212' })
      ).status,
    ).toBe(201);
    const r23 = (await summary(tech)).find((r) => r.ref === 'R23');
    expect(r23).toEqual({ ref: 'R23', diagramMarks: 1, chassisMarks: 1, findings: 1, parts: 1, readings: 1 });
    const marks = (await tech.get(`/api/restorations/${restorationId}/reference-marks?ref=R23`)).body as {
      sheetPageId: number | null;
      photoId: number | null;
      points: unknown;
    }[];
    expect(marks.map((m) => [m.sheetPageId, m.photoId])).toEqual([
      [pageId, null],
      [null, photoId],
    ]);
    expect(marks[0]!.points).toEqual([{ x: 0.42, y: 0.31 }]);
  });

  it('when a mark is placed on a page or photo of another restoration, then it is not found and nothing links across', async () => {
    const before = await summary(otherTech, otherId);
    const onOtherPage = await tech
      .post(`/api/restorations/${restorationId}/reference-marks`)
      .send({ sheetPageId: otherPageId, ref: 'R23', ...pin(0.1, 0.1) });
    const onOtherPhoto = await tech
      .post(`/api/restorations/${restorationId}/reference-marks`)
      .send({ photoId: otherPhotoId, ref: 'R23', ...pin(0.1, 0.1) });
    expect([onOtherPage.status, onOtherPhoto.status]).toEqual([404, 404]);
    expect(await summary(otherTech, otherId)).toEqual(before);
    // The same reference in the other restoration is counted there only.
    expect(
      (
        await otherTech
          .post(`/api/restorations/${otherId}/reference-marks`)
          .send({ sheetPageId: otherPageId, ref: 'R23', ...pin(0.2, 0.2) })
      ).status,
    ).toBe(201);
    expect((await summary(otherTech, otherId)).find((r) => r.ref === 'R23')).toMatchObject({
      diagramMarks: 1,
      chassisMarks: 0,
      findings: 0,
    });
    expect((await summary(tech)).find((r) => r.ref === 'R23')).toMatchObject({ diagramMarks: 1, chassisMarks: 1 });
  });

  it('when a reference does not read like one printed on a diagram, then the mark is refused with 400', async () => {
    const res = await tech
      .post(`/api/restorations/${restorationId}/reference-marks`)
      .send({ sheetPageId: pageId, ref: 'the big one', ...pin(0.2, 0.2) });
    expect(res.status).toBe(400);
  });

  it('when a mark names both a page and a photo, then it is refused with 400', async () => {
    expect(
      (
        await tech
          .post(`/api/restorations/${restorationId}/reference-marks`)
          .send({ sheetPageId: pageId, photoId, ref: 'C14', ...pin(0.2, 0.2) })
      ).status,
    ).toBe(400);
  });

  it('when the page and photo are not shared, then the owner counts no marks; the mentor counts them all', async () => {
    await tech
      .post(`/api/restorations/${restorationId}/reference-marks`)
      .send({ sheetPageId: pageId, ref: 'C14', ...pin(0.3, 0.3) });
    expect((await summary(mentor)).find((r) => r.ref === 'C14')).toMatchObject({ diagramMarks: 1 });
    expect((await summary(owner)).find((r) => r.ref === 'C14')).toBeUndefined();
    expect(((await owner.get(`/api/restorations/${restorationId}/reference-marks`)).body as unknown[]).length).toBe(0);
    await tech.patch(`/api/sheet-pages/${pageId}`).send({ ownerVisible: true });
    expect((await summary(owner)).find((r) => r.ref === 'C14')).toMatchObject({ diagramMarks: 1, chassisMarks: 0 });
  });
});
