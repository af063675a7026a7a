import { useId, useState } from 'react';
import { findSymptom, symptoms } from '../../../../shared/bench/symptoms';
import { causeResultLabels } from '../../../../shared/schemas/symptom-checks';
import { ErrorState, Loading } from '../../../components/states';
import { VerdictBadge } from '../../../components/verdict-badge';
import { usePhotos } from '../../../lib/queries/get-photos';
import { useRecordSymptomCheck, useSymptomChecks } from '../api/symptom-checks';
import { CauseForm } from './cause-form';
import { CauseTest } from './cause-test';

/** The symptom checklist: pick the symptom, work through its likely causes in order, tick each off with its result. */
export function SymptomChecklist({ restorationId, canEdit }: { restorationId: number; canEdit: boolean }) {
  const selectId = useId();
  const checks = useSymptomChecks(restorationId);
  const photos = usePhotos(restorationId);
  const record = useRecordSymptomCheck(restorationId);
  // Until the person picks one, the checklist opens on a symptom already worked on (the first with results).
  const [chosen, setSymptomId] = useState<string | null>(null);
  const symptomId = chosen ?? checks.data?.[0]?.symptomId ?? '';
  const symptom = findSymptom(symptomId);
  const checkedCount = (id: string) => checks.data?.filter((c) => c.symptomId === id).length ?? 0;
  return (
    <section
      aria-labelledby={`${selectId}-h`}
      className="space-y-3 rounded-xl border border-rule bg-panel p-4 print:hidden"
    >
      <h2 id={`${selectId}-h`} className="text-lg font-bold">
        Symptom checklist
      </h2>
      <label htmlFor={selectId} className="block font-semibold">
        Symptom
      </label>
      <select
        id={selectId}
        className="min-h-11 w-full rounded-lg border border-rule bg-panel px-3"
        value={symptomId}
        onChange={(e) => setSymptomId(e.target.value)}
      >
        <option value="">Choose the symptom…</option>
        {symptoms.map((s) => (
          <option key={s.id} value={s.id}>
            {s.title}
            {checkedCount(s.id) > 0 ? ` (${checkedCount(s.id)} checked)` : ''}
          </option>
        ))}
      </select>
      {checks.isPending && <Loading label="Loading the results…" />}
      {checks.isError && <ErrorState error={checks.error} onRetry={() => checks.refetch()} />}
      {symptom && checks.data && (
        <>
          <p className="text-sm text-ink-soft">{symptom.description} Likely causes, most likely first:</p>
          <ol className="space-y-3">
            {symptom.causes.map((cause, i) => {
              const done = checks.data.find((c) => c.symptomId === symptom.id && c.causeId === cause.id);
              return (
                <li key={cause.id} className="space-y-2 rounded-lg border border-rule p-3" aria-label={cause.cause}>
                  <p className="font-semibold">
                    {i + 1}. {cause.cause}
                  </p>
                  <CauseTest cause={cause} />
                  {done && (
                    <p role="status" className="text-sm">
                      <span className="font-semibold">{causeResultLabels[done.result]}</span>
                      {done.reading && (
                        <>
                          {' '}
                          · {done.reading.location} read {done.reading.reading}{' '}
                          <VerdictBadge verdict={done.reading.verdict} reason={done.reading.verdictReason} />
                        </>
                      )}
                      {done.finding && <> · finding #{done.finding.number} opened</>}
                      {done.note && <span className="block text-ink-soft">{done.note}</span>}
                    </p>
                  )}
                  {canEdit && (
                    <CauseForm
                      key={done?.updatedAt}
                      cause={cause}
                      photos={photos.data ?? []}
                      pending={record.isPending && record.variables?.causeId === cause.id}
                      onSave={(input) => record.mutate({ symptomId: symptom.id, causeId: cause.id, input })}
                    />
                  )}
                </li>
              );
            })}
          </ol>
          {record.isError && (
            <p role="alert" className="font-semibold text-danger">
              {record.error.message}
            </p>
          )}
          {canEdit && (
            <p className="text-sm text-ink-soft">
              Symptoms with results go into the next help request you start; you can remove them there.
            </p>
          )}
        </>
      )}
    </section>
  );
}
