import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** Withdraws a link: from now on it answers "not found". */
export const revokeHelpLink = (token: string) =>
  api(`/help-links/${encodeURIComponent(token)}`, { method: 'DELETE', noBody: true });

export function useRevokeHelpLink(helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: revokeHelpLink,
    onSuccess: () => client.invalidateQueries({ queryKey: helpKeys.one(helpRequestId) }),
  });
}
