import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type SignInInput } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const signIn = (input: SignInInput) => api('/auth/sign-in', { method: 'POST', json: input, schema: userSchema });

export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      // Another person may have used this browser: nothing cached may outlive the sign-in.
      switchPerson(client, user);
    },
  });
}
