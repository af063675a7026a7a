import type { HelpReply } from '../../../../shared/schemas/help';
import { formatDateTime } from '../../../lib/format';

/** The thread of replies; `action` adds a control to a reply (the technician's approval). */
export function HelpReplies({
  replies,
  action,
}: {
  replies: HelpReply[];
  action?: (reply: HelpReply) => React.ReactNode;
}) {
  return (
    <section className="break-inside-avoid space-y-2">
      <h2 className="text-lg font-bold">Replies</h2>
      {replies.length === 0 ? (
        <p className="text-ink-soft">No replies yet.</p>
      ) : (
        <ul className="space-y-3">
          {replies.map((r) => (
            <li
              key={r.id}
              className={`rounded-lg border px-4 py-3 ${r.approved ? 'border-rule bg-panel' : 'border-dashed border-glow'}`}
            >
              <p className="text-sm">
                <span className="font-semibold">{r.name}</span>{' '}
                <span className="text-ink-soft">{formatDateTime(r.createdAt)}</span>
                {!r.approved && <span className="ml-2 font-semibold text-glow-strong">waiting for approval</span>}
              </p>
              <p className="mt-1 whitespace-pre-wrap">{r.body}</p>
              {action?.(r)}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
