import type { CapturedMail } from '../../../../shared/schemas/dev-mail';
import { formatDateTime } from '../../../lib/format';

/** Captured messages as plain text; links in them are made clickable. */
export function MailList({ mails }: { mails: CapturedMail[] }) {
  return (
    <ul className="space-y-3">
      {mails.map((m, i) => (
        <li key={`${m.date}-${i}`} className="rounded-xl border border-rule bg-panel p-4">
          <p className="text-sm text-ink-soft">
            {formatDateTime(m.date)} · to <span className="font-mono">{m.to}</span>
          </p>
          <p className="mt-1 font-bold">{m.subject}</p>
          <pre className="mt-2 font-sans text-sm break-words whitespace-pre-wrap">{linkify(m.text)}</pre>
        </li>
      ))}
    </ul>
  );
}

function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="text-glow-strong underline">
        {part}
      </a>
    ) : (
      part
    ),
  );
}
