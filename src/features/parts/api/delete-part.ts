import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Part } from '../../../../shared/schemas/parts';
import { api } from '../../../lib/api-client';
import { partKeys } from './keys';

export const deletePart = (id: number) => api(`/parts/${id}`, { method: 'DELETE', noBody: true });

export function useDeletePart(restorationId: number) {
  const client = useQueryClient();
  const key = partKeys.restoration(restorationId);
  return useMutation({
    mutationFn: (id: number) => deletePart(id),
    onSuccess: (_nothing, id) => {
      client.setQueryData<Part[]>(key, (list) => list?.filter((p) => p.id !== id));
      return client.invalidateQueries({ queryKey: key });
    },
  });
}
