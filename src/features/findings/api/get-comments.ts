import { queryOptions, useQuery } from '@tanstack/react-query';
import { commentSchema } from '../../../../shared/schemas/comments';
import { apiAllPages } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const getComments = (findingId: number) => apiAllPages(`/findings/${findingId}/comments`, commentSchema);

export const commentsQueryOptions = (findingId: number) =>
  queryOptions({
    queryKey: findingKeys.comments(findingId),
    queryFn: () => getComments(findingId),
    refetchInterval: 20_000,
  });

export const useComments = (findingId: number) => useQuery(commentsQueryOptions(findingId));
