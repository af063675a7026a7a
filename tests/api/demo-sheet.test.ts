import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photos, referenceMarks, mismatchNotes, restorations, sheetPages } from '../../server/db/schema';
import { seedDemo } from '../../server/db/seed/seed-demo';
import { chassisLandmarks } from '../../server/features/demo/chassis';
import { seedDemoFindings } from '../../server/features/demo/seed-demo-findings';
import { seedDemoPhotos } from '../../server/features/demo/seed-demo-photos';
import { seedDemoSheet } from '../../server/features/demo/seed-demo-sheet';
import { seedDemoWorkshop } from '../../server/features/demo/seed-demo-workshop';
import { referencesRepo } from '../../server/features/references/references.repo';
import { startTestApp } from '../support/test-app';

let t: Awaited<ReturnType<typeof startTestApp>>;
let setId: number;

beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.db);
  await seedDemoPhotos(t.deps);
  await seedDemoFindings(t.db);
  await seedDemoWorkshop(t.db);
  await seedDemoSheet(t.deps);
  const [set] = await t.db.select().from(restorations).where(eq(restorations.serial, 'OV-54-20417'));
  setId = set!.id;
}, 120_000);
afterAll(() => t.stop());

describe('the demo service sheet', () => {
  it('when the demo is seeded, then the headline set has a diagram page and a layout page, both kept in the workshop', async () => {
    const pages = await t.db.select().from(sheetPages).where(eq(sheetPages.restorationId, setId));
    expect(pages.map((p) => p.kind).sort()).toEqual(['circuit-diagram', 'layout']);
    expect(pages.every((p) => !p.ownerVisible)).toBe(true);
  });

  it('when C27 is looked up, then it is on the diagram, the layout, the underside photo, a finding and the ledger', async () => {
    const c27 = (await referencesRepo(t.db).summary(setId, 'technician')).find((r) => r.ref === 'C27');
    expect(c27).toMatchObject({ diagramMarks: 2, chassisMarks: 1 });
    expect(c27!.findings).toBeGreaterThanOrEqual(1);
    expect(c27!.parts).toBeGreaterThanOrEqual(1);
  });

  it('when the chassis mark for C27 is read, then it sits on the C27 capacitor of the underside picture', async () => {
    const [underside] = await t.db
      .select()
      .from(photos)
      .where(and(eq(photos.restorationId, setId), eq(photos.view, 'underside'), eq(photos.phase, 'before')));
    const [mark] = await t.db
      .select()
      .from(referenceMarks)
      .where(and(eq(referenceMarks.photoId, underside!.id), eq(referenceMarks.ref, 'C27')));
    const spot = chassisLandmarks('underside').C27!;
    expect(Math.hypot(mark!.points[0]!.x - spot.x, mark!.points[0]!.y - spot.y)).toBeLessThan(spot.r);
  });

  it('when the demo is seeded, then R29 carries a workshop mismatch note: fitted 180Ω where the diagram prints 150Ω', async () => {
    const notes = await t.db.select().from(mismatchNotes).where(eq(mismatchNotes.restorationId, setId));
    expect(notes.map((n) => [n.ref, n.kind, n.diagramSays, n.ownerVisible])).toEqual([
      ['R29', 'value-differs', '150Ω 1W', false],
    ]);
  });

  it('when the seed runs again, then nothing is added twice', async () => {
    const before = (await t.db.select().from(referenceMarks).where(eq(referenceMarks.restorationId, setId))).length;
    await seedDemoSheet(t.deps);
    expect((await t.db.select().from(referenceMarks).where(eq(referenceMarks.restorationId, setId))).length).toBe(
      before,
    );
  });
});
