import { type Me, meSchema } from '@shared/schemas/me';
import type { UnitSystem } from '@shared/units';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api';
import { meKeys } from '../../../lib/query-keys';

/** `PUT /api/me/preferences`. */
export const updatePreferences = (unitSystem: UnitSystem) =>
  apiRequest('/api/me/preferences', meSchema, { method: 'PUT', body: { unitSystem } });

/** Switches units at once (optimistic) and rolls back if the server refuses. */
export function useUpdatePreferences() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onMutate: async (unitSystem) => {
      await qc.cancelQueries({ queryKey: meKeys.current() });
      const previous = qc.getQueryData<Me | null>(meKeys.current());
      if (previous) {
        const optimistic: Me = { ...previous, unitSystem };
        qc.setQueryData<Me | null>(meKeys.current(), optimistic);
      }
      return { previous };
    },
    onError: (_e, _v, ctx) => {
      if (ctx?.previous) qc.setQueryData(meKeys.current(), ctx.previous);
    },
    onSuccess: (me) => qc.setQueryData(meKeys.current(), me),
  });
}
