import { useDeferredValue, useState } from 'react';
import { Link, Navigate } from 'react-router';
import { buttonClass } from '../../components/button';
import { inputClass } from '../../components/field';
import { EmptyState, ErrorState, Loading } from '../../components/states';
import { OpenQuestions } from '../../features/findings/components/open-questions';
import { HelpOnBench } from '../../features/help/components/help-on-bench';
import { TasksOnBench } from '../../features/help/components/tasks-on-bench';
import { RecentActivity } from '../../features/history/components/recent-activity';
import { useBenchPages } from '../../features/restorations/api/get-restorations';
import { StageColumns } from '../../features/restorations/components/stage-columns';

export function BenchRoute() {
  const [search, setSearch] = useState('');
  const q = useDeferredValue(search.trim());
  const list = useBenchPages(q ? { q } : {});
  const sets = list.data?.pages.flatMap((p) => p.items);
  // Owners follow their sets from a calmer page of their own.
  if (!q && sets?.length && sets.every((r) => r.role === 'owner')) return <Navigate to="/home" replace />;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold">The bench</h1>
          <p className="text-ink-soft">Every set in the workshop, by where its work stands.</p>
        </div>
        <Link to="/restorations/new" className={buttonClass('primary')}>
          + Take in a set
        </Link>
      </div>
      <OpenQuestions />
      <HelpOnBench />
      <TasksOnBench />
      <div className="max-w-md">
        <label htmlFor="bench-search" className="sr-only">
          Search by make, model or serial
        </label>
        <input
          id="bench-search"
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          placeholder="Search make, model or serial"
          className={inputClass}
        />
      </div>
      {list.isPending ? (
        <Loading label="Fetching the bench…" />
      ) : list.isError && !sets ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : !sets?.length ? (
        q ? (
          <EmptyState title={`Nothing matches “${q}”`}>
            Try part of the maker's name, the model or the serial number.
          </EmptyState>
        ) : (
          <EmptyState title="The bench is clear">
            Take in the first set: its make, model and the owner's account of the fault are enough to start.
          </EmptyState>
        )
      ) : (
        <>
          <StageColumns restorations={sets} />
          {list.isFetchNextPageError && <ErrorState error={list.error} onRetry={() => list.fetchNextPage()} />}
          {list.hasNextPage && (
            <button
              type="button"
              className={buttonClass('quiet')}
              disabled={list.isFetchingNextPage}
              onClick={() => list.fetchNextPage()}
            >
              {list.isFetchingNextPage ? 'Fetching more sets…' : 'Show more sets'}
            </button>
          )}
        </>
      )}
      {!q && <RecentActivity />}
    </div>
  );
}
