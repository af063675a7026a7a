import { aliasedTable, and, desc, eq, sql, type SQL } from 'drizzle-orm';
import { stageLabels, type Stage } from '../../../shared/schemas/restorations';
import { phaseLabels, viewLabels } from '../../../shared/schemas/photos';
import { statusLabels, type Status } from '../../../shared/schemas/findings';
import { quantityLabels } from '../../../shared/schemas/measurements';
import type { Role } from '../../../shared/permissions';
import type { TimelineEvent } from '../../../shared/schemas/parts';
import type { AppDeps } from '../../app-deps';
import { events, findings, measurements, parts, photos, users } from '../../db/schema';
import { photoKeys } from '../photos/photo-objects';

type Kind = (typeof events.$inferSelect)['kind'];
const findingPhotos = aliasedTable(photos, 'finding_photos');

/** Events newest first, with what each points at; `at` is cut to the millisecond so a page cursor can name it. */
export type TimelineRow = Awaited<ReturnType<ReturnType<typeof timelineService>['rows']>>[number];
const atMs = sql<Date>`date_trunc('milliseconds', ${events.createdAt})`;

/** The restoration's history in words, newest first; owners see only what is shared with them. */
export function timelineService({ db, storage }: Pick<AppDeps, 'db' | 'storage'>) {
  /** Raw rows in timeline order: `where` picks the events, `before` continues after a page's last row. */
  function rows(where: SQL | undefined, limit: number, before?: { at: Date; id: number }) {
    return db
      .select({ e: events, at: atMs.mapWith((v: string | Date) => new Date(v)), actorName: users.name, photo: photos, finding: findings,
        findingPhotoShared: findingPhotos.ownerVisible, part: parts, m: measurements })
      .from(events)
      .leftJoin(users, eq(users.id, events.actorId))
      .leftJoin(photos, eq(photos.id, events.photoId))
      .leftJoin(findings, eq(findings.id, events.findingId))
      .leftJoin(findingPhotos, eq(findingPhotos.id, findings.photoId))
      .leftJoin(parts, eq(parts.id, events.partId))
      .leftJoin(measurements, eq(measurements.id, events.measurementId))
      .where(and(where, before ? sql`(${atMs}, ${events.id}) < (${before.at.toISOString()}::timestamptz, ${before.id})` : undefined))
      .orderBy(desc(atMs), desc(events.id))
      .limit(limit);
  }

  /** The rows a reader may see, in words; `roleOf` gives the reader's role in each row's restoration. */
  function present(list: TimelineRow[], roleOf: (row: TimelineRow) => Role): Promise<TimelineEvent[]> {
    const visible = list.filter((row) => {
      const { e, photo, finding, findingPhotoShared, m } = row;
      if (roleOf(row) !== 'owner') return true;
      switch (e.kind) {
        case 'photo-added': return photo?.ownerVisible === true;
        case 'finding-opened':
        case 'finding-status': return finding?.ownerVisible === true && findingPhotoShared === true;
        case 'measurement-out': return m?.ownerVisible === true;
        case 'question-asked':
        case 'question-resolved': return false;
        default: return true;
      }
    });
    return Promise.all(
      visible.map(async ({ e, actorName, photo, finding, part, m }) => {
        const label = finding ? `#${finding.number}${finding.componentRef ? ` ${finding.componentRef}` : ''} ${finding.title}` : '';
        const data = e.data as { from?: string; to?: string; view?: string; phase?: string };
        const summary =
          e.kind === 'photo-added' ? `Photo added: ${viewLabels[photo!.view]}, ${phaseLabels[photo!.phase].toLowerCase()}${photo!.caption ? ` — ${photo!.caption}` : ''}`
          : e.kind === 'finding-opened' ? `Finding opened: ${label}`
          : e.kind === 'finding-status' ? `${label}: ${statusLabels[data.from as Status] ?? data.from} → ${statusLabels[data.to as Status] ?? data.to}`
          : e.kind === 'question-asked' ? `Question for the mentors on ${label}`
          : e.kind === 'question-resolved' ? `Question answered on ${label}`
          : e.kind === 'part-fitted' ? `Part fitted: ${part?.componentRef ?? ''} ${part?.replacementPart ?? ''} ${part?.replacementRating ?? ''}`.trim()
          : e.kind === 'stage-changed' ? `Stage: ${stageLabels[data.from as Stage] ?? data.from} → ${stageLabels[data.to as Stage] ?? data.to}`
          : `Out of tolerance: ${m ? `${quantityLabels[m.quantity]} at ${m.location}, ${m.verdictReason}` : ''}`;
        return {
          id: e.id, kind: e.kind, at: e.createdAt.toISOString(), actorName, summary,
          photoId: e.photoId ?? finding?.photoId ?? null, findingId: e.findingId,
          thumbUrl: photo ? await storage.getSignedUrl(photoKeys(photo.storageKey).thumb) : null,
        };
      }),
    );
  }

  const ofRestoration = (restorationId: number, kind?: Kind) => and(eq(events.restorationId, restorationId), kind ? eq(events.kind, kind) : undefined);

  return {
    rows,
    present,
    ofRestoration,
    async list(restorationId: number, role: Role, kind?: Kind, limit = 500): Promise<TimelineEvent[]> {
      return present(await rows(ofRestoration(restorationId, kind), limit), () => role);
    },
  };
}
