import { photoUploadResultSchema } from '@shared/inspections/schema';
import { type QueryClient, useMutation } from '@tanstack/react-query';
import { forgetPhoto, keptPhoto } from '../../../lib/offline/device-photos';
import { retryWhenUnreachable } from '../../../lib/offline/queue';
import { inspectionKeys } from '../../../lib/query-keys';
import { uploadMultipart } from '../../../lib/upload';
import { inspectionScope, putItem, refreshWhenQueueEmpty } from './answer-item';
import { inspectionPaths } from './paths';

/*
 * A photo is kept on the device first (lib/offline/device-photos, already shrunk) and sent by a queued mutation
 * that names it by key, so it waits with the answers when there is no signal and survives a reload.
 */

export interface PhotoVariables {
  inspectionId: string;
  itemId: string;
  label: string;
  photoKey: string;
}

/** `POST /api/inspection-items/:inspectionItemId/photos` (multipart, field `files`); forgotten once stored. */
export async function sendPhoto({ itemId, photoKey }: PhotoVariables) {
  const file = await keptPhoto(photoKey);
  // Gone from the device: a send that went through before a reload cut its reply. Nothing left to do.
  if (!file) return null;
  const result = await uploadMultipart(inspectionPaths.photos(itemId), [file], photoUploadResultSchema);
  await forgetPhoto(photoKey);
  return result;
}

export function registerPhotoDefaults(qc: QueryClient) {
  qc.setMutationDefaults<Awaited<ReturnType<typeof sendPhoto>>, Error, PhotoVariables>(
    inspectionKeys.photos(),
    {
      mutationFn: (v) => sendPhoto(v),
      retry: retryWhenUnreachable,
      onSuccess: (result, v) => {
        if (result) putItem(qc, v.inspectionId, result.item);
      },
      onSettled: (_d, _e, v) => refreshWhenQueueEmpty(qc, v.inspectionId),
    },
  );
}

export const useUploadPhoto = (inspectionId: string) =>
  useMutation<Awaited<ReturnType<typeof sendPhoto>>, Error, PhotoVariables>({
    mutationKey: inspectionKeys.photos(),
    scope: inspectionScope(inspectionId),
  });
