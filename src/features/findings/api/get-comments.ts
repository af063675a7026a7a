import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Comment } from '../../../../shared/schemas/comments';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getComments = (findingId: number) => api<Comment[]>(`/findings/${findingId}/comments`);

export const commentsQueryOptions = (findingId: number) =>
  queryOptions({ queryKey: findingKeys.comments(findingId), queryFn: () => getComments(findingId), refetchInterval: 20_000 });

export const useComments = (findingId: number) => useQuery(commentsQueryOptions(findingId));
