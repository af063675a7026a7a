import { useState } from 'react';
import type { Part } from '../../../../shared/schemas/parts';
import { Button } from '../../../components/button';
import { useDeletePart } from '../api/delete-part';

/** Takes a line out of the ledger, after a second press to confirm. */
export function DeletePart({
  restorationId,
  part,
  onDeleted,
}: {
  restorationId: number;
  part: Part;
  onDeleted?: () => void;
}) {
  const [asking, setAsking] = useState(false);
  const remove = useDeletePart(restorationId);
  return (
    <div className="flex flex-wrap items-center gap-2 sm:ml-auto">
      {asking ? (
        <>
          <span className="text-sm font-semibold">Delete {part.componentRef} from the ledger?</span>
          <Button
            variant="danger"
            disabled={remove.isPending}
            onClick={() => remove.mutate(part.id, { onSuccess: () => onDeleted?.() })}
          >
            {remove.isPending ? 'Deleting…' : 'Delete'}
          </Button>
          <Button variant="quiet" onClick={() => setAsking(false)}>
            Keep it
          </Button>
        </>
      ) : (
        <Button variant="quiet" onClick={() => setAsking(true)}>
          Delete…
        </Button>
      )}
      {remove.error && (
        <p role="alert" className="w-full text-sm font-semibold text-danger">
          Not deleted: {remove.error.message}
        </p>
      )}
    </div>
  );
}
