import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const signOut = () => api('/auth/sign-out', { method: 'POST', noBody: true });

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      switchPerson(client, null);
    },
  });
}
