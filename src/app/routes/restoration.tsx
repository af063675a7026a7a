import { equipmentKindLabels, workLevelLabels } from '../../../shared/schemas/restorations';
import { useRestorationContext } from '../restoration-context';

export function RestorationRoute() {
  const r = useRestorationContext();
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
    <div className="space-y-4">
      {r.liveChassis && (
        <p role="note" className="rounded-lg border-l-4 border-danger bg-danger-soft px-4 py-3">
          <strong>Live chassis.</strong> The chassis may sit at mains potential: work through an isolation transformer, keep one hand
          away, and refit insulating knobs and covers before hand-back. Follow local electrical codes and licensed practice.
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
    </div>
  );
}
