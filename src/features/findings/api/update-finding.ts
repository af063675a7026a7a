import { useMutation, useQueryClient } from '@tanstack/react-query';
import { findingSchema, type Finding, type FindingPatch } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const updateFinding = (id: number, patch: FindingPatch) =>
  api(`/findings/${id}`, { method: 'PATCH', json: patch, schema: findingSchema });

/**
 * Moving a pin or changing a status shows at once (optimistic), and rolls back if the server refuses;
 * the caller shows `error.message`.
 */
export function useUpdateFinding(photoId: number, restorationId: number) {
  const client = useQueryClient();
  const key = findingKeys.photo(photoId);
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: FindingPatch }) => updateFinding(id, patch),
    onMutate: async ({ id, patch }) => {
      await client.cancelQueries({ queryKey: key });
      const previous = client.getQueryData<Finding[]>(key);
      client.setQueryData<Finding[]>(key, (list) =>
        list?.map((f) => (f.id === id ? ({ ...f, ...patch } as Finding) : f)),
      );
      return { previous };
    },
    onError: (_err, _vars, context) => {
      if (context?.previous) client.setQueryData(key, context.previous);
    },
    onSuccess: (updated) => {
      client.setQueryData<Finding[]>(key, (list) => list?.map((f) => (f.id === updated.id ? updated : f)));
    },
    onSettled: (_d, _e, { id }) => {
      void client.invalidateQueries({ queryKey: findingKeys.history(id) });
      void client.invalidateQueries({ queryKey: findingKeys.restoration(restorationId) });
      void client.invalidateQueries({ queryKey: findingKeys.questions });
      void client.invalidateQueries({ queryKey: findingKeys.photoCounts(restorationId), refetchType: 'none' });
    },
  });
}
