import { verificationSchema } from '@shared/schemas/sheets';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest, isApiRequestError } from '../../../lib/api';
import { verificationKeys } from '../../../lib/query-keys';

/** `GET /api/verify/:code` (public) → what the sheet or field report states; 404 = no such code; 429 = too many checks. */
export const getVerification = (code: string, signal?: AbortSignal) =>
  apiRequest(`/api/verify/${encodeURIComponent(code)}`, verificationSchema, { signal });

export const verificationQueryOptions = (code: string) =>
  queryOptions({
    queryKey: verificationKeys.detail(code),
    queryFn: ({ signal }) => getVerification(code, signal),
    // No retry for "no such sheet", nor when this address has used up its checks for the minute (429).
    retry: (count, e) => !(isApiRequestError(e) && (e.status === 404 || e.status === 429)) && count < 2,
  });

export const useVerification = (code: string) => useQuery(verificationQueryOptions(code));
