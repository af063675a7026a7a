import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Finding } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const deleteFinding = (id: number) => api(`/findings/${id}`, { method: 'DELETE', noBody: true });

export function useDeleteFinding(photoId: number, restorationId: number) {
  const client = useQueryClient();
  const key = findingKeys.photo(photoId);
  return useMutation({
    mutationFn: deleteFinding,
    onMutate: async (id: number) => {
      await client.cancelQueries({ queryKey: key });
      const previous = client.getQueryData<Finding[]>(key);
      client.setQueryData<Finding[]>(key, (list) => list?.filter((f) => f.id !== id));
      return { previous };
    },
    onError: (_e, _id, context) => context?.previous && client.setQueryData(key, context.previous),
    onSettled: () => {
      void client.invalidateQueries({ queryKey: findingKeys.photoCounts(restorationId), refetchType: 'none' });
      return client.invalidateQueries({ queryKey: findingKeys.restoration(restorationId) });
    },
  });
}
