import { queryOptions, useQuery } from '@tanstack/react-query';
import { reportPreviewSchema } from '../../../../shared/schemas/safety';
import { apiGet } from '../../../lib/api-client';

export const reportPreviewKey = (restorationId: number) =>
  ['restorations', restorationId, 'report', 'preview'] as const;

/** What the owner will receive (recipients, e-mail, attachment), the warnings when it is premature, and earlier sends. */
export const getReportPreview = (restorationId: number) =>
  apiGet(`/restorations/${restorationId}/report/preview`, reportPreviewSchema);

export const reportPreviewQueryOptions = (restorationId: number) =>
  queryOptions({
    queryKey: reportPreviewKey(restorationId),
    queryFn: () => getReportPreview(restorationId),
    staleTime: 0,
  });

export const useReportPreview = (restorationId: number, enabled: boolean) =>
  useQuery({ ...reportPreviewQueryOptions(restorationId), enabled });
