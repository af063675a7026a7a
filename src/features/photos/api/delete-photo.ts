import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Photo } from '../../../../shared/schemas/photos';
import { api } from '../../../lib/api-client';
import { photosQueryKey } from '../../../lib/queries/get-photos';

export const deletePhoto = (id: number) => api(`/photos/${id}`, { method: 'DELETE', noBody: true });

export function useDeletePhoto(restorationId: number) {
  const client = useQueryClient();
  const queryKey = photosQueryKey(restorationId);
  return useMutation({
    mutationFn: deletePhoto,
    // Dropping it from the list is exact; marking the list stale (not refetching now) spares the browser
    // downloading every thumbnail again under freshly signed URLs.
    onSuccess: (_nothing, id) => {
      client.setQueryData<Photo[]>(queryKey, (list) => list?.filter((p) => p.id !== id));
      return client.invalidateQueries({ queryKey, refetchType: 'none' });
    },
  });
}
