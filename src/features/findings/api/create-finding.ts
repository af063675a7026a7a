import { useMutation, useQueryClient } from '@tanstack/react-query';
import { findingSchema, type Finding, type FindingInput } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const createFinding = (photoId: number, input: FindingInput) =>
  api(`/photos/${photoId}/findings`, { method: 'POST', json: input, schema: findingSchema });

export function useCreateFinding(photoId: number, restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: FindingInput) => createFinding(photoId, input),
    onSuccess: (created) => {
      client.setQueryData<Finding[]>(findingKeys.photo(photoId), (list) => [...(list ?? []), created]);
      void client.invalidateQueries({ queryKey: findingKeys.restoration(restorationId) });
      void client.invalidateQueries({ queryKey: findingKeys.photoCounts(restorationId), refetchType: 'none' });
    },
  });
}
