import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { photoPatchSchema } from '../../../../shared/schemas/photos';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';

const captionSchema = photoPatchSchema.pick({ caption: true }).required();

/** The caption is saved on Enter or with its button; the form forgets its edits when another photo is shown. */
export function CaptionForm({
  caption,
  onSave,
  pending,
}: {
  caption: string;
  onSave: (caption: string) => void;
  pending: boolean;
}) {
  const { register, handleSubmit, formState, reset } = useForm({
    resolver: zodResolver(captionSchema),
    values: { caption },
    // A refetch that brings the same or a newer caption must not wipe what is being typed.
    resetOptions: { keepDirtyValues: true },
  });
  return (
    <form
      noValidate
      className="flex items-end gap-2"
      onSubmit={handleSubmit((v) => {
        onSave(v.caption);
        reset(v);
      })}
    >
      <div className="min-w-0 flex-1">
        <Field label="Caption" error={formState.errors.caption?.message}>
          {(a) => <input {...a} {...register('caption')} maxLength={500} className={inputClass} />}
        </Field>
      </div>
      <button type="submit" className={buttonClass('quiet')} disabled={pending || !formState.isDirty}>
        Save
      </button>
    </form>
  );
}
