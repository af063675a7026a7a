import { and, asc, eq } from 'drizzle-orm';
import type { AppDeps } from '../../app-deps';
import { compareComponentRefs } from '../../../shared/natural-order';
import { readingKinds } from '../../../shared/bench';
import {
  findings,
  measurements,
  memberships,
  mismatchNotes,
  parts,
  photos,
  restorations,
  users,
} from '../../db/schema';
import { mismatchVisible } from '../mismatches/mismatches.repo';
import { bringupForReport } from '../bringup/bringup-report';
import { ensureCloseup } from '../closeups/closeups';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';
import { photoKeys } from '../photos/photo-objects';
import { safetyReportData } from '../safety/safety-report-data';

type PhotoRow = typeof photos.$inferSelect;

/**
 * Everything the hand-back report shows, read as the owner would see it: only photos, findings and
 * readings shared with them. The report is the owner's document, whoever downloads it.
 */
export async function reportData(deps: Pick<AppDeps, 'db' | 'storage' | 'config'>, restorationId: number) {
  const { db, storage } = deps;
  const [set] = await db.select().from(restorations).where(eq(restorations.id, restorationId));
  if (!set) return undefined;
  // The owner's view, by the one rule in shared/permissions.ts.
  const owner = (subject: 'photo' | 'finding' | 'part' | 'reading') =>
    visibleSql('owner', subject, {
      photo: columnsOf(photos),
      finding: columnsOf(findings),
      part: columnsOf(parts),
      reading: columnsOf(measurements),
    });
  const sharedPhotos = await db
    .select()
    .from(photos)
    .where(and(eq(photos.restorationId, restorationId), owner('photo')))
    .orderBy(asc(photos.createdAt));
  const visibleFindings = (
    await db
      .select({ f: findings })
      .from(findings)
      .innerJoin(photos, eq(photos.id, findings.photoId))
      .where(and(eq(findings.restorationId, restorationId), owner('finding')))
      .orderBy(asc(findings.number))
  ).map((r) => r.f);
  const ledger = (
    await db
      .select()
      .from(parts)
      .where(and(eq(parts.restorationId, restorationId), owner('part')))
      .orderBy(asc(parts.id))
  ).sort((a, b) => compareComponentRefs(a.componentRef, b.componentRef));
  const readings = await db
    .select()
    .from(measurements)
    .where(and(eq(measurements.restorationId, restorationId), owner('reading')))
    .orderBy(asc(measurements.measuredAt));
  const mismatches = await db
    .select()
    .from(mismatchNotes)
    .where(and(eq(mismatchNotes.restorationId, restorationId), mismatchVisible('owner')))
    .orderBy(asc(mismatchNotes.ref), asc(mismatchNotes.id));
  const technicians = await db
    .select({ name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.restorationId, restorationId), eq(memberships.role, 'technician')));

  const image = async (key: string) => storage.getObject(key);
  // Before and after of the same view: the latest shared photo of each phase.
  const pairs: {
    view: PhotoRow['view'];
    before: Buffer;
    after: Buffer;
    beforeCaption: string;
    afterCaption: string;
  }[] = [];
  for (const view of new Set(sharedPhotos.map((p) => p.view))) {
    const of = (phase: PhotoRow['phase']) => sharedPhotos.filter((p) => p.view === view && p.phase === phase).at(-1);
    const before = of('before');
    const after = of('after');
    if (before && after)
      pairs.push({
        view,
        before: await image(photoKeys(before.storageKey).display),
        after: await image(photoKeys(after.storageKey).display),
        beforeCaption: before.caption,
        afterCaption: after.caption,
      });
  }
  const repaired = await Promise.all(
    visibleFindings
      .filter((f) => f.status === 'repaired' || f.status === 'verified')
      .map(async (f) => ({
        finding: f,
        closeup: await image(
          await ensureCloseup(
            deps,
            sharedPhotos.find((p) => p.id === f.photoId)!,
            f,
          ),
        ),
      })),
  );
  const cover = sharedPhotos.find((p) => p.phase === 'after') ?? sharedPhotos[0];
  return {
    set,
    technicians,
    cover: cover ? await image(photoKeys(cover.storageKey).display) : undefined,
    findings: visibleFindings,
    pairs,
    repaired,
    replaced: ledger.filter((p) => p.action !== 'kept-original' && p.state === 'fitted'),
    kept: ledger.filter((p) => p.action === 'kept-original'),
    mismatches,
    readings: readings.filter((m) => readingKinds[m.quantity].report === 'readings'),
    safetyChecks: readings.filter((m) => readingKinds[m.quantity].report === 'safety-checks'),
    safety: await safetyReportData(db, restorationId),
    bringup: await bringupForReport(db, restorationId),
  };
}
export type ReportData = NonNullable<Awaited<ReturnType<typeof reportData>>>;
