import { aliasedTable, and, desc, eq, sql, type SQL, type SQLWrapper } from 'drizzle-orm';
import { stageLabels, type Stage } from '../../../shared/schemas/restorations';
import { phaseLabels, viewLabels } from '../../../shared/schemas/photos';
import { statusLabels, type Status } from '../../../shared/schemas/findings';
import { limitOf, outHeadings, readingKinds } from '../../../shared/bench';
import type { Role } from '../../../shared/permissions';
import type { TimelineEvent } from '../../../shared/schemas/events';
import type { AppDeps } from '../../app-deps';
import {
  events,
  findings,
  measurements,
  memberships,
  mismatchNotes,
  parts,
  photos,
  restorations,
  sheetPages,
  users,
} from '../../db/schema';
import { mismatchLine } from '../../../shared/schemas/sheets';
import { bringupEventWords, isBringupEvent } from '../bringup/bringup-events';
import { photoKeys } from '../photos/photo-objects';
import {
  columnsOf,
  findingFields,
  visibleSql,
  visibleSqlByRole,
  type FieldSources,
} from '../visibility/visibility-sql';
import { safetyEventLine } from '../safety/safety-events';

type Kind = (typeof events.$inferSelect)['kind'];
const findingPhotos = aliasedTable(photos, 'finding_photos');
/** `at` cut to the millisecond, so a page cursor can name it exactly. */
const atMs = sql<Date>`date_trunc('milliseconds', ${events.createdAt})`;

const findingSources: FieldSources = { finding: columnsOf(findings), photo: columnsOf(findingPhotos) };
const photoSources: FieldSources = { photo: columnsOf(photos) };
// An event about a finding is judged with the finding's photo; a photo's own event with that photo.
const eventSources: FieldSources = {
  event: columnsOf(events),
  finding: findingFields(),
  part: columnsOf(parts),
  reading: columnsOf(measurements),
  sheetPage: columnsOf(sheetPages),
  mismatch: columnsOf(mismatchNotes),
  photo: { ownerVisible: sql`coalesce(${findingPhotos.ownerVisible}, ${photos.ownerVisible})` },
};
/** The visibility rule for one role, or for the role a column holds (a person's role differs per restoration). */
const rule = (role: Role | SQLWrapper, subject: 'event' | 'finding' | 'photo', sources: FieldSources) =>
  typeof role === 'string' ? visibleSql(role, subject, sources) : visibleSqlByRole(role, subject, sources);

/** Who reads: one role on one restoration, or a person across their restorations (their role in each). */
export type Reader = { role: Role } | { userId: number };

/** The restoration's history in words, newest first; each reader sees what the one visibility rule lets them. */
export function timelineService({ db, storage }: Pick<AppDeps, 'db' | 'storage'>) {
  /** Visible rows in timeline order: `where` picks the events, `before` continues after a page's last row. */
  function rows(where: SQL | undefined, reader: Reader, limit: number, before?: { at: Date; id: number }) {
    const role: Role | SQLWrapper = 'role' in reader ? reader.role : memberships.role;
    const query = db
      .select({
        e: events,
        sheetPage: sheetPages,
        mismatch: mismatchNotes,
        at: atMs.mapWith((v: string | Date) => new Date(v)),
        actorName: users.name,
        photo: photos,
        finding: findings,
        part: parts,
        m: measurements,
        findingVisible: rule(role, 'finding', findingSources),
        photoVisible: rule(role, 'photo', photoSources),
        // The set's name, read with the event for a person across their sets (the bench's activity); null otherwise.
        setMake: restorations.make,
        setModel: restorations.model,
      })
      .from(events)
      .leftJoin(users, eq(users.id, events.actorId))
      .leftJoin(photos, eq(photos.id, events.photoId))
      .leftJoin(findings, eq(findings.id, events.findingId))
      .leftJoin(findingPhotos, eq(findingPhotos.id, findings.photoId))
      .leftJoin(parts, eq(parts.id, events.partId))
      .leftJoin(measurements, eq(measurements.id, events.measurementId))
      .leftJoin(sheetPages, eq(sheetPages.id, events.sheetPageId))
      .leftJoin(mismatchNotes, eq(mismatchNotes.id, events.mismatchNoteId))
      .leftJoin(
        memberships,
        'userId' in reader
          ? and(eq(memberships.restorationId, events.restorationId), eq(memberships.userId, reader.userId))
          : sql`false`,
      )
      .leftJoin(restorations, 'userId' in reader ? eq(restorations.id, events.restorationId) : sql`false`)
      .where(
        and(
          where,
          rule(role, 'event', eventSources),
          before ? sql`(${atMs}, ${events.id}) < (${before.at.toISOString()}::timestamptz, ${before.id})` : undefined,
        ),
      )
      .orderBy(desc(atMs), desc(events.id))
      .limit(limit);
    return query;
  }

  /** Rows in words; ids and pictures of what the reader may not see are left out (a part fitted for an internal finding). */
  function present(list: TimelineRow[]): Promise<TimelineEvent[]> {
    return Promise.all(
      list.map(
        async ({
          e,
          sheetPage,
          mismatch,
          actorName,
          photo: eventPhoto,
          finding: eventFinding,
          part,
          m,
          findingVisible: seesFinding,
          photoVisible: seesPhoto,
        }) => {
          const finding = seesFinding ? eventFinding : null;
          const photo = seesPhoto ? eventPhoto : null;
          const label = finding
            ? `#${finding.number}${finding.componentRef ? ` ${finding.componentRef}` : ''} ${finding.title}`
            : '';
          const data = e.data as { from?: string; to?: string; view?: string; phase?: string };
          const safety = safetyEventLine(e.kind, e.data);
          const words = safety
            ? { summary: safety.summary, caution: safety.alert }
            : isBringupEvent(e.kind)
              ? bringupEventWords(e.kind, e.data)
              : null;
          const summary = words
            ? words.summary
            : e.kind === 'photo-added'
              ? `Photo added: ${viewLabels[photo!.view]}, ${phaseLabels[photo!.phase].toLowerCase()}${photo!.caption ? ` — ${photo!.caption}` : ''}`
              : e.kind === 'finding-opened'
                ? `Finding opened: ${label}`
                : e.kind === 'finding-status'
                  ? `${label}: ${statusLabels[data.from as Status] ?? data.from} → ${statusLabels[data.to as Status] ?? data.to}`
                  : e.kind === 'question-asked'
                    ? `Question for the mentors on ${label}`
                    : e.kind === 'question-resolved'
                      ? `Question answered on ${label}`
                      : e.kind === 'part-fitted'
                        ? `Part fitted: ${part?.componentRef ?? ''} ${part?.replacementPart ?? ''} ${part?.replacementRating ?? ''}`.trim()
                        : e.kind === 'help-requested'
                          ? 'Asked for help'
                          : e.kind === 'help-link-made'
                            ? `Read-only help link made, until ${String((e.data as { expiresAt?: string }).expiresAt ?? '').slice(0, 10)}`
                            : e.kind === 'help-link-withdrawn'
                              ? 'Read-only help link withdrawn'
                              : e.kind === 'cause-checked'
                                ? `Checklist: ${String(e.data.cause ?? '')} ${String(e.data.result ?? '')}`.trim()
                                : e.kind === 'reading-requested'
                                  ? `Asked for: ${String(e.data.body ?? '')}`
                                  : e.kind === 'reading-answered'
                                    ? `Answered the request: ${String(e.data.body ?? '')}`
                                    : e.kind === 'estimate-sent'
                                      ? `Estimate version ${String(e.data.version)} sent to the owner`
                                      : e.kind === 'estimate-decided'
                                        ? `Estimate version ${String(e.data.version)} ${String(e.data.decision)} by ${String(e.data.name)}`
                                        : e.kind === 'labour-logged'
                                          ? `Time logged: ${String(e.data.minutes)} min${e.data.billable ? '' : ' (not billable)'}`
                                          : e.kind === 'invoice-issued'
                                            ? `${String(e.data.kind) === 'credit-note' ? 'Credit note' : String(e.data.kind) === 'deposit' ? 'Deposit request' : 'Invoice'} ${String(e.data.reference ?? e.data.number)} issued`
                                            : e.kind === 'invoice-voided'
                                              ? `Invoice ${String(e.data.reference ?? e.data.number)} voided`
                                              : e.kind === 'payment-received'
                                                ? `Payment received (${String(e.data.method)}) against ${String(e.data.kind) === 'deposit' ? 'deposit request' : 'invoice'} ${String(e.data.reference ?? e.data.number)}`
                                                : e.kind === 'payment-refunded'
                                                  ? `Refund against ${String(e.data.kind) === 'deposit' ? 'deposit request' : 'invoice'} ${String(e.data.reference ?? e.data.number)}`
                                                  : e.kind === 'sheet-added'
                                                    ? `Service sheet added: ${sheetPage ? sheetPage.title || 'page 1' : ''}${Number(e.data.pages) > 1 ? ` and ${Number(e.data.pages) - 1} more page${Number(e.data.pages) > 2 ? 's' : ''}` : ''}`
                                                    : e.kind === 'reference-marked'
                                                      ? `${String(e.data.ref)} marked ${sheetPage ? 'on the diagram' : 'on the chassis'}`
                                                      : e.kind === 'mismatch-noted'
                                                        ? `Differs from the diagram: ${mismatch ? mismatchLine(mismatch) : String(e.data.ref)}`
                                                        : e.kind === 'stage-changed'
                                                          ? `Stage: ${stageLabels[data.from as Stage] ?? data.from} → ${stageLabels[data.to as Stage] ?? data.to}`
                                                          : m
                                                            ? `${outHeadings[limitOf(m.quantity, m.toleranceText)]}: ${readingKinds[m.quantity].label} at ${m.location}, ${m.verdictReason}`
                                                            : 'A reading was judged out';
          return {
            id: e.id,
            kind: e.kind,
            at: e.createdAt.toISOString(),
            actorName,
            summary,
            photoId: photo?.id ?? finding?.photoId ?? null,
            findingId: finding?.id ?? null,
            thumbUrl: photo ? await storage.getSignedUrl(photoKeys(photo.storageKey).thumb) : null,
            caution: words?.caution ?? false,
          };
        },
      ),
    );
  }

  const ofRestoration = (restorationId: number, kind?: Kind) =>
    and(eq(events.restorationId, restorationId), kind ? eq(events.kind, kind) : undefined);

  return {
    rows,
    present,
    ofRestoration,
    async list(restorationId: number, role: Role, kind?: Kind, limit = 500): Promise<TimelineEvent[]> {
      return present(await rows(ofRestoration(restorationId, kind), { role }, limit));
    },
  };
}

export type TimelineRow = Awaited<ReturnType<ReturnType<typeof timelineService>['rows']>>[number];
