import { uploadResultSchema } from '@shared/schemas/submittals';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { apiPath } from '../../../lib/api';
import { auditKeys, submittalKeys } from '../../../lib/query-keys';
import { type UploadProgress, uploadMultipart } from '../../../lib/upload';

export type { UploadProgress };

/** `POST /api/submittals/:id/files` (multipart, with progress) → the stored items and the submittal. */
export const uploadFiles = (submittalId: string, files: File[], onProgress: (p: UploadProgress) => void) =>
  uploadMultipart(apiPath`/api/submittals/${submittalId}/files`, files, uploadResultSchema, onProgress);

/** The upload as a mutation, with its progress (null when idle). */
export function useUploadFiles(submittalId: string) {
  const qc = useQueryClient();
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const mutation = useMutation({
    mutationFn: (files: File[]) => {
      setProgress({ loaded: 0, total: files.reduce((s, f) => s + f.size, 0) });
      return uploadFiles(submittalId, files, setProgress);
    },
    onSuccess: ({ submittal }) => {
      qc.setQueryData(submittalKeys.detail(submittal.id), submittal);
      void qc.invalidateQueries({ queryKey: submittalKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(submittal.projectId) });
    },
    onSettled: () => setProgress(null),
  });
  return { ...mutation, progress };
}
