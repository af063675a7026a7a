import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { equipmentClassLabels, equipmentClasses, type EquipmentClass } from '../../../../shared/bench';
import { safetyTestInputSchema, specificationLabels, specifications } from '../../../../shared/schemas/safety';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useRecordSafetyTest } from '../api/record-safety-test';
import { LeadResistanceHelper } from './lead-resistance-helper';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

type Values = z.input<typeof safetyTestInputSchema>;
type Output = z.output<typeof safetyTestInputSchema>;
type TextField =
  | 'earth'
  | 'lead'
  | 'insulation'
  | 'insulationVolts'
  | 'touchCurrent'
  | 'yCapacitor'
  | 'mainsVolts'
  | 'mainsHertz'
  | 'fuseFitted'
  | 'fuseRecommended';

const valueInput = `${inputClass} font-mono`;
const typed = { autoComplete: 'off', autoCorrect: 'off', spellCheck: false } as const;

const readings: { name: TextField; label: string; hint: string; placeholder: string; classes?: EquipmentClass[] }[] = [
  {
    name: 'earth',
    label: 'Earth continuity (Ω)',
    hint: 'Chassis to plug earth pin',
    placeholder: 'e.g. 0.08',
    classes: ['class-1'],
  },
  {
    name: 'lead',
    label: 'Lead earth-core resistance (Ω)',
    hint: 'Blank or 0 when the meter nulls the lead',
    placeholder: 'e.g. 0.05',
    classes: ['class-1'],
  },
  {
    name: 'insulation',
    label: 'Insulation resistance (Ω)',
    hint: 'Live and neutral joined, to exposed metal',
    placeholder: 'e.g. 50M',
  },
  {
    name: 'insulationVolts',
    label: 'Insulation test voltage (V DC)',
    hint: 'The tester’s setting',
    placeholder: '500',
  },
  {
    name: 'touchCurrent',
    label: 'Touch or leakage current (A)',
    hint: 'Where measured; blank if not',
    placeholder: 'e.g. 0.1m',
  },
  {
    name: 'yCapacitor',
    label: 'Mains-to-chassis capacitor (F)',
    hint: 'Blank if none; its current is computed',
    placeholder: 'e.g. 2n2',
  },
  { name: 'mainsVolts', label: 'Mains voltage (V)', hint: 'For the capacitor current', placeholder: '230' },
  { name: 'mainsHertz', label: 'Mains frequency (Hz)', hint: 'For the capacitor current', placeholder: '50' },
  { name: 'fuseFitted', label: 'Fuse fitted (A)', hint: 'In the set or the plug', placeholder: 'e.g. 1' },
  {
    name: 'fuseRecommended',
    label: 'Fuse recommended (A)',
    hint: 'From the maker’s data or the set’s consumption',
    placeholder: 'e.g. 1',
  },
];

const blank: Values = {
  equipmentClass: 'class-1',
  earth: '',
  lead: '',
  insulation: '',
  insulationVolts: '500',
  touchCurrent: '',
  yCapacitor: '',
  mainsVolts: '230',
  mainsHertz: '50',
  fuseFitted: '',
  fuseRecommended: '',
  leadAndStrainRelief: false,
  coversRefitted: false,
  safetyClassCapacitors: false,
  specification: 'original',
  modifications: '',
  notes: '',
};

/** Records a final safety test as the technician reads the meters; the server judges each line against its limit. */
export function SafetyTestForm({
  restorationId,
  liveChassis,
  onDone,
}: {
  restorationId: number;
  liveChassis: boolean;
  onDone?: () => void;
}) {
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(safetyTestInputSchema),
    defaultValues: { ...blank, equipmentClass: liveChassis ? 'live-chassis' : 'class-1' },
  });
  const {
    register,
    formState: { errors },
  } = form;
  const [equipmentClass = 'class-1', specification = 'original'] = useWatch({
    control: form.control,
    name: ['equipmentClass', 'specification'],
  });
  const record = useRecordSafetyTest(restorationId);
  const serverMessage = record.error?.message;
  const serverField = serverMessage?.match(/^(\w+):/)?.[1];
  const errorOf = (name: keyof Values) =>
    (errors[name]?.message as string | undefined) ?? (serverField === name ? serverMessage : undefined);
  const onSubmit = form.handleSubmit((values) =>
    record.mutate(values, {
      onSuccess: () => {
        form.reset({ ...blank, equipmentClass: values.equipmentClass });
        onDone?.();
      },
    }),
  );
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label="Record a final safety test"
      className="space-y-4 rounded-xl border border-rule bg-panel p-4"
    >
      <h3 className="text-lg font-bold">Record a final safety test</h3>
      <Field label="Class of the set" error={errorOf('equipmentClass')}>
        {(a) => (
          <select {...a} {...register('equipmentClass')} className={inputClass}>
            <LabelledOptions values={equipmentClasses} labels={equipmentClassLabels} />
          </select>
        )}
      </Field>
      <div className="grid gap-3 sm:grid-cols-2">
        {readings
          .filter((r) => !r.classes || r.classes.includes(equipmentClass))
          .map((r) => (
            <Field key={r.name} label={r.label} hint={r.hint} error={errorOf(r.name)}>
              {(a) => (
                <input {...a} {...register(r.name)} {...typed} className={valueInput} placeholder={r.placeholder} />
              )}
            </Field>
          ))}
      </div>
      {equipmentClass === 'class-1' && (
        <LeadResistanceHelper onUse={(ohms) => form.setValue('lead', ohms, { shouldDirty: true })} />
      )}
      <fieldset className="space-y-2">
        <legend className="font-semibold">Checked by eye and hand</legend>
        {(
          [
            ['leadAndStrainRelief', 'Mains lead sound, strain relief fitted'],
            ['coversRefitted', 'Knobs, back cover and insulators refitted'],
            ['safetyClassCapacitors', 'Mains-side capacitors are X/Y safety class'],
          ] as const
        ).map(([name, label]) => (
          <label key={name} className="flex min-h-11 items-center gap-3">
            <input type="checkbox" {...register(name)} className="h-5 w-5 accent-glow" />
            {label}
          </label>
        ))}
      </fieldset>
      <fieldset className="space-y-2">
        <legend className="font-semibold">Specification (matters for later inspection)</legend>
        {specifications.map((s) => (
          <label key={s} className="flex min-h-11 items-center gap-3">
            <input type="radio" value={s} {...register('specification')} className="h-5 w-5 accent-glow" />
            {specificationLabels[s]}
          </label>
        ))}
        {specification === 'modified' && (
          <Field label="What was modified" error={errorOf('modifications')}>
            {(a) => (
              <textarea
                {...a}
                {...register('modifications')}
                rows={2}
                className={inputClass}
                placeholder="e.g. fuse holder added at the mains inlet"
              />
            )}
          </Field>
        )}
      </fieldset>
      <Field label="Notes (optional)" error={errorOf('notes')}>
        {(a) => <textarea {...a} {...register('notes')} rows={2} className={inputClass} />}
      </Field>
      {serverMessage && !serverField && <FormAlert small message={`Not saved: ${serverMessage}`} />}
      <button type="submit" className={buttonClass()} disabled={record.isPending}>
        {record.isPending ? 'Judging…' : 'Record the test'}
      </button>
    </form>
  );
}
