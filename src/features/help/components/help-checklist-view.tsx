import type { ReactNode } from 'react';
import { findSymptom } from '../../../../shared/bench/symptoms';
import type { HelpChecklist } from '../../../../shared/schemas/help';
import { causeResultLabels } from '../../../../shared/schemas/symptom-checks';
import { VerdictBadge } from '../../../components/verdict-badge';

/** The checklist inside a help request: each symptom's causes in order, with their test and how each came out. */
export function HelpChecklistView({
  checklist,
  remove,
}: {
  checklist: HelpChecklist[];
  remove?: (symptomId: string) => ReactNode;
}) {
  return (
    <>
      {checklist.map(({ symptomId, checks }) => {
        const symptom = findSymptom(symptomId);
        if (!symptom) return null;
        return (
          <div key={symptomId} className="break-inside-avoid space-y-2">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="font-bold">Checklist: {symptom.title}</h3>
              {remove?.(symptomId)}
            </div>
            <ol className="space-y-1 text-sm">
              {symptom.causes.map((cause, i) => {
                const done = checks.find((c) => c.causeId === cause.id);
                return (
                  <li key={cause.id} className="border-b border-rule pb-1">
                    <span className="font-semibold">
                      {i + 1}. {cause.cause}
                    </span>{' '}
                    <span className={done ? 'font-semibold' : 'text-ink-soft'}>
                      — {done ? causeResultLabels[done.result] : 'not checked yet'}
                    </span>
                    <span className="block text-ink-soft">
                      Test: {cause.test.where}; expect {cause.test.expected}
                    </span>
                    {done?.reading && (
                      <span className="block">
                        {done.reading.location} read <span className="font-mono">{done.reading.reading}</span>{' '}
                        <VerdictBadge verdict={done.reading.verdict} reason={done.reading.verdictReason} />
                      </span>
                    )}
                    {done?.note && <span className="block whitespace-pre-wrap">{done.note}</span>}
                  </li>
                );
              })}
            </ol>
          </div>
        );
      })}
    </>
  );
}
