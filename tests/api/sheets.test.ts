import { count, sql } from 'drizzle-orm';
import sharp from 'sharp';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sheetPages, sheets } from '../../server/db/schema';
import { sheetKeys } from '../../server/features/sheets/sheet-objects';
import { twoToneJpeg } from '../factories/images';
import { servicePdf } from '../factories/pdfs';
import { createRestoration } from '../factories/restorations';
import { createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent, owner: Agent;
let restorationId: number;

beforeAll(async () => {
  t = await startTestApp({ uploads: { maxBytes: 20 * 1024 * 1024, maxPixels: 100e6 } });
  const [a, b, c] = await Promise.all([createUser(t.db), createUser(t.db), createUser(t.db)]);
  restorationId = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
      { userId: c.id, role: 'owner' },
    ])
  ).id;
  [tech, mentor, owner] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b), signedIn(t.app, c)]);
});
afterAll(() => t.stop());

const upload = (agent: Agent, id: number, file: Buffer, name: string, fields: Record<string, string> = {}) => {
  const req = agent.post(`/api/restorations/${id}/sheets`);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req.attach('file', file, name);
};
const pageRows = async () => (await t.db.select({ n: count() }).from(sheetPages))[0]!.n;
async function sheetObjects() {
  const keys: string[] = [];
  for await (const o of t.deps.storage.listObjects('sheets/')) keys.push(o.key);
  return keys.length;
}
/** A white page with thin black lines, like a scanned diagram. */
const scan = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: '#ffffff' } }).composite([
    {
      input: Buffer.from(
        `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}"><path d="M10 10 H${width - 10} M10 40 V${height - 10}" stroke="#000" stroke-width="2"/></svg>`,
      ),
      top: 0,
      left: 0,
    },
  ]);

describe('uploading service sheets', () => {
  const kinds: [string, () => Promise<Buffer>, string, string][] = [
    ['a JPEG scan', () => twoToneJpeg(900, 600), 'page.jpg', 'image/jpeg'],
    ['a PNG scan', () => scan(1200, 800).png().toBuffer(), 'page.png', 'image/png'],
    ['a TIFF scan', () => scan(1200, 800).tiff().toBuffer(), 'page.tif', 'image/tiff'],
  ];
  for (const [what, make, name, contentType] of kinds)
    it(`when a technician sends ${what}, then it comes back as one page with its kind, title and variants`, async () => {
      const res = await upload(tech, restorationId, await make(), name, { kind: 'layout', title: 'Chassis layout' });
      expect(res.status).toBe(201);
      expect(res.body.contentType).toBe(contentType);
      expect(res.body.pages).toHaveLength(1);
      expect(res.body.pages[0]).toMatchObject({
        pageNumber: 1,
        kind: 'layout',
        title: 'Chassis layout',
        ownerVisible: false,
      });
      expect(Object.keys(res.body.pages[0].urls).sort()).toEqual(['display', 'large', 'original', 'thumb']);
    });

  it('when a 300-dpi A3 scan arrives, then the large variant keeps every pixel so 6-point print stays legible at 200 %', async () => {
    // A3 at 300 dpi is 297 × 420 mm → 3508 × 4961 px (ISO 216 sizes; 1 in = 25.4 mm). 6 pt = 1/12 in ≈ 25 px at 300 dpi.
    const res = await upload(
      tech,
      restorationId,
      await scan(3508, 4961).png({ compressionLevel: 1 }).toBuffer(),
      'a3.png',
      {
        kind: 'circuit-diagram',
      },
    );
    expect(res.status).toBe(201);
    const page = res.body.pages[0];
    expect([page.width, page.height]).toEqual([3508, 4961]);
    const [row] = await t.db
      .select()
      .from(sheetPages)
      .where(sql`${sheetPages.id} = ${page.id}`);
    const [sheet] = await t.db
      .select()
      .from(sheets)
      .where(sql`${sheets.id} = ${row!.sheetId}`);
    const large = await sharp(await t.deps.storage.getObject(sheetKeys(sheet!.storageKey).page(1).large)).metadata();
    expect([large.width, large.height]).toEqual([3508, 4961]);
  });

  it('when a two-page PDF is sent, then both pages come back drawn, the original PDF is kept, and the upload is in the history', async () => {
    const pdf = await servicePdf(['Circuit diagram', 'Layout']);
    const res = await upload(tech, restorationId, pdf, 'sheet.pdf', {
      kind: 'circuit-diagram',
      title: 'Ostrander & Vale 54',
    });
    expect(res.status).toBe(201);
    expect(res.body.contentType).toBe('application/pdf');
    expect(res.body.pages.map((p: { pageNumber: number }) => p.pageNumber)).toEqual([1, 2]);
    // A4 is 595.28 × 841.89 pt (ISO 216 through PDF's 72 pt per inch): at 300 dpi, 2480 × 3507 px.
    expect([res.body.pages[0].width, res.body.pages[0].height]).toEqual([2480, 3507]);
    const [row] = await t.db
      .select()
      .from(sheetPages)
      .where(sql`${sheetPages.id} = ${res.body.pages[1].id}`);
    const [sheet] = await t.db
      .select()
      .from(sheets)
      .where(sql`${sheets.id} = ${row!.sheetId}`);
    expect((await t.deps.storage.getObject(sheetKeys(sheet!.storageKey).original)).equals(pdf)).toBe(true);
    // The second page is drawn, not blank: its thin lines leave dark pixels.
    const page2 = await sharp(await t.deps.storage.getObject(sheetKeys(sheet!.storageKey).page(2).large))
      .greyscale()
      .stats();
    expect(page2.channels[0]!.min).toBeLessThan(100);
    expect(res.body.pages[0].urls.original).toMatch(/original/);
    const history = (await tech.get(`/api/restorations/${restorationId}/events`)).body as {
      kind: string;
      summary: string;
    }[];
    expect(history.find((e) => e.kind === 'sheet-added')?.summary).toBe(
      'Service sheet added: Ostrander & Vale 54 and 1 more page',
    );
  });

  it('when a damaged PDF is sent, then it is refused with 415 saying so, and nothing is stored', async () => {
    const [rows, objects] = [await pageRows(), await sheetObjects()];
    const res = await upload(tech, restorationId, Buffer.from('%PDF-1.7\n1 0 obj << >> endobj\n%%EOF\n'), 'sheet.pdf');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/PDF could not be read/);
    expect([await pageRows(), await sheetObjects()]).toEqual([rows, objects]);
  });

  it('when a file sent as a PDF does not start like one, then it is refused with 415 and nothing is stored', async () => {
    const [rows, objects] = [await pageRows(), await sheetObjects()];
    const res = await tech
      .post(`/api/restorations/${restorationId}/sheets`)
      .attach('file', Buffer.from('<html>not a sheet</html>'), {
        filename: 'sheet.pdf',
        contentType: 'application/pdf',
      });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/named as a PDF but is not one/);
    expect([await pageRows(), await sheetObjects()]).toEqual([rows, objects]);
  });

  it('when a text file is sent, then it is refused with 415 and nothing is stored', async () => {
    const [rows, objects] = [await pageRows(), await sheetObjects()];
    const res = await upload(tech, restorationId, Buffer.from('just some notes\n'), 'notes.png');
    expect(res.status).toBe(415);
    expect([await pageRows(), await sheetObjects()]).toEqual([rows, objects]);
  });

  it('when the kind is not one Gridleak knows, then the upload is refused with 400', async () => {
    expect((await upload(tech, restorationId, await twoToneJpeg(), 'page.jpg', { kind: 'brochure' })).status).toBe(400);
  });
});

describe('editing a page', () => {
  it('when a technician changes the kind and title of a page, then the page reads so; a mentor may not change it', async () => {
    const page = (await upload(tech, restorationId, await twoToneJpeg(), 'page.jpg')).body.pages[0];
    const res = await tech
      .patch(`/api/sheet-pages/${page.id}`)
      .send({ kind: 'voltage-chart', title: 'Voltages, no signal' });
    expect(res.status).toBe(200);
    expect((await tech.get(`/api/sheet-pages/${page.id}`)).body).toMatchObject({
      kind: 'voltage-chart',
      title: 'Voltages, no signal',
      ownerVisible: false,
    });
    expect((await mentor.patch(`/api/sheet-pages/${page.id}`).send({ title: 'Mine now' })).status).toBe(403);
    expect((await tech.patch(`/api/sheet-pages/${page.id}`).send({ kind: 'brochure' })).status).toBe(400);
  });
});

describe('who sees sheet pages', () => {
  it('when a page is not shared, then the owner does not see it; once shared, they do; the mentor always does', async () => {
    const page = (await upload(tech, restorationId, await twoToneJpeg(), 'page.jpg', { title: 'Power supply' })).body
      .pages[0];
    const ids = async (agent: Agent) =>
      ((await agent.get(`/api/restorations/${restorationId}/sheets`)).body as { id: number }[]).map((p) => p.id);
    expect(await ids(owner)).not.toContain(page.id);
    expect(await ids(mentor)).toContain(page.id);
    expect((await owner.get(`/api/sheet-pages/${page.id}`)).status).toBe(404);
    expect((await tech.patch(`/api/sheet-pages/${page.id}`).send({ ownerVisible: true })).status).toBe(200);
    expect(await ids(owner)).toContain(page.id);
    const seen = (await owner.get(`/api/sheet-pages/${page.id}`)).body;
    expect(seen.urls.original).toBeUndefined();
  });
});
