import { aliasedTable, and, desc, eq, sql } from 'drizzle-orm';
import { stageLabels, type Stage } from '../../../shared/schemas/restorations';
import { phaseLabels, viewLabels } from '../../../shared/schemas/photos';
import { statusLabels, type Status } from '../../../shared/schemas/findings';
import { quantityLabels } from '../../../shared/schemas/measurements';
import type { Role } from '../../../shared/permissions';
import type { TimelineEvent } from '../../../shared/schemas/parts';
import type { AppDeps } from '../../app-deps';
import { events, findings, measurements, parts, photos, users } from '../../db/schema';
import { bringupEventWords, isBringupEvent } from '../bringup/bringup-events';
import { photoKeys } from '../photos/photo-objects';
import { columnsOf, findingFields, visibleSql } from '../visibility/visibility-sql';
import { safetyEventLine } from '../safety/safety-events';

type Kind = (typeof events.$inferSelect)['kind'];
const findingPhotos = aliasedTable(photos, 'finding_photos');

/** The restoration's history in words, newest first; owners see only what is shared with them. */
export function timelineService({ db, storage }: Pick<AppDeps, 'db' | 'storage'>) {
  return {
    async list(restorationId: number, role: Role, kind?: Kind, limit = 500): Promise<TimelineEvent[]> {
      const findingVisible = visibleSql(role, 'finding', { finding: columnsOf(findings), photo: columnsOf(findingPhotos) });
      const photoVisible = visibleSql(role, 'photo', { photo: columnsOf(photos) });
      // An event about a finding is judged with the finding's photo; a photo's own event with that photo.
      const eventVisible = visibleSql(role, 'event', {
        event: columnsOf(events), finding: findingFields(), part: columnsOf(parts), reading: columnsOf(measurements),
        photo: { ownerVisible: sql`coalesce(${findingPhotos.ownerVisible}, ${photos.ownerVisible})` },
      });
      const visible = await db
        .select({ e: events, actorName: users.name, photo: photos, finding: findings, part: parts, m: measurements, findingVisible, photoVisible })
        .from(events)
        .leftJoin(users, eq(users.id, events.actorId))
        .leftJoin(photos, eq(photos.id, events.photoId))
        .leftJoin(findings, eq(findings.id, events.findingId))
        .leftJoin(findingPhotos, eq(findingPhotos.id, findings.photoId))
        .leftJoin(parts, eq(parts.id, events.partId))
        .leftJoin(measurements, eq(measurements.id, events.measurementId))
        .where(and(eq(events.restorationId, restorationId), kind ? eq(events.kind, kind) : undefined, eventVisible))
        .orderBy(desc(events.createdAt), desc(events.id))
        .limit(limit);
      return Promise.all(
        visible.map(async ({ e, actorName, photo: eventPhoto, finding: eventFinding, part, m, findingVisible: seesFinding, photoVisible: seesPhoto }) => {
          // Ids and pictures of what the reader may not see are left out (a part fitted for an internal finding).
          const finding = seesFinding ? eventFinding : null;
          const photo = seesPhoto ? eventPhoto : null;
          const label = finding ? `#${finding.number}${finding.componentRef ? ` ${finding.componentRef}` : ''} ${finding.title}` : '';
          const data = e.data as { from?: string; to?: string; view?: string; phase?: string };
          const safety = safetyEventLine(e.kind, e.data);
          const words = safety ? { summary: safety.summary, caution: safety.alert } : isBringupEvent(e.kind) ? bringupEventWords(e.kind, e.data) : null;
          const summary = words ? words.summary
            : e.kind === 'photo-added' ? `Photo added: ${viewLabels[photo!.view]}, ${phaseLabels[photo!.phase].toLowerCase()}${photo!.caption ? ` — ${photo!.caption}` : ''}`
            : e.kind === 'finding-opened' ? `Finding opened: ${label}`
            : e.kind === 'finding-status' ? `${label}: ${statusLabels[data.from as Status] ?? data.from} → ${statusLabels[data.to as Status] ?? data.to}`
            : e.kind === 'question-asked' ? `Question for the mentors on ${label}`
            : e.kind === 'question-resolved' ? `Question answered on ${label}`
            : e.kind === 'part-fitted' ? `Part fitted: ${part?.componentRef ?? ''} ${part?.replacementPart ?? ''} ${part?.replacementRating ?? ''}`.trim()
            : e.kind === 'stage-changed' ? `Stage: ${stageLabels[data.from as Stage] ?? data.from} → ${stageLabels[data.to as Stage] ?? data.to}`
            : `Out of tolerance: ${m ? `${quantityLabels[m.quantity]} at ${m.location}, ${m.verdictReason}` : ''}`;
          return {
            id: e.id, kind: e.kind, at: e.createdAt.toISOString(), actorName, summary,
            photoId: photo?.id ?? finding?.photoId ?? null, findingId: finding?.id ?? null,
            thumbUrl: photo ? await storage.getSignedUrl(photoKeys(photo.storageKey).thumb) : null,
            caution: words?.caution ?? false,
          };
        }),
      );
    },
  };
}
