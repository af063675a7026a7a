import { parse } from 'csv-parse/sync';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

const addPart = (body: object) => tech.post(`/api/restorations/${restorationId}/parts`).send(body);

describe('parts ledger', () => {
  it('when a 350 V capacitor replaces a 450 V one, then the ledger flags it; 33 µF 500 V for 32 µF 350 V passes', async () => {
    const bad = (
      await addPart({
        componentRef: 'C30',
        originalPart: 'Can electrolytic',
        originalRating: '32µF 450V',
        replacementPart: 'Radial',
        replacementRating: '33µF 350V',
      })
    ).body;
    expect(bad.warnings).toEqual([expect.objectContaining({ level: 'danger' })]);
    const good = (
      await addPart({
        componentRef: 'C31',
        originalRating: '32µF 350V',
        replacementRating: '33µF 500V',
        action: 'restuffed',
      })
    ).body;
    expect(good.warnings).toEqual([]);
  });

  it('when ratings are written the old way (mfd, VDC, kV), then a lower voltage rating is still flagged', async () => {
    // common practice, no source: never lower a capacitor's voltage rating
    const mfd = (
      await addPart({
        componentRef: 'C8',
        originalPart: 'Paper',
        originalRating: '0.1 mfd 400 VDC',
        replacementPart: 'Film',
        replacementRating: '0.1 µF 250 V',
      })
    ).body;
    expect(mfd.warnings).toEqual([
      expect.objectContaining({ level: 'danger', message: expect.stringMatching(/250 V, below the original's 400 V/) }),
    ]);
    const kv = (
      await addPart({
        componentRef: 'C9',
        originalPart: 'Ceramic',
        originalRating: '0.01 µF 1 kV',
        replacementPart: 'Film',
        replacementRating: '0.01 µF 630 V',
      })
    ).body;
    expect(kv.warnings).toEqual([expect.objectContaining({ level: 'danger' })]);
  });

  it('when exported, then the CSV round-trips commas, quotes, line breaks and non-ASCII text', async () => {
    const tricky = 'Wax tubular, "Hunts" style,\nstamped 0·05 µF — Ω ängstrom 日本';
    await addPart({
      componentRef: 'C12',
      originalPart: tricky,
      originalRating: '0.05µF 400V',
      replacementPart: 'Film 0.047µF 630V',
      replacementRating: '0.047µF 630V',
      costMinor: 185,
      source: 'Supplier, "NOS" box',
      notes: 'line one\r\nline two',
    });
    const res = await tech.get(`/api/restorations/${restorationId}/parts.csv`);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
    const row = rows.find((r) => r.Reference === 'C12')!;
    expect(row['Original part']).toBe(tricky);
    expect(row.Source).toBe('Supplier, "NOS" box');
    expect(row.Notes).toBe('line one\r\nline two');
    expect(row['Cost (GBP)']).toBe('1.85'); // the workshop's currency, GBP by default
  });

  it('when the owner reads the ledger, then only fitted or kept lines show, without costs, sources or notes; they cannot change it', async () => {
    // An original kept records no event, so the timeline test below still sees only its own fitted part.
    await addPart({
      componentRef: 'C40',
      action: 'kept-original',
      originalPart: 'Mica 100pF',
      costMinor: 420,
      source: 'OWNER-NEVER-SOURCE',
      notes: 'OWNER-NEVER-NOTE',
    });
    await addPart({ componentRef: 'C41', replacementRating: '47µF 450V', state: 'planned' });
    const list = (await owner.get(`/api/restorations/${restorationId}/parts`)).body as { componentRef: string }[];
    expect(list.map((p) => p.componentRef)).toContain('C40');
    expect(list.map((p) => p.componentRef)).not.toContain('C41');
    for (const p of list) expect(p).toMatchObject({ costMinor: null, source: '', notes: '' });
    const csv = (await owner.get(`/api/restorations/${restorationId}/parts.csv`)).text;
    expect(csv).toContain('C40');
    expect(csv).not.toMatch(/C41|OWNER-NEVER|4\.20/);
    expect((await owner.post(`/api/restorations/${restorationId}/parts`).send({ componentRef: 'R1' })).status).toBe(
      403,
    );
  });

  it('when the reference is missing or the quantity is nonsense, then 400', async () => {
    expect((await addPart({ componentRef: '' })).status).toBe(400);
    expect((await addPart({ componentRef: 'R9', quantity: 0 })).status).toBe(400);
  });
});

describe('history', () => {
  it('when work happens, then the timeline tells it; the owner sees only what is shared', async () => {
    const privatePhoto = await createPhotoRow(t.db, restorationId, false);
    const sharedPhoto = await createPhotoRow(t.db, restorationId, true);
    const hidden = (
      await tech
        .post(`/api/photos/${privatePhoto}/findings`)
        .send({ shape: 'pin', points: [{ x: 0.1, y: 0.1 }], title: 'SECRET-FINDING' })
    ).body;
    const shown = (
      await tech
        .post(`/api/photos/${sharedPhoto}/findings`)
        .send({ shape: 'pin', points: [{ x: 0.2, y: 0.2 }], title: 'Leaky C27', ownerVisible: true })
    ).body;
    await tech.patch(`/api/findings/${shown.id}`).send({ status: 'repaired' });
    await tech.patch(`/api/findings/${hidden.id}`).send({ questionOpen: true });
    await tech.patch(`/api/restorations/${restorationId}`).send({ stage: 'repair' });
    const part = (await addPart({ componentRef: 'R28', replacementPart: 'Metal film 470 kΩ 0.6 W' })).body;
    await tech.patch(`/api/parts/${part.id}`).send({ state: 'fitted' });
    await tech
      .post(`/api/restorations/${restorationId}/measurements`)
      .send({ location: 'HT', quantity: 'dc-voltage', expected: '250', reading: '330', ownerVisible: false });

    const techView = (await tech.get(`/api/restorations/${restorationId}/events`)).body as {
      kind: string;
      summary: string;
    }[];
    expect(techView.map((e) => e.kind)).toEqual(
      expect.arrayContaining([
        'finding-opened',
        'finding-status',
        'question-asked',
        'stage-changed',
        'part-fitted',
        'measurement-out',
      ]),
    );
    expect(techView.find((e) => e.kind === 'finding-status')!.summary).toMatch(/Observed → Repaired/);
    const ownerView = JSON.stringify((await owner.get(`/api/restorations/${restorationId}/events`)).body);
    expect(ownerView).toContain('Leaky C27');
    expect(ownerView).toContain('Stage: Intake → Repair');
    expect(ownerView).not.toContain('SECRET-FINDING');
    expect(ownerView).not.toContain('question');
    expect(ownerView).not.toContain('Out of tolerance');
    const benchActivity = JSON.stringify((await owner.get('/api/activity')).body);
    expect(benchActivity).toContain('Leaky C27');
    expect(benchActivity).not.toContain('SECRET-FINDING');
    const onlyParts = (await tech.get(`/api/restorations/${restorationId}/events`).query({ kind: 'part-fitted' })).body;
    expect(onlyParts.map((e: { kind: string }) => e.kind)).toEqual(['part-fitted']);
  });
});
