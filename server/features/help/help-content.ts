import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { can, type Role } from '../../../shared/permissions';
import type { HelpContent, HelpPhoto, HelpReply } from '../../../shared/schemas/help';
import type { AppDeps } from '../../app-deps';
import { redactedError } from '../../http/redact-error';
import type { helpRequests } from '../../db/schema';
import { mismatchLine } from '../../../shared/schemas/sheets';
import {
  findings,
  helpReplies,
  measurements,
  mismatchNotes,
  parts,
  photos,
  restorations,
  valves,
} from '../../db/schema';
import { ensureCloseup } from '../closeups/closeups';
import { findingMark } from '../findings/finding-mark';
import { mismatchVisible } from '../mismatches/mismatches.repo';
import { photoKeys } from '../photos/photo-objects';
import { listSymptomChecks } from '../symptom-checks/symptom-checks.repo';
import { columnsOf, visibleSql } from '../visibility/visibility-sql';

export type HelpRequestRow = typeof helpRequests.$inferSelect;

/**
 * What a reader sees of a help request: only the chosen items, each filtered by the one visibility rule for
 * `role`. The link's reader has no account and is judged as an owner: nothing unshared, no costs, notes or
 * sources, no comments, no names of the owner or the workshop's people, and no serial number (it identifies
 * the owner's set).
 */
export async function helpContent(
  deps: Pick<AppDeps, 'storage' | 'logger' | 'db' | 'config'>,
  request: HelpRequestRow,
  role: Role,
  replies: 'approved' | 'all',
): Promise<HelpContent> {
  const { db, storage } = deps;
  const rule = (subject: 'photo' | 'finding' | 'part' | 'reading') =>
    visibleSql(role, subject, {
      photo: columnsOf(photos),
      finding: columnsOf(findings),
      part: columnsOf(parts),
      reading: columnsOf(measurements),
    });
  const chosen = <T>(ids: number[], column: T) => (ids.length ? inArray(column as never, ids) : sql`false`);

  const [set] = request.includeSet
    ? await db.select().from(restorations).where(eq(restorations.id, request.restorationId))
    : [];
  const valveRows = request.includeValves
    ? await db
        .select({ position: valves.position, type: valves.type })
        .from(valves)
        .where(eq(valves.restorationId, request.restorationId))
        .orderBy(asc(valves.position))
    : null;
  const partRows = await db
    .select()
    .from(parts)
    .where(and(eq(parts.restorationId, request.restorationId), chosen(request.partIds, parts.id), rule('part')))
    .orderBy(asc(parts.componentRef));
  const readingRows = await db
    .select()
    .from(measurements)
    .where(
      and(
        eq(measurements.restorationId, request.restorationId),
        chosen(request.measurementIds, measurements.id),
        rule('reading'),
      ),
    )
    .orderBy(asc(measurements.measuredAt), asc(measurements.id));
  const photoRows = await db
    .select()
    .from(photos)
    .where(and(eq(photos.restorationId, request.restorationId), chosen(request.photoIds, photos.id), rule('photo')))
    .orderBy(asc(photos.createdAt));
  const pinRows = photoRows.length
    ? (
        await db
          .select({ f: findings })
          .from(findings)
          .innerJoin(photos, eq(photos.id, findings.photoId))
          .where(
            and(
              inArray(
                findings.photoId,
                photoRows.map((p) => p.id),
              ),
              rule('finding'),
            ),
          )
          .orderBy(asc(findings.number))
      ).map((r) => r.f)
    : [];
  // The references the chosen items name ("V5 pin 3" → V5), and the mismatch notes on them the reader may see.
  const refs = [
    ...new Set(
      [
        ...partRows.map((p) => p.componentRef),
        ...readingRows.map((m) => m.location),
        ...pinRows.map((f) => f.componentRef),
      ]
        .map((text) => /^([A-Za-z]{1,4}[0-9]{1,5}[A-Za-z]?)(\s|$)/.exec(text.trim())?.[1]?.toUpperCase())
        .filter((r): r is string => !!r),
    ),
  ];
  const mismatchRows = refs.length
    ? await db
        .select()
        .from(mismatchNotes)
        .where(
          and(
            eq(mismatchNotes.restorationId, request.restorationId),
            inArray(mismatchNotes.ref, refs),
            mismatchVisible(role),
          ),
        )
        .orderBy(asc(mismatchNotes.ref), asc(mismatchNotes.id))
    : [];
  const replyRows = await db
    .select()
    .from(helpReplies)
    .where(
      and(
        eq(helpReplies.helpRequestId, request.id),
        replies === 'approved' ? sql`${helpReplies.approvedAt} is not null` : undefined,
      ),
    )
    .orderBy(asc(helpReplies.createdAt), asc(helpReplies.id));

  // Close-ups only of the pins this reader may see, on photos they may see; cut now if the background job has not.
  const closeup = async (p: (typeof photoRows)[number], f: (typeof pinRows)[number]) => {
    try {
      return await storage.getSignedUrl(await ensureCloseup(deps, p, f));
    } catch (err) {
      deps.logger.warn({ err: redactedError(err) }, `close-up for finding ${f.id} failed`);
      return null;
    }
  };
  const photoList: HelpPhoto[] = await Promise.all(
    photoRows.map(async (p) => {
      const keys = photoKeys(p.storageKey);
      const [url, thumbUrl] = await Promise.all([storage.getSignedUrl(keys.display), storage.getSignedUrl(keys.thumb)]);
      return {
        id: p.id,
        caption: p.caption,
        view: p.view,
        phase: p.phase,
        width: p.width,
        height: p.height,
        url,
        thumbUrl,
        pins: await Promise.all(
          pinRows
            .filter((f) => f.photoId === p.id)
            .map(async (f) => ({
              ...findingMark(f),
              closeupUrl: await closeup(p, f),
            })),
        ),
      };
    }),
  );
  const checks = await listSymptomChecks(db, request.restorationId, role, request.symptomIds);
  const part = (name: string, rating: string) => [name, rating].filter(Boolean).join(' ');
  return {
    id: request.id,
    restorationId: request.restorationId,
    symptom: request.symptom,
    createdAt: request.createdAt.toISOString(),
    set: set
      ? {
          make: set.make,
          model: set.model,
          year: set.year,
          chassis: can(role, 'workshop.notes') ? set.serial : null,
          mains: set.mainsSetting,
          equipmentKind: set.equipmentKind,
          liveChassis: set.liveChassis,
        }
      : null,
    valves: valveRows,
    parts: partRows.map((p) => ({
      id: p.id,
      componentRef: p.componentRef,
      action: p.action,
      old: part(p.originalPart, p.originalRating),
      new: part(p.replacementPart, p.replacementRating),
      fittedAt: p.fittedAt?.toISOString() ?? null,
    })),
    readings: readingRows.map((m) => ({
      id: m.id,
      location: m.location,
      quantity: m.quantity,
      expected: m.expectedText,
      tolerance: m.toleranceText,
      reading: m.readingText,
      conditions: m.conditions,
      meter: m.meterText || m.method,
      chartMeter: m.chartMeterText,
      verdict: m.verdict,
      verdictReason: m.verdictReason,
      measuredAt: m.measuredAt.toISOString(),
    })),
    photos: photoList,
    checklist: request.symptomIds.map((symptomId) => ({
      symptomId,
      checks: checks.filter((c) => c.symptomId === symptomId),
    })),
    mismatches: mismatchRows.map((m) => ({ id: m.id, ref: m.ref, line: mismatchLine(m) })),
    replies: replyRows.map((r): HelpReply => ({
      id: r.id,
      name: r.name,
      body: r.body,
      createdAt: r.createdAt.toISOString(),
      approved: r.approvedAt !== null,
    })),
  };
}
