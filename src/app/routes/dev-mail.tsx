import { EmptyState, ErrorState, Loading } from '../../components/states';
import { useDevMail } from '../../features/dev-mail/api/get-dev-mail';
import { MailList } from '../../features/dev-mail/components/mail-list';

export function DevMailRoute() {
  const mail = useDevMail();
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Captured e-mail</h1>
      <p className="text-ink-soft">
        In development and tests, Gridleak's e-mail lands here instead of being delivered.
      </p>
      {mail.isPending ? (
        <Loading label="Fetching captured e-mail…" />
      ) : mail.isError ? (
        <ErrorState error={mail.error} onRetry={() => mail.refetch()} />
      ) : mail.data.length === 0 ? (
        <EmptyState title="No e-mail captured yet" />
      ) : (
        <MailList mails={mail.data} />
      )}
    </div>
  );
}
