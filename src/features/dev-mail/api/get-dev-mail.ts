import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CapturedMail } from '../../../../shared/schemas/dev-mail';
import { api } from '../../../lib/api-client';

export const getDevMail = () => api<CapturedMail[]>('/dev/mail');

export const devMailQueryOptions = () => queryOptions({ queryKey: ['dev', 'mail'], queryFn: getDevMail, refetchInterval: 5000 });

export const useDevMail = () => useQuery(devMailQueryOptions());
