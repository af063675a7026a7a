import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, owner: Agent, mentor: Agent;
let restorationId: number;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'owner' },
      { userId: c.id, role: 'mentor' },
    ])
  ).id;
  [tech, owner, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
});
afterAll(() => t.stop());

const post = (body: object) => tech.post(`/api/restorations/${restorationId}/measurements`).send(body);

describe('measurements', () => {
  it('when a reading is recorded, then its verdict, the table limit and the reason are stored with it', async () => {
    const body = {
      location: 'C26',
      quantity: 'esr',
      expected: '22µ',
      rating: '25 V',
      reading: '1.1 Ω',
      method: 'ESR meter, 100 kHz, in circuit',
    };
    const res = await post(body);
    expect(res.status).toBe(201);
    // Widely circulated technician ESR table for new electrolytics at 20 °C (origin not stated; common practice):
    // 22 µF in the 25 V column reads 2.1 Ω at most; 1.1 Ω is below it (1.1 / 2.1 − 1 = −47.6 %, worked by hand).
    expect(res.body).toMatchObject({
      verdict: 'within',
      reference: 2.1,
      reading: 1.1,
      expected: 22e-6,
      rating: 25,
      expectedText: '22µ',
    });
    expect(res.body.deviation).toBeCloseTo(1.1 / 2.1 - 1, 6);
    expect(res.body.verdictReason).toMatch(/1\.1 Ω.*2\.1 Ω/);
  });

  it('when the chart’s meter, yours and the source resistance are given, then the verdict follows what your meter should read', async () => {
    const body = {
      location: 'V3 anode',
      quantity: 'dc-voltage',
      expected: '100',
      tolerance: '5',
      reading: '106',
      chartMeter: '1k/V 1000 V',
      meter: '20k/V 250 V',
      source: '100k',
    };
    const res = await post(body);
    expect(res.status).toBe(201);
    // worked by hand with the divider formula: 107.84 V on the 20 kΩ/V meter where the 1 kΩ/V chart says 100 V
    expect(res.body).toMatchObject({
      verdict: 'within',
      chartMeterText: '1k/V 1000 V',
      meterText: '20k/V 250 V',
      sourceText: '100k',
    });
    expect(res.body.reference).toBeCloseTo(107.843, 2);
    const patched = (await tech.patch(`/api/measurements/${res.body.id}`).send({ chartMeter: '' })).body;
    expect(patched).toMatchObject({ verdict: 'marginal', reference: 100 }); // without the chart's meter, the chart's figure stands
  });

  it('when an insulation tester shows over range, then it is stored as typed and passes against the 1 MΩ minimum', async () => {
    const res = await post({
      location: 'Mains pins to chassis',
      quantity: 'insulation',
      reading: 'OL',
      method: '500 V DC',
    });
    expect(res.status).toBe(201);
    // in-service inspection code of practice: Class I minimum 1 MΩ; the stored reading is that bound, the text keeps "OL"
    expect(res.body).toMatchObject({
      verdict: 'within',
      readingText: 'OL',
      reading: 1e6,
      reference: 1e6,
      deviation: null,
    });
    expect(res.body.verdictReason).toMatch(/^Over range, above the 1 MΩ minimum/);
  });

  it('when the inputs change, then the verdict is recomputed', async () => {
    const created = (
      await post({ location: 'V5 pin 7', quantity: 'dc-voltage', expected: '250', tolerance: '10', reading: '248 V' })
    ).body;
    expect(created.verdict).toBe('within');
    const patched = (await tech.patch(`/api/measurements/${created.id}`).send({ reading: '310 V' })).body;
    expect(patched).toMatchObject({ verdict: 'out', readingText: '310 V', reading: 310 });
  });

  it('when a field does not apply to the kind of reading, then it is neither judged nor stored, as the form does', async () => {
    // A tolerance means nothing to an ESR (its table rules) and a rating nothing to a voltage: left over from another kind, they are dropped.
    const esr = await post({
      location: 'C1a',
      quantity: 'esr',
      expected: '32µ',
      rating: '350 V',
      tolerance: 'nonsense',
      reading: '0.9 Ω',
      chartMeter: '1k/V 250 V',
    });
    expect(esr.status).toBe(201);
    expect(esr.body).toMatchObject({ toleranceText: '', ratingText: '350 V', chartMeterText: '' });
    const volts = (
      await tech
        .patch(`/api/measurements/${esr.body.id}`)
        .send({ quantity: 'dc-voltage', expected: '255', reading: '263' })
    ).body;
    expect(volts).toMatchObject({ quantity: 'dc-voltage', ratingText: '', rating: null, verdict: 'within' }); // +3.1 % inside the usual ±20 % (common practice)
  });

  it('when a reading judged against a limit is out, then the history says which limit it missed, not a tolerance', async () => {
    // Worst-case ESR table (glodark.com/design/esrchart.htm): 32 µF at 250 V and over is about 1 Ω; 9.5 Ω is more than twice that
    await post({ location: 'C1a (reservoir)', quantity: 'esr', expected: '32µ', rating: '350 V', reading: '9.5 Ω' });
    // in-service inspection code of practice: Class I insulation at least 1 MΩ at 500 V DC
    await post({ location: 'Mains pins to chassis', quantity: 'insulation', reading: '400k' });
    await post({ location: 'V5 pin 7', quantity: 'dc-voltage', expected: '250', tolerance: '10', reading: '330 V' });
    const lines = (
      (await tech.get(`/api/restorations/${restorationId}/events`).query({ kind: 'measurement-out' })).body as {
        summary: string;
      }[]
    ).map((e) => e.summary);
    expect(lines).toContainEqual(expect.stringMatching(/^Over its limit: ESR at C1a \(reservoir\), /));
    expect(lines).toContainEqual(
      expect.stringMatching(/^Under its minimum: Insulation resistance at Mains pins to chassis, /),
    );
    expect(lines).toContainEqual(expect.stringMatching(/^Out of tolerance: DC voltage at V5 pin 7, /));
  });

  const bad: [string, object, RegExp][] = [
    [
      'an unparseable value',
      { location: 'R23', quantity: 'resistance', expected: 'about four k', reading: '4k7' },
      /Expected value/,
    ],
    [
      'an unknown unit',
      { location: 'R23', quantity: 'resistance', expected: '4k7', reading: '4.7 furlongs' },
      /Reading/,
    ],
    [
      'a unit that does not fit the quantity',
      { location: 'R23', quantity: 'resistance', expected: '4k7', reading: '250 V' },
      /Reading/,
    ],
    [
      'a negative capacitance',
      { location: 'C12', quantity: 'capacitance', expected: '47n', reading: '-47n' },
      /negative/,
    ],
    [
      'a negative ESR',
      { location: 'C12', quantity: 'esr', expected: '47µ', rating: '450 V', reading: '\u22120.2' },
      /^Reading: an ESR cannot be negative/,
    ],
    ['no location', { location: '', quantity: 'current', reading: '60 mA' }, /where/],
  ];
  for (const [what, body, message] of bad)
    it(`when the reading has ${what}, then 400 explains it and nothing is stored`, async () => {
      const before = (await tech.get(`/api/restorations/${restorationId}/measurements`)).body.length;
      const res = await post(body);
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(message);
      expect((await tech.get(`/api/restorations/${restorationId}/measurements`)).body.length).toBe(before);
    });

  it('when a reading is not shared, then the owner neither lists it nor learns it exists; mentors cannot record', async () => {
    const hidden = (await post({ location: 'HT', quantity: 'dc-voltage', expected: '250', reading: '262' })).body;
    const shared = (
      await post({ location: 'Mains current', quantity: 'current', reading: '0.31 A', ownerVisible: true })
    ).body;
    const seen = (await owner.get(`/api/restorations/${restorationId}/measurements`)).body.map(
      (m: { id: number }) => m.id,
    );
    expect(seen).toContain(shared.id);
    expect(seen).not.toContain(hidden.id);
    expect((await owner.patch(`/api/measurements/${hidden.id}`).send({ reading: '1' })).status).toBe(404);
    expect((await owner.patch(`/api/measurements/${shared.id}`).send({ reading: '1' })).status).toBe(403);
    expect(
      (
        await mentor
          .post(`/api/restorations/${restorationId}/measurements`)
          .send({ location: 'X', quantity: 'current', reading: '1 A' })
      ).status,
    ).toBe(403);
  });
});

describe('valve line-up', () => {
  it('when the line-up has series heaters, then the restoration is marked live-chassis', async () => {
    const r = await createRestoration(t.db, [{ userId: (await tech.get('/api/auth/me')).body.id, role: 'technician' }]);
    const lineUp = ['UCH42', 'UAF42', 'UBC41', 'UL41', 'UY41'].map((type, i) => ({ position: `V${i + 1}`, type }));
    const res = await tech.put(`/api/restorations/${r.id}/valves`).send({ valves: lineUp });
    expect(res.status).toBe(200);
    expect(res.body.liveChassis.likely).toBe(true);
    expect((await tech.get(`/api/restorations/${r.id}`)).body.liveChassis).toBe(true);
    const dup = await tech.put(`/api/restorations/${r.id}/valves`).send({
      valves: [
        { position: 'V1', type: 'EL84' },
        { position: 'V1', type: 'EZ80' },
      ],
    });
    expect(dup.status).toBe(400);
  });
});
