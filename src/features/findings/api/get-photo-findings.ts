import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Finding } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getPhotoFindings = (photoId: number) => api<Finding[]>(`/photos/${photoId}/findings`);

export const photoFindingsQueryOptions = (photoId: number) =>
  queryOptions({ queryKey: findingKeys.photo(photoId), queryFn: () => getPhotoFindings(photoId) });

export const usePhotoFindings = (photoId: number) => useQuery(photoFindingsQueryOptions(photoId));
