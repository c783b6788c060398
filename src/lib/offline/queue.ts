import { type Mutation, type MutationKey, useMutationState } from '@tanstack/react-query';
import { isApiRequestError } from '../api';

/*
 * The queue of work that waits for the connection: mutations under a key, paused while the device is offline
 * (TanStack Query's network mode), kept on the device (device-cache.ts) and sent in order per scope.
 */

/** Mutations that failed only because the server could not be reached are tried again, with the usual back-off. */
export const retryWhenUnreachable = (_count: number, error: unknown) =>
  isApiRequestError(error) && error.status === 0;

/** How many mutations under `mutationKey` are waiting to be sent (queued or on their way). */
export function useWaitingCount(mutationKey: MutationKey): number {
  return useMutationState({ filters: { mutationKey, status: 'pending' }, select: () => 1 }).length;
}

/** The mutations under `mutationKey` the server refused (a conflict among them), latest last. */
export function useRefusedMutations(mutationKey: MutationKey): Mutation<unknown, Error, unknown, unknown>[] {
  return useMutationState({
    filters: { mutationKey, status: 'error' },
    select: (m) => m as Mutation<unknown, Error, unknown, unknown>,
  });
}

/** Words for the queue's count: "2 waiting to send". */
export const waitingWords = (count: number) => `${count} waiting to send`;
