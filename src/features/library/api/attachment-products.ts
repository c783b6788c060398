import {
  type AttachmentProduct,
  type AttachmentProductInput,
  attachmentProductSchema,
} from '@shared/schemas/attachment-library';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiPath, apiRequest, apiRequestEmpty } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';
import { uploadMultipart } from '../../../lib/upload';

/*
 * The firm's panel load–span tables and clip capacities: list, add, upload the data sheet, remove. Every
 * change refreshes the firm's list.
 */

const base = (orgId: string) => apiPath`/api/organisations/${orgId}/attachment-products`;
const listSchema = z.object({ products: z.array(attachmentProductSchema) });

/** Where an entry's data sheet downloads from. */
export const dataSheetHref = (orgId: string, productId: string) =>
  `${base(orgId)}/${encodeURIComponent(productId)}/data-sheet`;

export const attachmentProductsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: libraryKeys.attachmentProducts(orgId),
    queryFn: ({ signal }) => apiRequest(base(orgId), listSchema, { signal }).then((r) => r.products),
  });

/** `GET …/attachment-products`; idle while no firm is known. */
export const useAttachmentProducts = (orgId: string | undefined) =>
  useQuery({ ...attachmentProductsQueryOptions(orgId ?? ''), enabled: Boolean(orgId) });

function useProductMutation<V extends { orgId: string }, R>(fn: (v: V) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (_r, { orgId }) => qc.invalidateQueries({ queryKey: libraryKeys.attachmentProducts(orgId) }),
  });
}

/** `POST …/attachment-products` → 201 the entry (a source is required). */
export const useAddAttachmentProduct = () =>
  useProductMutation(
    ({ orgId, input }: { orgId: string; input: AttachmentProductInput }): Promise<AttachmentProduct> =>
      apiRequest(base(orgId), attachmentProductSchema, { method: 'POST', body: input }),
  );

/** `POST …/:id/data-sheet` (multipart, one PDF, PNG or JPEG) → the entry with its data sheet. */
export const useUploadDataSheet = () =>
  useProductMutation(({ orgId, productId, file }: { orgId: string; productId: string; file: File }) =>
    uploadMultipart(dataSheetHref(orgId, productId), [file], attachmentProductSchema),
  );

/** `DELETE …/:id` (firm administrators) → 204. */
export const useDeleteAttachmentProduct = () =>
  useProductMutation(({ orgId, productId }: { orgId: string; productId: string }) =>
    apiRequestEmpty(`${base(orgId)}/${encodeURIComponent(productId)}`, { method: 'DELETE' }),
  );
