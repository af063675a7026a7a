import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { helpReplyInputSchema, type HelpReplyInput } from '../../../../shared/schemas/help';
import { Button } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { usePostSharedReply } from '../api/post-shared-reply';

/** A reply from someone without an account: it waits for the technician's approval before anyone sees it. */
export function SharedReplyForm({ token }: { token: string }) {
  const post = usePostSharedReply(token);
  const form = useForm<HelpReplyInput>({
    resolver: zodResolver(helpReplyInputSchema),
    defaultValues: { name: '', body: '' },
  });
  const { errors } = form.formState;
  if (post.isSuccess)
    return (
      <p role="status" className="rounded-lg border border-ok bg-panel px-4 py-3">
        Thank you. Your reply was sent to the technician, who will add it to the thread once they have read it.
      </p>
    );
  return (
    <form className="space-y-3 print:hidden" onSubmit={form.handleSubmit((values) => post.mutate(values))} noValidate>
      <h2 className="text-lg font-bold">Leave a reply</h2>
      <Field label="Your name" error={errors.name?.message}>
        {(p) => <input {...p} {...form.register('name')} className={inputClass} autoComplete="name" />}
      </Field>
      <Field label="Your reply" hint="What to check next, and what reading to expect." error={errors.body?.message}>
        {(p) => <textarea {...p} {...form.register('body')} rows={5} className={inputClass} />}
      </Field>
      {post.isError && (
        <p role="alert" className="font-semibold text-danger">
          {post.error.message} Your text is still here.
        </p>
      )}
      <Button type="submit" disabled={post.isPending}>
        {post.isPending ? 'Sending…' : 'Send reply'}
      </Button>
    </form>
  );
}
