import type { UseFormRegister } from 'react-hook-form';
import { Field, inputClass } from '../../../components/field';
import type { ReadingFormValues } from '../hooks/use-reading-form';
import type { ReadingField } from '../lib/verdict-preview';

const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

/**
 * For a voltage: the meter the service chart was taken with, the meter used, and the point's source resistance.
 * With all three the reading is judged against what this meter should read there, not against the chart's figure.
 */
export function MeterLoadingFields({
  register,
  errorOf,
  open,
}: {
  register: UseFormRegister<ReadingFormValues>;
  errorOf: (field: ReadingField) => string | undefined;
  open: boolean;
}) {
  return (
    <details open={open} className="rounded-lg border border-rule px-3 py-2">
      <summary className="cursor-pointer font-semibold">Chart taken with another meter (optional)</summary>
      <p className="mt-1 text-sm text-ink-soft">
        Service charts name their meter. Give it, yours and the resistance feeding the point, and the reading is judged
        against what your meter should read there.
      </p>
      <div className="mt-2 grid gap-3 sm:grid-cols-3">
        <Field label="Chart’s meter" hint="Ω/V and range, e.g. 1k/V 300 V" error={errorOf('chartMeter')}>
          {(a) => <input {...a} {...register('chartMeter')} {...typed} className={`${inputClass} font-mono`} />}
        </Field>
        <Field label="Your meter" hint="e.g. 10 MΩ, or 20k/V 300 V" error={errorOf('meter')}>
          {(a) => <input {...a} {...register('meter')} {...typed} className={`${inputClass} font-mono`} />}
        </Field>
        <Field
          label="Source resistance"
          hint="The anode load or dropper feeding the point, e.g. 100k"
          error={errorOf('source')}
        >
          {(a) => <input {...a} {...register('source')} {...typed} className={`${inputClass} font-mono`} />}
        </Field>
      </div>
    </details>
  );
}
