import type { QueryClient } from '@tanstack/react-query';
import { registerAnswerDefaults } from '../features/inspections/api/answer-item';
import { registerPhotoDefaults } from '../features/inspections/api/upload-photo';
import { startDeviceCache } from '../lib/offline/device-cache';
import { inspectionKeys, meKeys, projectKeys } from '../lib/query-keys';

/** What a field inspection needs with no signal: who is signed in, the project frame, the inspections. */
const KEPT_ON_DEVICE = [meKeys.all, projectKeys.details(), inspectionKeys.all] as const;

/** Longest wait for the device's store before the app starts without it (a stuck IndexedDB must not hang it). */
const RESTORE_WAIT_MS = 3000;

/**
 * Before the first route loads: the functions of the queued mutations (a restored one resumes by its key), then
 * the cache kept on the device (D-026).
 */
export async function startOffline(queryClient: QueryClient): Promise<void> {
  registerAnswerDefaults(queryClient);
  registerPhotoDefaults(queryClient);
  if (typeof indexedDB === 'undefined') return;
  await Promise.race([
    startDeviceCache(queryClient, KEPT_ON_DEVICE),
    new Promise((resolve) => setTimeout(resolve, RESTORE_WAIT_MS)),
  ]);
}
