import { useMutation, useQueryClient } from '@tanstack/react-query';
import { bringupSchema } from '../../../../shared/schemas/bringup';
import { api } from '../../../lib/api-client';
import { afterWrite } from './keys';

/** Signs the pre-power checklist off; a 409 lists what is still missing. */
export const signOffPrePower = (restorationId: number) =>
  api(`/restorations/${restorationId}/bringup/pre-power/sign-off`, { method: 'POST', schema: bringupSchema });

export function useSignOffPrePower(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => signOffPrePower(restorationId),
    onSuccess: (data) => afterWrite(client, restorationId, data),
  });
}
