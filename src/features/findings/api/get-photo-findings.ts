import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { findingSchema } from '../../../../shared/schemas/findings';
import { apiGet } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const getPhotoFindings = (photoId: number) => apiGet(`/photos/${photoId}/findings`, z.array(findingSchema));

export const photoFindingsQueryOptions = (photoId: number) =>
  queryOptions({ queryKey: findingKeys.photo(photoId), queryFn: () => getPhotoFindings(photoId) });

export const usePhotoFindings = (photoId: number) => useQuery(photoFindingsQueryOptions(photoId));
