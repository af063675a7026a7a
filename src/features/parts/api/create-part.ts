import { useMutation, useQueryClient } from '@tanstack/react-query';
import { partSchema, type Part, type PartInput } from '../../../../shared/schemas/parts';
import { api } from '../../../lib/api-client';
import { partKeys } from './keys';

/** Adds a line to the ledger; the answer carries the server's warnings for it. */
export const createPart = (restorationId: number, input: PartInput) =>
  api(`/restorations/${restorationId}/parts`, { method: 'POST', json: input, schema: partSchema });

export function useCreatePart(restorationId: number) {
  const client = useQueryClient();
  const key = partKeys.restoration(restorationId);
  return useMutation({
    mutationFn: (input: PartInput) => createPart(restorationId, input),
    onSuccess: (made) => {
      client.setQueryData<Part[]>(key, (list) => (list ? [...list, made] : list));
      return client.invalidateQueries({ queryKey: key });
    },
  });
}
