import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { User } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const requestPasswordReset = (email: string) =>
  api<{ message: string }>('/auth/password-reset', { method: 'POST', json: { email } });

export const confirmPasswordReset = (input: { token: string; password: string }) =>
  api<User>('/auth/password-reset/confirm', { method: 'POST', json: input });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });

export function useConfirmPasswordReset() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: confirmPasswordReset,
    onSuccess: (user) => {
      switchPerson(client, user);
    },
  });
}
