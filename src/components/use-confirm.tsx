import { useCallback, useState } from 'react';
import { ConfirmDialog, type ConfirmRequest } from './confirm-dialog';

/**
 * Ask before an action: `if (await confirm({ title, consequence, confirmLabel })) …`. Render `dialog` somewhere
 * in the component; it is empty until a question is open.
 */
export function useConfirm() {
  const [open, setOpen] = useState<{ request: ConfirmRequest; resolve: (yes: boolean) => void }>();
  const confirm = useCallback(
    (request: ConfirmRequest) => new Promise<boolean>((resolve) => setOpen({ request, resolve })),
    [],
  );
  const answer = (yes: boolean) => {
    open?.resolve(yes);
    setOpen(undefined);
  };
  return { confirm, dialog: <ConfirmDialog request={open?.request} onAnswer={answer} /> };
}
