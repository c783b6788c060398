import { apiErrorSchema } from '@shared/schemas/common';
import { uploadResultSchema } from '@shared/schemas/submittals';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiRequestError } from '../../../lib/api';
import { auditKeys, submittalKeys } from '../../../lib/query-keys';

export interface UploadProgress {
  loaded: number;
  total: number;
}

/**
 * `POST /api/submittals/:id/files` as multipart/form-data through XMLHttpRequest, whose upload events
 * report progress (fetch cannot). Resolves with the stored items and the submittal.
 */
export function uploadFiles(submittalId: string, files: File[], onProgress: (p: UploadProgress) => void) {
  return new Promise<ReturnType<typeof uploadResultSchema.parse>>((resolve, reject) => {
    const form = new FormData();
    for (const f of files) form.append('files', f, f.name);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/submittals/${encodeURIComponent(submittalId)}/files`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress({ loaded: e.loaded, total: e.total });
    };
    xhr.onerror = () =>
      reject(new ApiRequestError(0, 'network_error', 'The upload was interrupted. Check your connection.'));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        const parsed = uploadResultSchema.safeParse(body);
        if (parsed.success) resolve(parsed.data);
        else
          reject(
            new ApiRequestError(
              xhr.status,
              'unexpected_response',
              'The server answered in an unexpected shape.',
            ),
          );
        return;
      }
      const err = apiErrorSchema.safeParse(body);
      reject(
        err.success
          ? new ApiRequestError(
              xhr.status,
              err.data.error.code,
              err.data.error.message,
              err.data.error.fields,
              body,
            )
          : new ApiRequestError(xhr.status, `http_${xhr.status}`, `The upload failed (${xhr.status}).`),
      );
    };
    xhr.send(form);
  });
}

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
