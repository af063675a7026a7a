import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HelpLinkCreated } from '../../../../shared/schemas/help';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';

/** A read-only link for someone without an account; its token is shown once, here. */
export const createHelpLink = (helpRequestId: number, days?: number) =>
  api<HelpLinkCreated>(`/help-requests/${helpRequestId}/links`, { method: 'POST', json: days ? { days } : {} });

export function useCreateHelpLink(helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (days?: number) => createHelpLink(helpRequestId, days),
    onSuccess: () => client.invalidateQueries({ queryKey: helpKeys.one(helpRequestId) }),
  });
}
