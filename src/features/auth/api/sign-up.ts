import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignUpInput, SignUpResult } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { ME_KEY } from './get-me';

export const signUp = (input: SignUpInput) => api<SignUpResult>('/auth/sign-up', { method: 'POST', json: input });

export function useSignUp() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (result) => {
      if (result.status !== 'signed-in') return;
      client.clear();
      client.setQueryData(ME_KEY, result.user);
    },
  });
}
