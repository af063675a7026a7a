import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { waitForMail } from '../support/mail';
import { pdfPages } from '../support/pdf-text';
import { signOffPrePower } from '../support/pre-power';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let ownerEmail: string;
const people = { tech: 0, mentor: 0, owner: 0 };
const binary = (res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
const passing = {
  equipmentClass: 'class-1',
  earth: '0.08',
  lead: '0.04',
  insulation: '50M',
  fuseFitted: '1',
  fuseRecommended: '1',
  leadAndStrainRelief: true,
  coversRefitted: true,
  safetyClassCapacitors: true,
  specification: 'original',
};

beforeAll(async () => {
  t = await startTestApp();
  const [a, m, o] = await Promise.all([
    createUser(t.db, { name: 'Ilse Bench' }),
    createUser(t.db),
    createUser(t.db, { name: 'Ottilie Owner' }),
  ]);
  Object.assign(people, { tech: a.id, mentor: m.id, owner: o.id });
  ownerEmail = o.email;
  [tech, mentor, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, m), signedIn(t.app, o)]);
});
afterAll(() => t.stop());

const newSet = async (model = 'Kestrel 4') =>
  (
    await createRestoration(
      t.db,
      [
        { userId: people.tech, role: 'technician' },
        { userId: people.mentor, role: 'mentor' },
        { userId: people.owner, role: 'owner' },
      ],
      { make: 'Farrowby', model },
    )
  ).id;

describe('the Returned gate', () => {
  it('when no safety test is recorded, then Returned is refused with 409 and a message saying what to do', async () => {
    const id = await newSet();
    const res = await tech.patch(`/api/restorations/${id}`).send({ stage: 'returned' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(
      /No final safety test is recorded.*Record the safety test on the Safety tab.*override/,
    );
    expect((await tech.get(`/api/restorations/${id}`)).body.stage).not.toBe('returned');
  });

  it('when the latest test failed, then Returned is refused; after a passing test it is allowed', async () => {
    const id = await newSet();
    const failed = await tech.post(`/api/restorations/${id}/safety-tests`).send({ ...passing, earth: '0.6' });
    expect(failed.status).toBe(201);
    expect(failed.body.verdict).toBe('fail');
    expect(failed.body.lines.find((l: { key: string }) => l.key === 'earth')).toMatchObject({
      verdict: 'fail',
      source: expect.stringMatching(/IET Code of Practice/),
    });
    const refused = await tech.patch(`/api/restorations/${id}`).send({ stage: 'returned' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/latest final safety test failed/);
    expect((await tech.post(`/api/restorations/${id}/safety-tests`).send(passing)).body.verdict).toBe('pass');
    expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'returned' })).status).toBe(200);
  });

  it('when a technician records an override with a reason, then Returned is allowed and the history shows it in red', async () => {
    const id = await newSet();
    await tech.post(`/api/restorations/${id}/safety-tests`).send({ ...passing, insulation: '0.4M' });
    expect((await tech.post(`/api/restorations/${id}/safety-override`).send({ reason: 'short' })).status).toBe(400);
    expect(
      (await mentor.post(`/api/restorations/${id}/safety-override`).send({ reason: 'Looks fine to me, send it back.' }))
        .status,
    ).toBe(403);
    const o = await tech
      .post(`/api/restorations/${id}/safety-override`)
      .send({ reason: 'Display piece: owner will not plug it in.' });
    expect(o.status).toBe(201);
    expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'returned' })).status).toBe(200);
    const history = (await owner.get(`/api/restorations/${id}/events`)).body as {
      kind: string;
      summary: string;
      caution: boolean;
    }[];
    expect(history.find((e) => e.kind === 'safety-override')).toMatchObject({
      caution: true,
      summary: expect.stringContaining('Display piece'),
    });
    expect(history.find((e) => e.kind === 'safety-test')).toMatchObject({
      caution: true,
      summary: expect.stringContaining('not passed'),
    });
    const status = (await owner.get(`/api/restorations/${id}/safety-tests`)).body;
    expect(status.latest.verdict).toBe('fail'); // the owner sees the fail, never a pass that did not happen
    expect(status.override.reason).toMatch(/Display piece/);
  });

  it('when a reading cannot be read, then the test is refused naming the field; owners and mentors cannot record tests', async () => {
    const id = await newSet();
    expect(
      (await tech.post(`/api/restorations/${id}/safety-tests`).send({ ...passing, insulation: 'lots' })).body.error
        .message,
    ).toMatch(/^insulation:/);
    expect(
      (await tech.post(`/api/restorations/${id}/safety-tests`).send({ ...passing, specification: 'modified' })).status,
    ).toBe(400);
    expect((await mentor.post(`/api/restorations/${id}/safety-tests`).send(passing)).status).toBe(403);
    expect((await owner.post(`/api/restorations/${id}/safety-tests`).send(passing)).status).toBe(403);
  });
});

describe('soak sessions', () => {
  it('when a session runs and stops with a fault, then hours are totalled and a finding is opened', async () => {
    const id = await newSet();
    expect((await tech.post(`/api/restorations/${id}/soak-sessions`)).status).toBe(201);
    expect((await tech.post(`/api/restorations/${id}/soak-sessions`)).status).toBe(409);
    const running = (await tech.get(`/api/restorations/${id}/soak-sessions`)).body;
    expect(running.running).toMatchObject({ endedAt: null });
    // A fault needs a photo to pin the finding on.
    expect(
      (await tech.patch(`/api/restorations/${id}/soak-sessions/running`).send({ faults: 'Crackle after 40 min' }))
        .status,
    ).toBe(409);
    await tech
      .post(`/api/restorations/${id}/photos`)
      .field('view', 'underside')
      .field('phase', 'during')
      .attach('file', await twoToneJpeg(), 'u.jpg');
    const stopped = await tech.patch(`/api/restorations/${id}/soak-sessions/running`).send({
      ambientC: '21',
      chassisC: 48,
      mainsCurrent: '0.31',
      faults: 'Crackle after 40 min',
      actionTaken: 'Resoldered V3 pin 6',
    });
    expect(stopped.status).toBe(200);
    expect(stopped.body.running).toBeNull();
    const [s] = stopped.body.sessions;
    expect(s).toMatchObject({ ambientC: 21, chassisC: 48, mainsCurrentAmps: 0.31, faults: 'Crackle after 40 min' });
    expect(s.hours).toBeGreaterThanOrEqual(0);
    expect(stopped.body.totalHours).toBe(s.hours);
    const finding = (await tech.get(`/api/findings/${s.findingId}`)).body;
    expect(finding).toMatchObject({ title: 'Soak fault: Crackle after 40 min', kind: 'hazard', severity: 'fault' });
  });
});

describe('sending the hand-back report', () => {
  it('when the set is not ready, then the preview lists every warning and the send is recorded with them', async () => {
    const id = await newSet('Kestrel 5');
    await tech.patch(`/api/restorations/${id}`).send({ stage: 'repair' });
    const preview = await tech.get(`/api/restorations/${id}/report/preview`);
    expect(preview.status).toBe(200);
    expect(preview.body.warnings.map((w: { code: string }) => w.code).sort()).toEqual([
      'no-passing-safety-test',
      'no-soak',
      'stage-before-testing',
    ]);
    expect(preview.body.recipients).toEqual([{ name: 'Ottilie Owner', email: ownerEmail }]);
    expect(preview.body.body).toMatch(/Hello Ottilie Owner/);
    expect(preview.body.body).toMatch(/not a certificate/);
    const sent = await tech.post(`/api/restorations/${id}/report/send`);
    expect(sent.status).toBe(200);
    expect(sent.body.sentTo).toEqual([ownerEmail]);
    await waitForMail(
      async () => (await t.request().get('/api/dev/mail')).body,
      ownerEmail,
      /Kestrel 5: the hand-back report/,
    );
    const after = (await tech.get(`/api/restorations/${id}/report/preview`)).body;
    expect(after.sends).toHaveLength(1);
    expect(after.sends[0]).toMatchObject({
      sentBy: 'Ilse Bench',
      recipients: [ownerEmail],
      attachmentName: 'farrowby-kestrel-5-hand-back-report.pdf',
    });
    expect(after.sends[0].warnings).toHaveLength(3);
    expect(after.sends[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    expect((await mentor.get(`/api/restorations/${id}/report/preview`)).status).toBe(403);
  });

  it('when the set is tested, soaked and passed, then the preview has no warnings', async () => {
    const id = await newSet('Kestrel 6');
    await signOffPrePower(tech, id);
    expect((await tech.patch(`/api/restorations/${id}`).send({ stage: 'testing' })).status).toBe(200);
    await tech.post(`/api/restorations/${id}/safety-tests`).send(passing);
    await tech.post(`/api/restorations/${id}/soak-sessions`);
    await tech.patch(`/api/restorations/${id}/soak-sessions/running`).send({ mainsCurrent: '250m' });
    expect((await tech.get(`/api/restorations/${id}/report/preview`)).body.warnings).toEqual([]);
  });

  it('when the report runs to several pages, then every page carries content beyond its footer, and the safety table is in it', async () => {
    const id = await newSet('Kestrel 7');
    await tech.post(`/api/restorations/${id}/safety-tests`).send({ ...passing, earth: '0.6' });
    await tech.post(`/api/restorations/${id}/safety-tests`).send(passing);
    for (let i = 0; i < 60; i++)
      await tech.post(`/api/restorations/${id}/measurements`).send({
        location: `Test point ${i + 1}`,
        quantity: 'dc-voltage',
        expected: '250',
        reading: '246',
        ownerVisible: true,
      });
    const res = await owner
      .get(`/api/restorations/${id}/report.pdf`)
      .buffer(true)
      .parse(binary as never);
    const pages = await pdfPages(res.body as Buffer);
    expect(pages.length).toBeGreaterThan(2);
    const withContent = pages.filter(
      (p) => p.replace(/Farrowby Kestrel 7 · Gridleak hand-back report · page \d+ of \d+/, '').trim() !== '',
    );
    expect(withContent.length).toBe(pages.length);
    pages.forEach((p, i) => expect(p).toContain(`page ${i + 1} of ${pages.length}`));
    const all = pages.join('\n').replace(/\s+/g, ' ');
    expect(all).toContain('Final safety test');
    expect(all).toMatch(/Protective earth continuity, chassis to plug earth pin: \S+ ?mΩ — PASS/);
    expect(all).toContain(
      'Insulation, live and neutral joined to exposed metal, at 500 V DC: 50 MΩ — PASS (limit at least 1 MΩ at 500 V DC; IET Code of Practice',
    );
    expect(all).toContain('not a certificate of electrical safety');
    expect(all).not.toContain('NOT PASSED'); // only the latest test is reported, and it passed
  });
});
