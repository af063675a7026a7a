import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signUpResultSchema, type SignUpInput } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const signUp = (input: SignUpInput) =>
  api('/auth/sign-up', { method: 'POST', json: input, schema: signUpResultSchema });

export function useSignUp() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (result) => {
      if (result.status === 'signed-in') switchPerson(client, result.user);
    },
  });
}
