import type { QueryClient } from '@tanstack/react-query';
import { startDeviceCache } from '../lib/offline/device-cache';
import { inspectionKeys, meKeys, projectKeys } from '../lib/query-keys';

/** What a field inspection needs with no signal: who is signed in, the project frame, the inspections. */
const KEPT_ON_DEVICE = [meKeys.all, projectKeys.details(), inspectionKeys.all] as const;

/** Longest wait for the device's store before the app starts without it (a stuck IndexedDB must not hang it). */
const RESTORE_WAIT_MS = 3000;

/**
 * Before the first route loads: the functions of the queued mutations (a restored one resumes by its key), then
 * the cache kept on the device (D-026). The mutation functions come as a chunk of their own (with the schemas,
 * which the loaders' chunk asks for at the same moment anyway), so the initial script stays small.
 */
export async function startOffline(queryClient: QueryClient): Promise<void> {
  const [answers, photos] = await Promise.all([
    import('../features/inspections/api/answer-item'),
    import('../features/inspections/api/upload-photo'),
  ]);
  answers.registerAnswerDefaults(queryClient);
  photos.registerPhotoDefaults(queryClient);
  if (typeof indexedDB === 'undefined') return;
  await Promise.race([
    startDeviceCache(queryClient, KEPT_ON_DEVICE),
    new Promise((resolve) => setTimeout(resolve, RESTORE_WAIT_MS)),
  ]);
}
