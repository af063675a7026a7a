import { NavLink, Outlet, useParams } from 'react-router';
import { can, roleLabels } from '../../../shared/permissions';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { ApiError } from '../../lib/api-client';
import { useRestoration } from '../../features/restorations/api/get-restoration';
import { StageBadge } from '../../features/restorations/components/stage-badge';

const tabClass = ({ isActive }: { isActive: boolean }) =>
  `min-h-11 inline-flex items-center border-b-3 px-3 font-semibold ${isActive ? 'border-glow text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`;

const tabs = [
  ['.', 'Overview'],
  ['photos', 'Photos'],
  ['sheets', 'Service sheet'],
  ['findings', 'Findings'],
  ['bring-up', 'Bring-up'],
  ['readings', 'Readings'],
  ['parts', 'Parts'],
  ['safety', 'Safety'],
  ['money', 'Money'],
  ['history', 'History'],
  ['people', 'People'],
  ['help', 'Help'],
] as const;

/** One restoration's notebook: its header and tabs; each tab is a child route. */
export function RestorationLayout() {
  const id = Number(useParams().id);
  const query = useRestoration(id);
  if (query.isPending) return <Loading label="Opening the notebook…" />;
  if (query.isError)
    return query.error instanceof ApiError && query.error.status === 404 ? (
      <EmptyState title="Restoration not found">It does not exist, or you are not a member of it.</EmptyState>
    ) : (
      <ErrorState error={query.error} onRetry={() => query.refetch()} />
    );
  const r = query.data;
  return (
    <article className="space-y-4">
      <header className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">
          {r.make} {r.model} {r.year && <span className="font-mono text-lg text-ink-soft">{r.year}</span>}
        </h1>
        <StageBadge stage={r.stage} />
        <span className="text-sm text-ink-soft">You: {roleLabels[r.role]}</span>
      </header>
      <nav
        aria-label="Restoration"
        className="-mx-4 flex overflow-x-auto border-b border-rule px-4 whitespace-nowrap print:hidden"
      >
        {tabs
          .filter(
            ([to]) => (to !== 'help' || can(r.role, 'help.view')) && (to !== 'money' || can(r.role, 'money.view')),
          )
          .map(([to, label]) => (
            <NavLink key={to} to={to} end={to === '.'} className={tabClass}>
              {label}
            </NavLink>
          ))}
      </nav>
      <Outlet context={r} />
    </article>
  );
}
