import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { Restoration, restorationPatchSchema } from '../../../../shared/schemas/restorations';
import { api } from '../../../lib/api-client';

type Patch = z.input<typeof restorationPatchSchema>;

export const updateRestoration = (id: number, patch: Patch) =>
  api<Restoration>(`/restorations/${id}`, { method: 'PATCH', json: patch });

export function useUpdateRestoration(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: Patch) => updateRestoration(id, patch),
    onSuccess: (updated) => {
      client.setQueryData(['restorations', id], updated);
      void client.invalidateQueries({ queryKey: ['restorations'], exact: false, refetchType: 'inactive' });
    },
  });
}
