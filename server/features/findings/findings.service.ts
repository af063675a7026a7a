import { can, hiddenChangeFields, mayView, type Role } from '../../../shared/permissions';
import {
  geometrySchema,
  type Finding,
  type FindingChange,
  type FindingInput,
  type FindingPatch,
} from '../../../shared/schemas/findings';
import type { AppDeps } from '../../app-deps';
import type { PageWindow } from '../../db/keyset';
import { unitOfWork } from '../../db/unit-of-work';
import { BadRequestError, ForbiddenError, NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { recordEvent } from '../events/record-event';
import { ensureCloseup, scheduleCloseup } from '../closeups/closeups';
import { notificationsService } from '../notifications/notifications.service';
import { photosRepo } from '../photos/photos.repo';
import { findingMark } from './finding-mark';
import { photoFindingsJson } from './findings-json';
import { findingsRepo, type FindingWithContext, type NewFinding } from './findings.repo';
import type { Executor } from '../../db/client';

type Actor = { id: number; name: string; role: Role };

/**
 * Opens a finding with its history line on the caller's transaction (a checklist's confirmed cause opens one
 * too). The caller cuts its close-up after the commit with `scheduleCloseup`.
 */
export async function openFindingIn(tx: Executor, values: NewFinding, actorId: number): Promise<number> {
  const id = await findingsRepo(tx).insert(values);
  await recordEvent(tx, {
    restorationId: values.restorationId,
    kind: 'finding-opened',
    actorId,
    findingId: id,
    photoId: values.photoId,
  });
  return id;
}

/** A finding as the API sends it; a question to the mentors is the workshop's business, so others read it as closed. */
export const toFinding = (f: FindingWithContext, reader?: Role): Finding => ({
  ...findingMark(f),
  photoId: f.photoId,
  restorationId: f.restorationId,
  dismissReason: f.dismissReason,
  ownerVisible: f.ownerVisible,
  authorId: f.authorId,
  authorName: f.authorName,
  questionOpen: f.questionOpen && (reader === undefined || can(reader, 'workshop.view')),
  commentCount: f.commentCount,
  createdAt: f.createdAt.toISOString(),
  updatedAt: f.updatedAt.toISOString(),
});

/** Whether an owner may see the finding (it and its photo are shared), by the one rule in shared/permissions.ts. */
export const ownerMaySee = (f: { ownerVisible: boolean; photoOwnerVisible: boolean }) =>
  mayView('owner', 'finding', { finding: f, photo: { ownerVisible: f.photoOwnerVisible } });

export function findingsService(deps: AppDeps) {
  const repo = findingsRepo(deps.db);
  const photos = photosRepo(deps.db);
  const notifications = notificationsService(deps);

  async function visible(id: number, role: Role) {
    const f = await repo.find(id, role);
    if (!f || !mayView(role, 'finding', { finding: f, photo: { ownerVisible: f.photoOwnerVisible } }))
      throw new NotFoundError();
    return f;
  }

  return {
    visible,
    restorationOf: (id: number) => repo.restorationOf(id),
    /** The finding's restoration with the reader's role, in one query (see `guard`). */
    accessOf: (id: number, userId: number) => repo.accessOf(id, userId),
    /**
     * The finding as the guard's subject: who may not see it gets a 404; the rules read whether the caller placed it
     * and whether the owner sees it.
     */
    async subjectOf(id: number, userId: number, denied?: string): Promise<RestorationAndRole | undefined> {
      const access = await repo.accessOf(id, userId);
      if (!access?.role) return access;
      const f = await repo.find(id, access.role);
      const seen = Boolean(
        f && mayView(access.role, 'finding', { finding: f, photo: { ownerVisible: f.photoOwnerVisible } }),
      );
      return {
        ...access,
        subject: {
          view: async () => seen,
          context: { isAuthor: f?.authorId === userId, ownerVisible: f !== undefined && ownerMaySee(f) },
          denied,
        },
      };
    },
    /** The photo's findings as ready JSON text (see findings-json.ts); owners get only what is shared. */
    async listByPhotoJson(photoId: number, role: Role): Promise<string> {
      const photo = await photos.find(photoId);
      if (!photo || !can(role, 'photos.view', { ownerVisible: photo.ownerVisible })) throw new NotFoundError();
      return photoFindingsJson(deps.db, photoId, role);
    },
    /** One page of the restoration's findings this role may see (`limit + 1` rows read, for the page helper to cut). */
    async pageByRestoration(restorationId: number, role: Role, window: PageWindow) {
      return repo.listByRestoration(restorationId, role, window);
    },

    async get(id: number, role: Role) {
      return toFinding(await visible(id, role), role);
    },
    async create(photoId: number, input: FindingInput & { ownerVisible: boolean }, actor: Actor) {
      const photo = await photos.find(photoId);
      if (!photo || !can(actor.role, 'photos.view', { ownerVisible: photo.ownerVisible })) throw new NotFoundError();
      if (input.ownerVisible && !can(actor.role, 'findings.share'))
        throw new ForbiddenError('Only a technician shares findings with the owner.');
      const id = await deps.db.transaction((tx) =>
        openFindingIn(
          tx,
          {
            restorationId: photo.restorationId,
            photoId,
            shape: input.shape,
            points: input.points,
            title: input.title,
            componentRef: input.componentRef ?? '',
            kind: input.kind ?? 'note',
            severity: input.severity ?? 'info',
            ownerVisible: input.ownerVisible,
            authorId: actor.id,
          },
          actor.id,
        ),
      );
      const created = (await repo.find(id, actor.role))!;
      scheduleCloseup(deps, photo, created);
      return toFinding(created);
    },
    /** Each field asks the policy; the change is recorded with who made it. */
    async update(id: number, patch: FindingPatch, actor: Actor) {
      const f = await visible(id, actor.role);
      const isAuthor = f.authorId === actor.id;
      const { ownerVisible, questionOpen, ...rest } = patch;
      if (Object.keys(rest).length && !can(actor.role, 'findings.edit', { isAuthor }))
        throw new ForbiddenError('Only a technician changes a finding someone else placed.');
      if (ownerVisible !== undefined && !can(actor.role, 'findings.share'))
        throw new ForbiddenError('Only a technician shares findings with the owner.');
      if (questionOpen === true && !can(actor.role, 'findings.ask'))
        throw new ForbiddenError('Only a technician asks the mentors.');
      if (questionOpen === false && !can(actor.role, 'findings.resolve')) throw new ForbiddenError();
      if (rest.status === 'dismissed' && !(rest.dismissReason ?? f.dismissReason))
        throw new BadRequestError('Say why the finding is dismissed.');
      if (rest.shape || rest.points) {
        const geometry = geometrySchema.safeParse({ shape: rest.shape ?? f.shape, points: rest.points ?? f.points });
        if (!geometry.success) throw new BadRequestError(`points: ${geometry.error.issues[0]!.message}`);
      }
      const next: Record<string, unknown> = { ...rest };
      if (ownerVisible !== undefined) next.ownerVisible = ownerVisible;
      if (questionOpen !== undefined)
        Object.assign(next, {
          questionOpen,
          questionAskedAt: questionOpen ? new Date() : null,
          questionAskedById: questionOpen ? actor.id : null,
        });
      if (rest.status && rest.status !== 'dismissed') next.dismissReason = null;
      // The change, its history line, its events and the mentors' notifications commit together. The row is locked
      // and read again inside, so the recorded "before" values and "just asked" are those this change replaced.
      const updated = await unitOfWork(deps.db, async (tx, afterCommit) => {
        const inTx = findingsRepo(tx);
        const current = await inTx.find(id, actor.role, { lock: true });
        if (!current) throw new NotFoundError();
        const before = current as Record<string, unknown>;
        const changes = Object.fromEntries(
          Object.entries(next)
            .filter(([k, v]) => k !== 'questionAskedAt' && JSON.stringify(before[k]) !== JSON.stringify(v))
            .map(([k, v]) => [k, [before[k] ?? null, v] as [unknown, unknown]]),
        );
        if (!Object.keys(changes).length) return current;
        await inTx.update(id, next, actor.id, changes);
        const row = (await inTx.find(id, actor.role))!;
        const event = { restorationId: f.restorationId, actorId: actor.id, findingId: id, photoId: f.photoId };
        if (changes.status)
          await recordEvent(tx, { ...event, kind: 'finding-status', data: { from: current.status, to: row.status } });
        if (changes.questionOpen)
          await recordEvent(tx, { ...event, kind: questionOpen ? 'question-asked' : 'question-resolved' });
        if (questionOpen === true && !current.questionOpen) {
          await notifications.questionAsked(tx, row, actor);
          afterCommit(notifications.kick);
        }
        return row;
      });
      // A moved mark gets its close-up cut again (an unchanged one finds it already stored).
      if (next.shape !== undefined || next.points !== undefined)
        scheduleCloseup(deps, (await photos.find(f.photoId))!, updated);
      return toFinding(updated);
    },
    /** Removes a finding the caller may see (the guard has judged `findings.delete` with who placed it). */
    async remove(id: number, actor: Actor) {
      await visible(id, actor.role);
      await repo.remove(id);
    },
    async closeupUrl(id: number, role: Role) {
      const f = await visible(id, role);
      const photo = (await photos.find(f.photoId))!;
      return deps.storage.getSignedUrl(await ensureCloseup(deps, photo, f));
    },
    async history(id: number, role: Role): Promise<FindingChange[]> {
      await visible(id, role);
      const hidden = hiddenChangeFields[role];
      return (await repo.history(id, role))
        .map((h) => ({
          ...h,
          changes: Object.fromEntries(Object.entries(h.changes).filter(([field]) => !hidden.includes(field))),
          createdAt: h.createdAt.toISOString(),
        }))
        .filter((h) => Object.keys(h.changes).length > 0);
    },
  };
}
