import { useId, useRef, useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import { commentInputSchema } from '../../../../shared/schemas/comments';
import { buttonClass } from '../../../components/button';
import { inputClass } from '../../../components/field';
import type { FindingMember } from './finding-format';
import { MentionList } from './mention-list';
import { useMentionPicker } from './use-mention-picker';

/** The box a new comment is written in. Ctrl+Enter (⌘+Enter) sends; "@" offers members. */
export function CommentCompose({
  role,
  meId,
  members,
  findingShared,
  sending,
  serverError,
  onSend,
}: {
  role: Role;
  meId: number;
  members: FindingMember[];
  findingShared: boolean;
  sending: boolean;
  serverError?: string;
  onSend: (input: { body: string; internal: boolean }, done: () => void) => void;
}) {
  const id = useId();
  const ref = useRef<HTMLTextAreaElement>(null);
  const [body, setBody] = useState('');
  const [internal, setInternal] = useState(true);
  const [error, setError] = useState<string>();
  const canChoose = can(role, 'comments.internal');
  const isInternal = canChoose && internal;
  // An internal comment never reaches the owner, so there is no point offering them.
  const mentionable = members.filter((m) => m.userId !== meId && !(isInternal && m.role === 'owner'));
  const picker = useMentionPicker(mentionable, ref, body, setBody);

  function send() {
    const parsed = commentInputSchema.safeParse({ body, internal: isInternal });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setError(undefined);
    onSend({ body: parsed.data.body, internal: parsed.data.internal }, () => setBody(''));
  }

  const message = error ?? serverError;
  return (
    <form
      noValidate
      className="space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        send();
      }}
    >
      <label htmlFor={`${id}-body`} className="block font-semibold">
        Add a comment
      </label>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        Ctrl+Enter or ⌘+Enter sends · type @ to mention someone
      </p>
      <div className="relative">
        <textarea
          ref={ref}
          id={`${id}-body`}
          rows={3}
          value={body}
          aria-invalid={Boolean(error)}
          aria-describedby={`${id}-hint${message ? ` ${id}-error` : ''}`}
          {...picker.inputProps}
          onChange={(e) => {
            setBody(e.target.value);
            picker.track(e.target.value, e.target.selectionStart ?? e.target.value.length);
          }}
          onBlur={picker.close}
          onKeyDown={(e) => {
            if (picker.onKeyDown(e)) return;
            if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) {
              e.preventDefault();
              send();
            }
          }}
          className={inputClass}
        />
        {picker.open && (
          <MentionList
            id={picker.listId}
            options={picker.options}
            active={picker.active}
            optionId={picker.optionId}
            onPick={picker.pick}
          />
        )}
      </div>
      {canChoose && (
        <fieldset className="space-y-1">
          <legend className="font-semibold">Who sees it</legend>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name={`${id}-visibility`}
              checked={internal}
              onChange={() => setInternal(true)}
              className="h-5 w-5 accent-glow"
            />
            <span aria-hidden="true">◆</span> Internal (technicians and mentors only)
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name={`${id}-visibility`}
              checked={!internal}
              onChange={() => setInternal(false)}
              className="h-5 w-5 accent-glow"
            />
            <span aria-hidden="true">◇</span> Shared with the owner
          </label>
          {!internal && !findingShared && (
            <p className="text-sm text-ink-soft">The owner reads it once this finding and its photo are shared.</p>
          )}
        </fieldset>
      )}
      {message && (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-danger">
          {message}
        </p>
      )}
      <button type="submit" className={buttonClass('primary')} disabled={sending}>
        {sending ? 'Sending…' : 'Send comment'}
      </button>
    </form>
  );
}
