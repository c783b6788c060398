import {
  type Deficiency,
  type DeficiencyTransition,
  deficiencySchema,
  type deficiencyUpdateSchema,
  type Inspection,
  type InspectionCreate,
  inspectionCloseResultSchema,
  inspectionSchema,
  photoUploadResultSchema,
} from '@shared/inspections/schema';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiRequest, currentOnConflict } from '../../../lib/api';
import { auditKeys, inspectionKeys } from '../../../lib/query-keys';
import { uploadMultipart } from '../../../lib/upload';
import { inspectionPaths } from './paths';

/* The inspection's changes made online only: creating, a deficiency's steps, closing (answers: answer-item.ts). */

export function useCreateInspection(projectId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: InspectionCreate) =>
      apiRequest(inspectionPaths.list(projectId), inspectionSchema, { method: 'POST', body: input }),
    onSuccess: (inspection) => {
      qc.setQueryData(inspectionKeys.detail(inspection.id), inspection);
      void qc.invalidateQueries({ queryKey: inspectionKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.list(projectId) });
    },
  });
}

/** After a deficiency changed: it in the cached inspection, the inspection and the lists refreshed. */
function usePutDeficiency(inspectionId: string) {
  const qc = useQueryClient();
  return (d: Deficiency) => {
    qc.setQueryData<Inspection>(inspectionKeys.detail(inspectionId), (old) =>
      old ? { ...old, deficiencies: old.deficiencies.map((x) => (x.id === d.id ? d : x)) } : old,
    );
    void qc.invalidateQueries({ queryKey: inspectionKeys.all });
    void qc.invalidateQueries({ queryKey: auditKeys.all });
  };
}

export interface DeficiencyStep {
  step: DeficiencyTransition;
  version: number;
  note: string;
  /** The correction's photo (shrunk), sent to the item first: `correct` needs one. */
  photo?: File;
  itemId: string;
}

export function useDeficiencyStep(inspectionId: string, deficiencyId: string) {
  const put = usePutDeficiency(inspectionId);
  return useMutation({
    mutationFn: async ({ step, version, note, photo, itemId }: DeficiencyStep) => {
      const photoId = photo
        ? (await uploadMultipart(inspectionPaths.photos(itemId), [photo], photoUploadResultSchema)).photos[0]
            ?.id
        : undefined;
      return apiRequest(inspectionPaths.deficiency(deficiencyId, step), deficiencySchema, {
        method: 'POST',
        body: { version, note, ...(photoId ? { photoId } : {}) },
      });
    },
    onSuccess: put,
  });
}

/** On 409 `version_conflict` the server sends the deficiency as it is now; null for any other error. */
export const conflictingDeficiency = (error: unknown): Deficiency | null =>
  currentOnConflict(error, deficiencySchema);

/** Owner, due date, description (an inspector); a stale save puts theirs in the cache and fails. */
export function useUpdateDeficiency(inspectionId: string, deficiencyId: string) {
  const put = usePutDeficiency(inspectionId);
  return useMutation({
    mutationFn: (body: z.input<typeof deficiencyUpdateSchema>) =>
      apiRequest(inspectionPaths.deficiencyDetails(deficiencyId), deficiencySchema, { method: 'PUT', body }),
    onSuccess: put,
    onError: (e) => {
      const current = conflictingDeficiency(e);
      if (current) put(current);
    },
  });
}

export function useCloseInspection(inspectionId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (version: number) =>
      apiRequest(inspectionPaths.close(inspectionId), inspectionCloseResultSchema, {
        method: 'POST',
        body: { version },
      }),
    onSuccess: (r) => {
      qc.setQueryData(inspectionKeys.detail(inspectionId), r.inspection);
      void qc.invalidateQueries({ queryKey: inspectionKeys.lists() });
      void qc.invalidateQueries({ queryKey: auditKeys.all });
    },
  });
}
