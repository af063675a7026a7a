import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { pdfText } from '../support/pdf-text';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent;
let ownerEmail: string;
let id: number;
const binary = (res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  t = await startTestApp();
  const [a, b] = await Promise.all([createUser(t.db, { name: 'Mara Report' }), createUser(t.db)]);
  ownerEmail = b.email;
  id = (
    await createRestoration(
      t.db,
      [
        { userId: a.id, role: 'technician' },
        { userId: b.id, role: 'owner' },
      ],
      { make: 'Farrowby', model: 'Nightjar 6' },
    )
  ).id;
  [tech, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
  const jpeg = await twoToneJpeg();
  const up = (fields: Record<string, string>) => {
    const req = tech.post(`/api/restorations/${id}/photos`);
    for (const [k, v] of Object.entries(fields)) req.field(k, v);
    return req.attach('file', jpeg, 'p.jpg').then((r) => r.body.id as number);
  };
  const before = await up({ view: 'underside', phase: 'before', ownerVisible: 'true', caption: 'As received' });
  await up({ view: 'underside', phase: 'after', ownerVisible: 'true', caption: 'Recapped' });
  const secretPhoto = await up({ view: 'detail', phase: 'during', caption: 'PRIVATE-PHOTO-CAPTION' });
  const shared = (
    await tech.post(`/api/photos/${before}/findings`).send({
      shape: 'circle',
      points: [
        { x: 0.5, y: 0.5 },
        { x: 0.55, y: 0.5 },
      ],
      title: 'Leaky coupling capacitor to the output valve',
      componentRef: 'C27',
      kind: 'leaking',
      severity: 'fault',
      ownerVisible: true,
    })
  ).body;
  await tech.patch(`/api/findings/${shared.id}`).send({ status: 'repaired' });
  await tech.post(`/api/findings/${shared.id}/comments`).send({ body: 'INTERNAL-COMMENT-TEXT', internal: true });
  await tech
    .post(`/api/photos/${before}/findings`)
    .send({ shape: 'pin', points: [{ x: 0.2, y: 0.2 }], title: 'INTERNAL-FINDING-TITLE' });
  await tech
    .post(`/api/photos/${secretPhoto}/findings`)
    .send({ shape: 'pin', points: [{ x: 0.2, y: 0.2 }], title: 'ON-PRIVATE-PHOTO', ownerVisible: true });
  await tech
    .post(`/api/restorations/${id}/measurements`)
    .send({ location: 'INTERNAL-READING', quantity: 'dc-voltage', expected: '265', reading: '268' });
  await tech
    .post(`/api/restorations/${id}/measurements`)
    .send({ location: 'HT line', quantity: 'dc-voltage', expected: '265', reading: '271', ownerVisible: true });
  await tech
    .post(`/api/restorations/${id}/measurements`)
    .send({ location: 'Mains pins to chassis', quantity: 'insulation', reading: '50M', ownerVisible: true });
  const part = (
    await tech.post(`/api/restorations/${id}/parts`).send({
      componentRef: 'C27',
      originalRating: '0.022µF 350V',
      replacementPart: 'Polyester film',
      replacementRating: '22nF 630V',
      testedAfter: 'Output cathode 8.3 V',
    })
  ).body;
  await tech.patch(`/api/parts/${part.id}`).send({ state: 'fitted' });
  await tech
    .post(`/api/restorations/${id}/mismatch-notes`)
    .send({ ref: 'R23', kind: 'value-differs', diagramSays: '47k', chassisHas: '39k', ownerVisible: true });
  await tech
    .post(`/api/restorations/${id}/mismatch-notes`)
    .send({ ref: 'C9', kind: 'misprint', note: 'INTERNAL-MISMATCH' });
});
afterAll(() => t.stop());

describe('hand-back report', () => {
  it('when the owner downloads the report, then it holds the shared work and nothing internal', async () => {
    const res = await owner
      .get(`/api/restorations/${id}/report.pdf`)
      .buffer(true)
      .parse(binary as never);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = await pdfText(res.body as Buffer);
    for (const expected of [
      'Hand-back report',
      'Farrowby Nightjar 6',
      'Leaky coupling capacitor to the output valve',
      'Before and after',
      'Polyester film',
      '22nF 630V',
      'HT line',
      'Mains pins to chassis',
      'R23: different value fitted; the diagram says 47k; the chassis has 39k',
      'not a certificate of electrical safety',
    ])
      expect(text.replace(/\s+/g, ' ')).toContain(expected);
    for (const secret of [
      'INTERNAL-COMMENT-TEXT',
      'INTERNAL-FINDING-TITLE',
      'INTERNAL-READING',
      'PRIVATE-PHOTO-CAPTION',
      'ON-PRIVATE-PHOTO',
      'INTERNAL-MISMATCH',
    ])
      expect(text).not.toContain(secret);
  });

  it('when the technician e-mails it, then each owner receives it; others may not send it', async () => {
    const res = await tech.post(`/api/restorations/${id}/report/send`);
    expect(res.status).toBe(200);
    expect(res.body.sentTo).toEqual([ownerEmail]);
    await waitForMail(async () => (await t.request().get('/api/dev/mail')).body, ownerEmail, /hand-back report/);
    expect((await owner.post(`/api/restorations/${id}/report/send`)).status).toBe(403);
  });
});
