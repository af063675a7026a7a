import type { Preview } from '../lib/verdict-preview';
import { VerdictBadge } from '../../../components/verdict-badge';

/** The verdict the reading will get, worked out as it is typed; the server's verdict counts once saved. */
export function VerdictPreviewPanel({ preview }: { preview: Preview }) {
  return (
    <div
      aria-live="polite"
      aria-label="Verdict preview"
      role="region"
      className="rounded-lg border border-rule bg-sunken px-3 py-2"
    >
      {preview.status === 'waiting' && <p className="text-ink-soft">Type the reading to see the verdict.</p>}
      {preview.status === 'refused' && (
        <p className="text-ink-soft">No verdict yet: {preview.field ? 'see the marked field.' : preview.message}</p>
      )}
      {preview.status === 'ready' && (
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <VerdictBadge verdict={preview.verdict.verdict} large />
          <span className="font-mono">{preview.verdict.summary}</span>
          <p className="w-full text-sm">{preview.verdict.reason}</p>
          {preview.verdict.hint && <p className="w-full text-sm font-semibold">{preview.verdict.hint}</p>}
        </div>
      )}
    </div>
  );
}
