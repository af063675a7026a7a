import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { ME_KEY } from './get-me';

export const signOut = () => api<void>('/auth/sign-out', { method: 'POST' });

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      client.clear();
      client.setQueryData(ME_KEY, null);
    },
  });
}
