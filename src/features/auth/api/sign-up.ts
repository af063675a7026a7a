import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignUpInput, SignUpResult } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const signUp = (input: SignUpInput) => api<SignUpResult>('/auth/sign-up', { method: 'POST', json: input });

export function useSignUp() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (result) => {
      if (result.status === 'signed-in') switchPerson(client, result.user);
    },
  });
}
