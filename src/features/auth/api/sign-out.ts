import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { authClient } from '../../../lib/auth-client';
import { endSessionCache } from '../../../lib/session-cache';

/**
 * Signs out, goes to `to` (sign-in by default) and forgets every cached answer — they belong to the
 * previous person.
 */
export function useSignOut() {
  const qc = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: async (_options?: { to?: string }) => {
      const { error } = await authClient.signOut();
      if (error) throw new Error(error.message || 'Sign-out failed.');
    },
    onSuccess: async (_data, options) => {
      await navigate(options?.to ?? '/sign-in', { replace: true });
      endSessionCache(qc);
    },
  });
}
