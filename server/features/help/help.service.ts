import { and, eq, inArray, isNotNull, ne } from 'drizzle-orm';
import type { Role } from '../../../shared/permissions';
import {
  HELP_LINK_DAYS,
  type BenchHelpRequest,
  type HelpLinkCreated,
  type HelpRequest,
  type HelpRequestPatch,
  type HelpRequestSummary,
} from '../../../shared/schemas/help';
import type { AppDeps } from '../../app-deps';
import type { Executor } from '../../db/client';
import { findings, measurements, parts, photos, restorations } from '../../db/schema';
import { unitOfWork } from '../../db/unit-of-work';
import { notificationsService } from '../notifications/notifications.service';
import { symptomChecksRepo } from '../symptom-checks/symptom-checks.repo';
import { BadRequestError, NotFoundError } from '../../http/errors';
import { hashToken, newToken } from '../auth/tokens';
import { recordEvent } from '../events/record-event';
import { helpContent, type HelpRequestRow } from './help-content';
import { helpRepo } from './help.repo';

/** Everything a restoration offers a help request, pre-filled: fitted parts, every reading, photos with pins. */
async function prefill(db: Executor, restorationId: number) {
  const partIds = (
    await db
      .select({ id: parts.id })
      .from(parts)
      .where(and(eq(parts.restorationId, restorationId), eq(parts.state, 'fitted'), ne(parts.action, 'kept-original')))
  ).map((r) => r.id);
  const measurementIds = (
    await db.select({ id: measurements.id }).from(measurements).where(eq(measurements.restorationId, restorationId))
  ).map((r) => r.id);
  const photoIds = (
    await db
      .selectDistinct({ id: photos.id })
      .from(photos)
      .innerJoin(findings, eq(findings.photoId, photos.id))
      .where(and(eq(photos.restorationId, restorationId), isNotNull(findings.id)))
  ).map((r) => r.id);
  const symptomIds = await symptomChecksRepo(db).symptomsChecked(restorationId);
  return { partIds, measurementIds, photoIds, symptomIds };
}

/** Ids the technician chose must be on this restoration; anything else is refused, never silently kept. */
async function assertOwnIds(db: Executor, restorationId: number, patch: HelpRequestPatch) {
  const checks = [
    ['partIds', parts, patch.partIds],
    ['measurementIds', measurements, patch.measurementIds],
    ['photoIds', photos, patch.photoIds],
  ] as const;
  for (const [field, table, ids] of checks) {
    if (!ids?.length) continue;
    const found = await db
      .select({ id: table.id })
      .from(table)
      .where(and(eq(table.restorationId, restorationId), inArray(table.id, ids)));
    if (found.length !== new Set(ids).size)
      throw new BadRequestError(`${field}: every item must belong to this restoration`);
  }
}

export function helpService(deps: AppDeps) {
  const { db } = deps;
  const repo = helpRepo(db);
  const notifications = notificationsService(deps);

  async function full(row: HelpRequestRow, role: Role): Promise<HelpRequest> {
    const content = await helpContent(deps, row, role, 'all');
    const links = await repo.links(row.id);
    return {
      ...content,
      includeSet: row.includeSet,
      includeValves: row.includeValves,
      partIds: row.partIds,
      measurementIds: row.measurementIds,
      photoIds: row.photoIds,
      symptomIds: row.symptomIds,
      links: links.map((l) => ({
        id: l.id,
        expiresAt: l.expiresAt.toISOString(),
        revokedAt: l.revokedAt?.toISOString() ?? null,
        createdAt: l.createdAt.toISOString(),
      })),
    };
  }

  return {
    /** The request, its history line and the mentors' notifications (a question on their bench) commit together. */
    async create(restorationId: number, symptom: string, actor: { id: number; name: string }, role: Role) {
      const row = await unitOfWork(db, async (tx, afterCommit) => {
        const created = await helpRepo(tx).insert({
          restorationId,
          symptom,
          authorId: actor.id,
          ...(await prefill(tx, restorationId)),
        });
        await recordEvent(tx, {
          restorationId,
          kind: 'help-requested',
          actorId: actor.id,
          data: { helpRequestId: created.id },
        });
        const [set] = await tx
          .select({ make: restorations.make, model: restorations.model })
          .from(restorations)
          .where(eq(restorations.id, restorationId));
        await notifications.helpRequested(
          tx,
          { id: created.id, restorationId, symptom, set: `${set!.make} ${set!.model}` },
          actor,
        );
        afterCommit(notifications.kick);
        return created;
      });
      return full(row, role);
    },
    async list(restorationId: number): Promise<HelpRequestSummary[]> {
      return (await repo.list(restorationId)).map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
    },
    async bench(userId: number): Promise<BenchHelpRequest[]> {
      return (await repo.forPerson(userId, 20)).map((r) => ({
        id: r.id,
        restorationId: r.restorationId,
        set: `${r.make} ${r.model}`,
        symptom: r.symptom,
        createdAt: r.createdAt.toISOString(),
      }));
    },
    async restorationOf(helpRequestId: number) {
      return (await repo.find(helpRequestId))?.restorationId;
    },
    async get(helpRequestId: number, role: Role) {
      const row = await repo.find(helpRequestId);
      if (!row) throw new NotFoundError();
      return full(row, role);
    },
    async update(helpRequestId: number, patch: HelpRequestPatch, role: Role) {
      const row = await db.transaction(async (tx) => {
        const current = await helpRepo(tx).lock(helpRequestId);
        if (!current) throw new NotFoundError();
        await assertOwnIds(tx, current.restorationId, patch);
        const unique = (ids?: number[]) => (ids ? [...new Set(ids)] : undefined);
        return helpRepo(tx).update(helpRequestId, {
          ...patch,
          partIds: unique(patch.partIds),
          measurementIds: unique(patch.measurementIds),
          photoIds: unique(patch.photoIds),
        });
      });
      return full(row, role);
    },
    /** A new read-only link; the token is returned once and only its SHA-256 is kept. */
    async createLink(
      restorationId: number,
      helpRequestId: number,
      days: number | undefined,
      userId: number,
    ): Promise<HelpLinkCreated> {
      const { token, hash } = newToken();
      const expiresAt = new Date(Date.now() + (days ?? HELP_LINK_DAYS) * 24 * 3600 * 1000);
      await db.transaction(async (tx) => {
        await helpRepo(tx).insertLink({ helpRequestId, tokenHash: hash, expiresAt, createdById: userId });
        await recordEvent(tx, {
          restorationId,
          kind: 'help-link-made',
          actorId: userId,
          data: { helpRequestId, expiresAt: expiresAt.toISOString() },
        });
      });
      return { url: `${deps.config.publicOrigin}/shared/help/${token}`, token, expiresAt: expiresAt.toISOString() };
    },
    /** The restoration a link's token belongs to (revoked or expired links too), for the guard. */
    async restorationOfToken(token: string) {
      return (await repo.linkByHash(hashToken(token)))?.restorationId;
    },
    async revoke(token: string, userId: number) {
      await db.transaction(async (tx) => {
        const found = await helpRepo(tx).linkByHash(hashToken(token));
        if (!found) throw new NotFoundError();
        if (await helpRepo(tx).revoke(found.link.id))
          await recordEvent(tx, {
            restorationId: found.restorationId,
            kind: 'help-link-withdrawn',
            actorId: userId,
            data: { helpRequestId: found.link.helpRequestId },
          });
      });
    },
    async restorationOfReply(replyId: number) {
      return (await repo.replyWithRestoration(replyId))?.restorationId;
    },
    async approve(replyId: number, userId: number) {
      const r = await repo.approve(replyId, userId);
      return { id: r.id, name: r.name, body: r.body, createdAt: r.createdAt.toISOString(), approved: true };
    },
  };
}
