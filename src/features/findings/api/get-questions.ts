import { z } from 'zod';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { openQuestionSchema } from '../../../../shared/schemas/findings';
import { apiGet } from '../../../lib/api-client';
import { findingKeys } from '../../../lib/queries/finding-keys';

export const getQuestions = () => apiGet('/questions', z.array(openQuestionSchema));

export const questionsQueryOptions = () => queryOptions({ queryKey: findingKeys.questions, queryFn: getQuestions });

export const useQuestions = () => useQuery(questionsQueryOptions());
