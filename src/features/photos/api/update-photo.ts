import { useMutation, useQueryClient } from '@tanstack/react-query';
import { photoSchema, type Photo, type PhotoPatch } from '../../../../shared/schemas/photos';
import { api } from '../../../lib/api-client';
import { photosQueryKey } from '../../../lib/queries/get-photos';

export const updatePhoto = (id: number, patch: PhotoPatch) =>
  api(`/photos/${id}`, { method: 'PATCH', json: patch, schema: photoSchema });

/** Applies the change to the gallery at once and puts it back if the server refuses. */
export function useUpdatePhoto(restorationId: number) {
  const client = useQueryClient();
  const queryKey = photosQueryKey(restorationId);
  const replace = (id: number, change: (p: Photo) => Photo) =>
    client.setQueryData<Photo[]>(queryKey, (list) => list?.map((p) => (p.id === id ? change(p) : p)));
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: PhotoPatch }) => updatePhoto(id, patch),
    onMutate: async ({ id, patch }) => {
      await client.cancelQueries({ queryKey });
      const previous = client.getQueryData<Photo[]>(queryKey);
      replace(id, (p) => ({ ...p, ...patch }));
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) client.setQueryData(queryKey, context.previous);
    },
    // The answer is the whole photo; keep the URLs already on screen, since fresh signatures would make the
    // browser download every image again. The list is only marked stale: the next focus or visit refetches it.
    onSuccess: (photo) => replace(photo.id, (p) => ({ ...photo, urls: p.urls })),
    onSettled: () => client.invalidateQueries({ queryKey, refetchType: 'none' }),
  });
}
