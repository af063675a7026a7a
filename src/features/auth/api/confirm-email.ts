import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { User } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const confirmEmail = (token: string) => api<User>('/auth/confirm-email', { method: 'POST', json: { token } });

export function useConfirmEmail() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: confirmEmail,
    onSuccess: (user) => {
      switchPerson(client, user);
    },
  });
}
