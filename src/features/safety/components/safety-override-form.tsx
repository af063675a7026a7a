import { useState } from 'react';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useRecordSafetyOverride } from '../api/record-safety-override';

/**
 * Returning a set without a passing safety test: a technician's decision, with the reason, shown in red in the
 * history and on the owner's report.
 */
export function SafetyOverrideForm({ restorationId }: { restorationId: number }) {
  const [reason, setReason] = useState('');
  const override = useRecordSafetyOverride(restorationId);
  const tooShort = reason.trim().length < 10;
  return (
    <form
      aria-label="Return without a passing safety test"
      className="space-y-3 rounded-xl border-2 border-danger/60 bg-panel p-4"
      onSubmit={(e) => {
        e.preventDefault();
        if (!tooShort) override.mutate(reason.trim(), { onSuccess: () => setReason('') });
      }}
    >
      <h3 className="text-lg font-bold text-danger">Return without a passing test (override)</h3>
      <p className="text-sm">
        Only when there is a good reason (a display piece that will never be plugged in, the owner’s own electrician
        will test it…). The override and its reason are shown in red in the history and on the owner’s report.
      </p>
      <Field label="Reason" hint="At least a sentence" error={override.error?.message}>
        {(a) => (
          <textarea {...a} rows={2} className={inputClass} value={reason} onChange={(e) => setReason(e.target.value)} />
        )}
      </Field>
      <button type="submit" className={buttonClass('danger')} disabled={tooShort || override.isPending}>
        {override.isPending ? 'Recording…' : 'Record the override'}
      </button>
    </form>
  );
}
