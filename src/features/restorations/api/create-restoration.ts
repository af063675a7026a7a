import { useMutation, useQueryClient } from '@tanstack/react-query';
import { restorationSchema, type RestorationInput } from '../../../../shared/schemas/restorations';
import { api } from '../../../lib/api-client';

export const createRestoration = (input: RestorationInput) =>
  api('/restorations', { method: 'POST', json: input, schema: restorationSchema });

export function useCreateRestoration() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: createRestoration,
    onSuccess: () => client.invalidateQueries({ queryKey: ['restorations'] }),
  });
}
