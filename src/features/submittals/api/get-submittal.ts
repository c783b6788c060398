import { submittalSchema } from '@shared/schemas/submittals';
import { useQuery } from '@tanstack/react-query';
import { apiPath } from '../../../lib/api';
import { getQuery } from '../../../lib/api-cache';
import { submittalKeys } from '../../../lib/query-keys';

/** `GET /api/submittals/:submittalId` → one revision with items, reviewers, comments and its chain. */
export const submittalQueryOptions = (submittalId: string) =>
  getQuery(submittalKeys.detail(submittalId), apiPath`/api/submittals/${submittalId}`, submittalSchema);

export const useSubmittal = (submittalId: string) => useQuery(submittalQueryOptions(submittalId));
