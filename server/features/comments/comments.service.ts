import { can, mayView, type Role } from '../../../shared/permissions';
import type { Comment } from '../../../shared/schemas/comments';
import type { AppDeps } from '../../app-deps';
import type { PageWindow } from '../../db/keyset';
import { unitOfWork } from '../../db/unit-of-work';
import { ConflictError, NotFoundError } from '../../http/errors';
import type { RestorationAndRole } from '../../http/guard';
import { findingsService } from '../findings/findings.service';
import { membersRepo } from '../members/members.repo';
import { notificationsService } from '../notifications/notifications.service';
import { commentsRepo, type CommentRow } from './comments.repo';
import { findMentions } from './mentions';

type Actor = { id: number; name: string; role: Role };

const toComment = (c: CommentRow): Comment => ({
  id: c.id,
  findingId: c.findingId,
  body: c.deletedAt ? '' : c.body,
  internal: c.internal,
  authorId: c.authorId,
  authorName: c.authorName,
  mentions: c.deletedAt ? [] : c.mentions,
  createdAt: c.createdAt.toISOString(),
  editedAt: c.editedAt?.toISOString() ?? null,
  deletedAt: c.deletedAt?.toISOString() ?? null,
});

/** The comment stored under a reused idempotency key must be the one this request would have written. */
function sameRequest(stored: CommentRow | undefined | '', findingId: number, body: string): CommentRow {
  if (!stored || stored.findingId !== findingId || stored.body !== body || stored.deletedAt)
    throw new ConflictError(
      'This Idempotency-Key was already used for another comment; send a new key for a new comment.',
    );
  return stored;
}

/** Threads. An owner reads and writes only the shared part of a shared finding's thread. */
export function commentsService(deps: AppDeps) {
  const repo = commentsRepo(deps.db);
  const findings = findingsService(deps);
  const members = membersRepo(deps.db);
  const notifications = notificationsService(deps);

  async function own(id: number, actor: Actor) {
    const c = await repo.find(id);
    if (!c || c.deletedAt) throw new NotFoundError();
    const f = await findings.visible(c.findingId, actor.role);
    if (!mayView(actor.role, 'comment', { comment: c, finding: f, photo: { ownerVisible: f.photoOwnerVisible } }))
      throw new NotFoundError();
    return c;
  }

  return {
    /**
     * The comment as the guard's subject: who may not read it gets a 404 (a deleted comment, an internal one for an
     * owner, one on a finding they do not see); the rules read whether the caller wrote it.
     */
    async subjectOf(commentId: number, userId: number, denied?: string): Promise<RestorationAndRole | undefined> {
      const c = await repo.find(commentId);
      const restorationId = c && (await findings.restorationOf(c.findingId));
      if (!c || restorationId === undefined) return undefined;
      const view = (role: Role) =>
        own(commentId, { id: userId, name: '', role }).then(
          () => true,
          (err: unknown) => {
            if (err instanceof NotFoundError) return false;
            throw err;
          },
        );
      return { restorationId, subject: { view, context: { isAuthor: c.authorId === userId }, denied } };
    },
    /** One page of the thread this role may read (`limit + 1` comments read, for the page helper to cut). */
    async list(findingId: number, role: Role, window: PageWindow) {
      await findings.visible(findingId, role);
      return (await repo.list(findingId, role, window)).map(toComment);
    },
    /** `key` is the client's Idempotency-Key: the same key from the same author stores one comment. */
    async create(findingId: number, input: { body: string; internal: boolean }, actor: Actor, key?: string) {
      const f = await findings.visible(findingId, actor.role);
      // An owner's comment is always in the shared thread.
      const internal = input.internal && can(actor.role, 'comments.internal');
      const people = await members.list(f.restorationId);
      const mentions = findMentions(
        input.body,
        people.map((p) => ({ userId: p.userId, name: p.name })),
      );
      const created = await unitOfWork(deps.db, async (tx, afterCommit) => {
        const inTx = commentsRepo(tx);
        const participants = await inTx.participants(findingId);
        const id = await inTx.insert({
          findingId,
          authorId: actor.id,
          body: input.body,
          internal,
          mentions,
          idempotencyKey: key ?? null,
        });
        // A retry of a post already stored: answer as the first time, notify nobody again.
        if (id === undefined) return sameRequest(key && (await inTx.findByKey(actor.id, key)), findingId, input.body);
        const row = (await inTx.find(id))!;
        await notifications.commentWritten(tx, f, row, actor, mentions, participants);
        afterCommit(notifications.kick);
        return row;
      });
      return toComment(created);
    },
    /** Edits a comment the caller may read (the guard has judged `comments.edit` with who wrote it). */
    async edit(id: number, body: string, actor: Actor) {
      await own(id, actor);
      await repo.update(id, { body, editedAt: new Date() });
      return toComment((await repo.find(id))!);
    },
    /** Deleted comments keep their place in the thread, marked deleted, with the text gone. */
    async remove(id: number, actor: Actor) {
      await own(id, actor);
      await repo.update(id, { deletedAt: new Date(), body: '' });
    },
  };
}
