import { tokenizeComment } from './comment-body';

/** A comment's words as written: line breaks kept, http(s) links clickable, @mentions of members marked. */
export function CommentText({ body, members }: { body: string; members: readonly { name: string }[] }) {
  return (
    <p className="break-words whitespace-pre-wrap">
      {tokenizeComment(body, members).map((t, i) =>
        t.kind === 'link' ? (
          <a
            key={i}
            href={t.href}
            target="_blank"
            rel="noopener noreferrer"
            className="font-semibold break-all text-glow-strong underline"
          >
            {t.text}
          </a>
        ) : t.kind === 'mention' ? (
          <mark key={i} className="rounded bg-glow-soft px-0.5 font-semibold text-glow-strong">
            {t.text}
          </mark>
        ) : (
          <span key={i}>{t.text}</span>
        ),
      )}
    </p>
  );
}

/** Who sees a comment, in a word and a glyph, never by colour alone. */
export function VisibilityMark({ internal }: { internal: boolean }) {
  return internal ? (
    <span className="inline-flex items-center gap-1 rounded-full bg-sunken px-2 py-0.5 text-xs font-semibold text-ink-soft">
      <span aria-hidden="true">◆</span> Internal
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 rounded-full border border-glow px-2 py-0.5 text-xs font-semibold text-glow-strong">
      <span aria-hidden="true">◇</span> Shared with owner
    </span>
  );
}
