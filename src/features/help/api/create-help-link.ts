import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { helpKeys } from './keys';
import { helpLinkCreatedSchema } from '../../../../shared/schemas/help';

/** A read-only link for someone without an account; its token is shown once, here. */
export const createHelpLink = (helpRequestId: number, days?: number) =>
  api(`/help-requests/${helpRequestId}/links`, {
    method: 'POST',
    json: days ? { days } : {},
    schema: helpLinkCreatedSchema,
  });

export function useCreateHelpLink(helpRequestId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (days?: number) => createHelpLink(helpRequestId, days),
    onSuccess: () => client.invalidateQueries({ queryKey: helpKeys.one(helpRequestId) }),
  });
}
