import { useEffect, useId, useRef, useState } from 'react';
import { buttonClass } from '../../../components/button';
import { useDeletePhoto } from '../api/delete-photo';

/** Two steps, the safe choice focused: a deleted photo cannot be brought back. */
export function DeletePhoto({
  restorationId,
  photoId,
  onDeleted,
}: {
  restorationId: number;
  photoId: number;
  onDeleted: (id: number) => void;
}) {
  const remove = useDeletePhoto(restorationId);
  const [confirming, setConfirming] = useState(false);
  const keepRef = useRef<HTMLButtonElement>(null);
  const askRef = useRef<HTMLButtonElement>(null);
  const questionId = useId();
  const wasConfirming = useRef(false);

  useEffect(() => {
    if (confirming) keepRef.current?.focus();
    else if (wasConfirming.current) askRef.current?.focus();
    wasConfirming.current = confirming;
  }, [confirming]);

  if (!confirming)
    return (
      <button
        ref={askRef}
        type="button"
        className="inline-flex min-h-11 w-full items-center justify-center rounded-lg border border-danger/50 px-4 py-2 font-semibold text-danger hover:bg-danger-soft"
        onClick={() => setConfirming(true)}
      >
        Delete photo
      </button>
    );
  return (
    <div
      role="group"
      aria-labelledby={questionId}
      className="space-y-3 rounded-lg border border-danger/40 bg-danger-soft p-3"
    >
      <p id={questionId} className="font-semibold">
        Delete this photo for good? It cannot be brought back.
      </p>
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className={buttonClass('danger')}
          disabled={remove.isPending}
          onClick={() => remove.mutate(photoId, { onSuccess: () => onDeleted(photoId) })}
        >
          {remove.isPending ? 'Deleting…' : 'Delete'}
        </button>
        <button ref={keepRef} type="button" className={buttonClass('quiet')} onClick={() => setConfirming(false)}>
          Keep it
        </button>
      </div>
      {remove.isError && (
        <p role="alert" className="text-sm font-semibold text-danger">
          Not deleted: {remove.error.message}
        </p>
      )}
    </div>
  );
}
