import { useId } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import type { Finding } from '../../../../shared/schemas/findings';
import { ErrorState, Loading } from '../../../components/states';
import { useComments } from '../api/get-comments';
import { useThreadMutations } from '../api/write-comment';
import { CommentCompose } from './comment-compose';
import { CommentItem } from './comment-item';
import type { FindingMember } from './finding-format';
import { FormAlert } from '../../../components/form-alert';

export interface ThreadProps {
  finding: Finding;
  role: Role;
  meId: number;
  members: FindingMember[];
}

/** A finding's comments, oldest first, and the box to add one. Owners read and write only the shared part. */
export function Thread({ finding, role, meId, members }: ThreadProps) {
  const headingId = useId();
  const comments = useComments(finding.id);
  const { create, edit, remove } = useThreadMutations(finding.id);
  const ordered = [...(comments.data ?? [])].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);
  const actionError = edit.error ?? remove.error;

  return (
    <section aria-labelledby={headingId} className="space-y-3">
      <h3 id={headingId} className="text-lg font-bold">
        Thread{' '}
        {comments.data && (
          <span className="font-normal text-ink-soft">({ordered.filter((c) => !c.deletedAt).length})</span>
        )}
      </h3>
      {comments.isPending ? (
        <Loading label="Fetching comments…" />
      ) : comments.isError ? (
        <ErrorState error={comments.error} onRetry={() => comments.refetch()} />
      ) : ordered.length === 0 ? (
        <p className="text-ink-soft">No comments yet</p>
      ) : (
        <ol className="space-y-2">
          {ordered.map((c) => (
            <CommentItem
              key={c.id}
              comment={c}
              role={role}
              meId={meId}
              members={members}
              busy={edit.isPending || remove.isPending}
              onEdit={(id, body, done) => edit.mutate({ id, body }, { onSuccess: done })}
              onDelete={(id) => remove.mutate(id)}
            />
          ))}
        </ol>
      )}
      {actionError && <FormAlert small message={actionError.message} />}
      {can(role, 'comments.create', { ownerVisible: finding.ownerVisible }) && (
        <CommentCompose
          role={role}
          meId={meId}
          members={members}
          findingShared={finding.ownerVisible}
          sending={create.isPending}
          serverError={create.error?.message}
          onSend={(input, done) => create.mutate(input, { onSuccess: done })}
        />
      )}
    </section>
  );
}
