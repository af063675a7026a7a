import { useParams } from 'react-router';
import { equipmentKindLabels, workLevelLabels } from '../../../shared/schemas/restorations';
import { ErrorState, Loading } from '../../components/states';
import { useRestoration } from '../../features/restorations/api/get-restoration';
import { StageBadge } from '../../features/restorations/components/stage-badge';

export function RestorationRoute() {
  const id = Number(useParams().id);
  const query = useRestoration(id);
  if (query.isPending) return <Loading label="Opening the notebook…" />;
  if (query.isError) return <ErrorState error={query.error} />;
  const r = query.data;
  const rows: [string, string | null][] = [
    ['Kind', equipmentKindLabels[r.equipmentKind]],
    ['Serial', r.serial],
    ['Mains setting', r.mainsSetting],
    ['Level of work', workLevelLabels[r.workLevel] + (r.hiddenPartsOriginal ? ', hidden parts original' : '')],
    ['Received', r.receivedOn],
    ['Symptoms', r.symptoms],
    ['Condition', r.conditionNotes],
    ['Story', r.story],
  ];
  return (
    <article className="space-y-4">
      <header className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold">
          {r.make} {r.model} {r.year && <span className="font-mono text-lg text-ink-soft">{r.year}</span>}
        </h1>
        <StageBadge stage={r.stage} />
      </header>
      {r.liveChassis && (
        <p role="note" className="rounded-lg border-l-4 border-danger bg-danger-soft px-4 py-3">
          <strong>Live chassis.</strong> The chassis may sit at mains potential: work through an isolation transformer, keep one hand
          away, and refit insulating knobs and covers before hand-back.
        </p>
      )}
      <dl className="grid gap-x-6 gap-y-3 rounded-xl border border-rule bg-panel p-5 sm:grid-cols-[12rem_1fr]">
        {rows
          .filter(([, v]) => v)
          .map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="font-semibold text-ink-soft">{k}</dt>
              <dd className="whitespace-pre-line">{v}</dd>
            </div>
          ))}
      </dl>
    </article>
  );
}
