import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import {
  passwordResetRequestedSchema,
  userSchema,
  type passwordResetConfirmSchema,
} from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { switchPerson } from './session-cache';

export const requestPasswordReset = (email: string) =>
  api('/auth/password-reset', { method: 'POST', json: { email }, schema: passwordResetRequestedSchema });

export const confirmPasswordReset = (input: z.input<typeof passwordResetConfirmSchema>) =>
  api('/auth/password-reset/confirm', { method: 'POST', json: input, schema: userSchema });

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
