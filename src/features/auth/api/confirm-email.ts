import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const confirmEmail = (token: string) =>
  api('/auth/confirm-email', { method: 'POST', json: { token }, schema: userSchema });

export function useConfirmEmail() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: confirmEmail,
    onSuccess: (user) => {
      switchPerson(client, user);
    },
  });
}
