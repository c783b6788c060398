import {
  type Submittal,
  type SubmittalCreate,
  type SubmittalDecisionInput,
  type SubmittalFields,
  submittalSchema,
} from '@shared/schemas/submittals';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPath, apiRequest, currentOnConflict } from '../../../lib/api';
import { auditKeys, submittalKeys } from '../../../lib/query-keys';

const base = (id: string) => apiPath`/api/submittals/${id}`;

/** After any change: the revision as the server now has it, the lists and the activity log refreshed. */
function useSettle() {
  const qc = useQueryClient();
  return (s: Submittal) => {
    qc.setQueryData(submittalKeys.detail(s.id), s);
    void qc.invalidateQueries({ queryKey: submittalKeys.lists() });
    // A decision may open the next revision; other revisions show the new chain.
    void qc.invalidateQueries({
      queryKey: submittalKeys.details(),
      predicate: (q) => q.queryKey[2] !== s.id,
    });
    void qc.invalidateQueries({ queryKey: auditKeys.list(s.projectId) });
  };
}

/** On 409 `version_conflict` the server sends the submittal as it is now; null for any other error. */
export const conflictingSubmittal = (error: unknown): Submittal | null =>
  currentOnConflict(error, submittalSchema);

export function useCreateSubmittal(projectId: string) {
  const settle = useSettle();
  return useMutation({
    mutationFn: (input: SubmittalCreate) =>
      apiRequest(apiPath`/api/projects/${projectId}/submittals`, submittalSchema, {
        method: 'POST',
        body: input,
      }),
    onSuccess: settle,
  });
}

export function useUpdateSubmittal(id: string) {
  const settle = useSettle();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ version, changes }: { version: number; changes: SubmittalFields }) =>
      apiRequest(base(id), submittalSchema, { method: 'PUT', body: { version, changes } }),
    onSuccess: settle,
    onError: (e) => {
      const current = conflictingSubmittal(e);
      if (current) qc.setQueryData(submittalKeys.detail(current.id), current);
    },
  });
}

export type SubmittalStep =
  | { kind: 'submit'; version: number }
  | { kind: 'review'; version: number }
  | ({ kind: 'decision' } & SubmittalDecisionInput)
  | { kind: 'comment'; body: string; itemId: string | null }
  | { kind: 'sheet'; checkRunId: string }
  | { kind: 'report'; inspectionId: string }
  | { kind: 'remove'; itemId: string };

/** Every workflow step of one revision. */
export function useSubmittalStep(id: string) {
  const settle = useSettle();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, ...body }: SubmittalStep) => {
      switch (kind) {
        case 'submit':
        case 'review':
          return apiRequest(`${base(id)}/${kind}`, submittalSchema, { method: 'POST', body });
        case 'decision':
          return apiRequest(`${base(id)}/decision`, submittalSchema, { method: 'POST', body });
        case 'comment':
          return apiRequest(`${base(id)}/comments`, submittalSchema, { method: 'POST', body });
        case 'sheet':
          return apiRequest(`${base(id)}/sheets`, submittalSchema, { method: 'POST', body });
        case 'report':
          return apiRequest(`${base(id)}/inspection-reports`, submittalSchema, { method: 'POST', body });
        case 'remove':
          return apiRequest(
            `${base(id)}/items/${encodeURIComponent((body as { itemId: string }).itemId)}`,
            submittalSchema,
            { method: 'DELETE' },
          );
      }
    },
    onSuccess: settle,
    onError: (e) => {
      const current = conflictingSubmittal(e);
      if (current) qc.setQueryData(submittalKeys.detail(current.id), current);
    },
  });
}
