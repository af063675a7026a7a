import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { partSchema, type Part, type partPatchSchema } from '../../../../shared/schemas/parts';
import { api } from '../../../lib/api-client';
import { partKeys } from './keys';

export type PartPatch = z.input<typeof partPatchSchema>;

export const updatePart = (id: number, patch: PartPatch) =>
  api(`/parts/${id}`, { method: 'PATCH', json: patch, schema: partSchema });

/**
 * Changes a part. The change shows at once (planned → ordered → fitted should not wait for the network) and only
 * that part is put back if the server refuses, so other rows changed meanwhile keep their state; the caller shows
 * `error.message`. The server's answer replaces the guess, warnings and fitted date included.
 */
export function useUpdatePart(restorationId: number) {
  const client = useQueryClient();
  const key = partKeys.restoration(restorationId);
  const putBack = (part: Part) =>
    client.setQueryData<Part[]>(key, (list) => list?.map((p) => (p.id === part.id ? part : p)));
  return useMutation({
    mutationKey: partKeys.update,
    mutationFn: ({ id, patch }: { id: number; patch: PartPatch }) => updatePart(id, patch),
    onMutate: async ({ id, patch }) => {
      await client.cancelQueries({ queryKey: key });
      const before = client.getQueryData<Part[]>(key)?.find((p) => p.id === id);
      if (before) {
        const fittedAt =
          patch.state === 'fitted' && before.state !== 'fitted' ? new Date().toISOString() : before.fittedAt;
        putBack({ ...before, ...patch, fittedAt } as Part);
      }
      return { before };
    },
    onError: (_error, _vars, context) => {
      if (context?.before) putBack(context.before);
    },
    onSuccess: (saved) => putBack(saved),
    // Refetch only when the last change has settled, so one answer does not overwrite another row's pending guess.
    onSettled: () =>
      client.isMutating({ mutationKey: partKeys.update }) === 1
        ? client.invalidateQueries({ queryKey: key })
        : undefined,
  });
}
