import { useState } from 'react';
import type { HelpLinkCreated, HelpRequest } from '../../../../shared/schemas/help';
import { Button } from '../../../components/button';
import { useCreateHelpLink } from '../api/create-help-link';
import { useRevokeHelpLink } from '../api/revoke-help-link';
import { formatDateTime } from '../../../lib/format';

/** Makes a read-only link (shown once: only its hash is kept), and withdraws it. */
export function HelpLinkPanel({ request }: { request: HelpRequest }) {
  const create = useCreateHelpLink(request.id);
  const revoke = useRevokeHelpLink(request.id);
  const [made, setMade] = useState<HelpLinkCreated | null>(null);
  const live = request.links.filter((l) => !l.revokedAt && Date.parse(l.expiresAt) > Date.now());
  return (
    <section className="space-y-2 rounded-xl border border-rule bg-panel p-4 print:hidden">
      <h2 className="text-lg font-bold">Share outside the workshop</h2>
      <p className="text-sm text-ink-soft">
        Anyone with the link can read this request for 7 days, without an account. It shows only what is shared with the
        owner (no unshared photos or readings, no internal comments, no owner details), and replies wait for your
        approval.
      </p>
      {made ? (
        <div className="space-y-2">
          <label className="block text-sm font-semibold" htmlFor="help-link-url">
            Link (copy it now; it is not shown again)
          </label>
          <input
            id="help-link-url"
            readOnly
            value={made.url}
            className="w-full rounded-lg border border-rule bg-sunken px-3 py-2 font-mono text-sm"
            onFocus={(e) => e.currentTarget.select()}
          />
          <p className="text-sm">Works until {formatDateTime(made.expiresAt)}.</p>
          <div className="flex flex-wrap gap-2">
            <Button variant="quiet" onClick={() => void navigator.clipboard?.writeText(made.url)}>
              Copy
            </Button>
            <Button
              variant="danger"
              disabled={revoke.isPending}
              onClick={() => revoke.mutate(made.token, { onSuccess: () => setMade(null) })}
            >
              Withdraw this link
            </Button>
          </div>
        </div>
      ) : (
        <Button disabled={create.isPending} onClick={() => create.mutate(undefined, { onSuccess: setMade })}>
          {create.isPending ? 'Making the link…' : 'Make a read-only link'}
        </Button>
      )}
      {(create.isError || revoke.isError) && (
        <p role="alert" className="font-semibold text-danger">
          {(create.error ?? revoke.error)?.message}
        </p>
      )}
      <p className="text-sm text-ink-soft">
        {live.length === 0
          ? 'No link works now.'
          : `${live.length} link${live.length > 1 ? 's' : ''} working now; the last ends ${formatDateTime(live[0]!.expiresAt)}.`}
      </p>
    </section>
  );
}
