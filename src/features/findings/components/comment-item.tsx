import { useId, useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { commentPatchSchema, type Comment } from '../../../../shared/schemas/comments';
import { buttonClass } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useConfirm } from '../../../components/use-confirm';
import { CommentText, VisibilityMark } from './comment-text';
import { fullTime, relativeTime, type FindingMember } from './finding-format';

const smallButton = 'min-h-11 rounded-lg px-3 text-sm hover:bg-sunken';

function EditForm({
  initial,
  busy,
  onSave,
  onCancel,
}: {
  initial: string;
  busy: boolean;
  onSave: (body: string) => void;
  onCancel: () => void;
}) {
  const id = useId();
  const [body, setBody] = useState(initial);
  const [error, setError] = useState<string>();
  const save = () => {
    const parsed = commentPatchSchema.safeParse({ body });
    if (!parsed.success) return setError('Write something, or delete the comment instead');
    onSave(parsed.data.body);
  };
  return (
    <form
      noValidate
      className="space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        save();
      }}
    >
      <label htmlFor={id} className="sr-only">
        Edit comment
      </label>
      <textarea
        id={id}
        rows={3}
        value={body}
        autoFocus
        aria-invalid={Boolean(error)}
        onChange={(e) => setBody(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) {
            e.preventDefault();
            save();
          } else if (e.key === 'Escape') {
            e.preventDefault();
            onCancel();
          }
        }}
        className={inputClass}
      />
      {error && <p className="text-sm font-semibold text-danger">{error}</p>}
      <div className="flex gap-2">
        <button type="submit" className={buttonClass('primary')} disabled={busy}>
          Save
        </button>
        <button type="button" className={buttonClass('quiet')} onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}

/** One comment in a thread, with edit (its author) and delete (its author or a technician). */
export function CommentItem({
  comment,
  role,
  meId,
  members,
  busy,
  onEdit,
  onDelete,
}: {
  comment: Comment;
  role: Role;
  meId: number;
  members: FindingMember[];
  busy: boolean;
  onEdit: (id: number, body: string, done: () => void) => void;
  onDelete: (id: number) => void;
}) {
  const [editing, setEditing] = useState(false);
  const { confirm, dialog } = useConfirm();
  const deleted = Boolean(comment.deletedAt);
  const isAuthor = comment.authorId !== null && comment.authorId === meId;
  const canEdit = !deleted && can(role, 'comments.edit', { isAuthor });
  const canDelete = !deleted && can(role, 'comments.delete', { isAuthor });
  const author = comment.authorName ?? 'A former member';

  return (
    <li className={`space-y-1 rounded-lg px-3 py-2 ${comment.internal ? 'bg-sunken' : 'border border-rule bg-panel'}`}>
      <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm">
        <span className="font-semibold text-ink">{author}</span>
        <time dateTime={comment.createdAt} title={fullTime(comment.createdAt)} className="text-ink-soft">
          {relativeTime(comment.createdAt)}
        </time>
        {comment.editedAt && !deleted && (
          <span className="text-ink-soft" title={`Edited ${fullTime(comment.editedAt)}`}>
            · edited
          </span>
        )}
        {/* Everything an owner reads is shared with them; the marker is for the team. */}
        {role !== 'owner' && <VisibilityMark internal={comment.internal} />}
      </p>
      {deleted ? (
        <p className="text-ink-soft italic">Comment deleted</p>
      ) : editing ? (
        <EditForm
          initial={comment.body}
          busy={busy}
          onCancel={() => setEditing(false)}
          onSave={(body) => onEdit(comment.id, body, () => setEditing(false))}
        />
      ) : (
        <CommentText body={comment.body} members={members} />
      )}
      {!editing && (canEdit || canDelete) && (
        <div className="flex gap-1">
          {canEdit && (
            <button
              type="button"
              className={smallButton}
              onClick={() => setEditing(true)}
              aria-label={`Edit comment by ${author}`}
            >
              Edit
            </button>
          )}
          {canDelete && (
            <button
              type="button"
              className={`${smallButton} text-danger`}
              disabled={busy}
              aria-label={`Delete comment by ${author}`}
              onClick={() =>
                void confirm({
                  title: 'Delete this comment?',
                  consequence: 'Its words are removed; its place in the thread stays, marked deleted.',
                  confirmLabel: 'Delete comment',
                  danger: true,
                }).then((yes) => yes && onDelete(comment.id))
              }
            >
              Delete
            </button>
          )}
        </div>
      )}
      {dialog}
    </li>
  );
}
