import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Restoration, RestorationInput } from '../../../../shared/schemas/restorations';
import { api } from '../../../lib/api-client';

export const createRestoration = (input: RestorationInput) =>
  api<Restoration>('/restorations', { method: 'POST', json: input });

export function useCreateRestoration() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: createRestoration,
    onSuccess: () => client.invalidateQueries({ queryKey: ['restorations'] }),
  });
}
