import { meSchema } from '@shared/schemas/me';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { meKeys } from '../../../lib/query-keys';

/** `POST /api/organisations`: a new firm with the caller as its administrator. */
export const createFirm = (name: string) =>
  apiRequest('/api/organisations', meSchema, { method: 'POST', body: { name } });

export function useCreateFirm() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createFirm, onSuccess: (me) => qc.setQueryData(meKeys.current(), me) });
}
