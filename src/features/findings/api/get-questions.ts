import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OpenQuestion } from '../../../../shared/schemas/findings';
import { api } from '../../../lib/api-client';
import { findingKeys } from './keys';

export const getQuestions = () => api<OpenQuestion[]>('/questions');

export const questionsQueryOptions = () => queryOptions({ queryKey: findingKeys.questions, queryFn: getQuestions });

export const useQuestions = () => useQuery(questionsQueryOptions());
