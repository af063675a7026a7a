import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { restorationSchema, type restorationPatchSchema } from '../../../../shared/schemas/restorations';
import { api } from '../../../lib/api-client';

type Patch = z.input<typeof restorationPatchSchema>;

export const updateRestoration = (id: number, patch: Patch) =>
  api(`/restorations/${id}`, { method: 'PATCH', json: patch, schema: restorationSchema });

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
