import { apiErrorSchema } from '@shared/schemas/common';
import type { z } from 'zod';
import { ApiRequestError } from './api';

export interface UploadProgress {
  loaded: number;
  total: number;
}

/**
 * POSTs files as multipart/form-data (field `files`) through XMLHttpRequest, whose upload events report
 * progress (fetch cannot), and parses the answer with `schema`; a refusal becomes an ApiRequestError with
 * the server's code, message and fields.
 */
export function uploadMultipart<S extends z.ZodType>(
  url: string,
  files: File[],
  schema: S,
  onProgress: (p: UploadProgress) => void = () => undefined,
): Promise<z.infer<S>> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    for (const f of files) form.append('files', f, f.name);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
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
        const parsed = schema.safeParse(body);
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
