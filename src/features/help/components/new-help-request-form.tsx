import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { helpRequestInputSchema } from '../../../../shared/schemas/help';
import { Button } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useCreateHelpRequest } from '../api/create-help-request';

/** Starts a request from the symptom; the set, valves, parts, readings and pinned photos are filled in by the server. */
export function NewHelpRequestForm({
  restorationId,
  onCreated,
}: {
  restorationId: number;
  onCreated: (id: number) => void;
}) {
  const create = useCreateHelpRequest(restorationId);
  const form = useForm<{ symptom: string }>({
    resolver: zodResolver(helpRequestInputSchema),
    defaultValues: { symptom: '' },
  });
  return (
    <form
      className="space-y-3 rounded-xl border border-rule bg-panel p-4 print:hidden"
      noValidate
      onSubmit={form.handleSubmit((v) =>
        create.mutate(v.symptom, {
          onSuccess: (r) => {
            form.reset();
            onCreated(r.id);
          },
        }),
      )}
    >
      <h2 className="text-lg font-bold">Ask for help</h2>
      <Field
        label="The symptom, in your words"
        hint="e.g. Hum that rises as the set warms up; the dial lamp flickers with it."
        error={form.formState.errors.symptom?.message}
      >
        {(p) => <textarea {...p} {...form.register('symptom')} rows={3} className={inputClass} />}
      </Field>
      {create.isError && (
        <p role="alert" className="font-semibold text-danger">
          {create.error.message}
        </p>
      )}
      <Button type="submit" disabled={create.isPending}>
        {create.isPending ? 'Gathering…' : 'Start a help request'}
      </Button>
      <p className="text-sm text-ink-soft">
        It is pre-filled with the set, valve line-up, fitted parts, readings and pinned photos; remove what is not
        relevant.
      </p>
    </form>
  );
}
