import { stageLabels, stages, type Restoration } from '../../../../shared/schemas/restorations';
import { RestorationCard } from './restoration-card';
import { stageGlyphs } from './stage-badge';

/** The bench: restorations grouped by stage, in the order work flows. Empty stages are left out. */
export function StageColumns({ restorations }: { restorations: Restoration[] }) {
  const groups = stages
    .map((stage) => ({ stage, items: restorations.filter((r) => r.stage === stage) }))
    .filter((g) => g.items.length);
  return (
    <div className="grid gap-6 md:grid-cols-2 lg:grid-cols-3">
      {groups.map(({ stage, items }) => (
        <section key={stage} aria-labelledby={`stage-${stage}`}>
          <h2
            id={`stage-${stage}`}
            className="mb-2 flex items-center gap-2 text-sm font-bold tracking-wider text-ink-soft uppercase"
          >
            <span aria-hidden="true">{stageGlyphs[stage]}</span>
            {stageLabels[stage]}
            <span className="rounded-full bg-sunken px-2 font-mono text-xs">{items.length}</span>
          </h2>
          <ul className="space-y-3">
            {items.map((r) => (
              <RestorationCard key={r.id} restoration={r} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
