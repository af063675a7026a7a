import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { capturedMailSchema } from '../../../../shared/schemas/dev-mail';
import { apiGet } from '../../../lib/api-client';

export const getDevMail = () => apiGet('/dev/mail', z.array(capturedMailSchema));

export const devMailQueryOptions = () =>
  queryOptions({ queryKey: ['dev', 'mail'], queryFn: getDevMail, refetchInterval: 5000 });

export const useDevMail = () => useQuery(devMailQueryOptions());
