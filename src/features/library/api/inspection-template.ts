import {
  type InspectionTemplate,
  inspectionTemplateAnswerSchema,
  inspectionTemplateSchema,
  type TemplateItem,
} from '@shared/inspections/schema';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPath, apiRequest, currentOnConflict } from '../../../lib/api';
import { libraryKeys } from '../../../lib/query-keys';

const path = (orgId: string) => apiPath`/api/organisations/${orgId}/inspection-template`;

/** `GET …/inspection-template` → the firm's checklist template (its latest version), null before the first save. */
export const useInspectionTemplate = (orgId: string | undefined) =>
  useQuery({
    queryKey: libraryKeys.inspectionTemplate(orgId ?? ''),
    queryFn: ({ signal }) =>
      apiRequest(path(orgId!), inspectionTemplateAnswerSchema, { signal }).then((r) => r.template),
    enabled: Boolean(orgId),
  });

/** On a 409 the template as it now stands (someone saved first); null for any other error. */
export const conflictingTemplate = (error: unknown): InspectionTemplate | null =>
  currentOnConflict(error, inspectionTemplateSchema);

/** `PUT …/inspection-template` naming the revision read; a frozen version answers with the next version. */
export function useSaveInspectionTemplate(orgId: string) {
  const qc = useQueryClient();
  const key = libraryKeys.inspectionTemplate(orgId);
  return useMutation({
    mutationFn: ({ revision, items }: { revision: number | undefined; items: TemplateItem[] }) =>
      apiRequest(path(orgId), inspectionTemplateSchema, { method: 'PUT', body: { revision, items } }),
    onSuccess: (saved) => qc.setQueryData(key, saved),
  });
}
