import { Button } from '../../../components/button';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { ApiError } from '../../../lib/api-client';
import { formatLongDate } from '../../../lib/format';
import { useSharedHelp } from '../api/get-shared-help';
import { HelpContentView } from './help-content-view';
import { HelpReplies } from './help-replies';
import { SharedReplyForm } from './shared-reply-form';

/** The help request behind a read-only link: no account, nothing but what was chosen and shared, printable. */
export function SharedHelpPage({ token }: { token: string }) {
  const query = useSharedHelp(token);
  return (
    <main className="mx-auto max-w-4xl space-y-6 px-4 py-6 print:max-w-none print:p-0">
      <meta name="robots" content="noindex, nofollow, noarchive" />
      <meta name="referrer" content="no-referrer" />
      <title>A restorer asks for help · Gridleak</title>
      {query.isPending && <Loading label="Opening the request…" />}
      {query.isError &&
        (query.error instanceof ApiError && query.error.status === 404 ? (
          <EmptyState title="This link does not work">
            It has expired, was withdrawn, or was copied incompletely. Ask the restorer for a new one.
          </EmptyState>
        ) : (
          <ErrorState error={query.error} onRetry={() => query.refetch()} />
        ))}
      {query.data && (
        <>
          <header className="flex flex-wrap items-start justify-between gap-3">
            <div>
              <p className="text-sm text-ink-soft">Gridleak · a restorer asks for help</p>
              <h1 className="text-2xl font-bold">
                {query.data.set ? `${query.data.set.make} ${query.data.set.model}` : 'Help request'}
              </h1>
              <p className="text-sm text-ink-soft">
                Read-only. This link works until {formatLongDate(query.data.expiresAt)}.
              </p>
            </div>
            <Button variant="quiet" className="print:hidden" onClick={() => window.print()}>
              Print
            </Button>
          </header>
          <p className="rounded-lg border border-rule bg-panel px-4 py-3 text-sm">
            Before measuring inside a mains set, disconnect it or power it through an isolating transformer and a lamp
            limiter, discharge the HT capacitors, and keep one hand away from the chassis; follow your local codes and
            licensed practice.
          </p>
          <HelpContentView content={query.data} />
          <HelpReplies replies={query.data.replies} />
          <SharedReplyForm token={token} />
        </>
      )}
    </main>
  );
}
