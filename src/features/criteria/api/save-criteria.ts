import type { CriteriaRowInput } from '@shared/checks/criteria';
import {
  type CriteriaSave,
  type CriteriaSet,
  type CriteriaSetMeta,
  criteriaSaveSchema,
  criteriaSetSchema,
} from '@shared/schemas/criteria';
import { type QueryClient, useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest, currentOnConflict, isApiRequestError } from '../../../lib/api';
import { criteriaKeys } from '../../../lib/query-keys';

/*
 * Every edit of a code table: rows (the grid), details (name, edition…), or a CSV import. Each names the
 * revision it read; a frozen version answers with the new version that holds the edit.
 */

const path = (setId: string, tail = '') => `/api/criteria-sets/${encodeURIComponent(setId)}${tail}`;

/** `PUT /api/criteria-sets/:setId/rows` */
export const saveCriteriaRows = ({
  setId,
  revision,
  rows,
}: {
  setId: string;
  revision: number;
  rows: CriteriaRowInput[];
}) => apiRequest(path(setId, '/rows'), criteriaSaveSchema, { method: 'PUT', body: { revision, rows } });

/** `PUT /api/criteria-sets/:setId` */
export const saveCriteriaMeta = ({
  setId,
  revision,
  changes,
}: {
  setId: string;
  revision: number;
  changes: CriteriaSetMeta;
}) => apiRequest(path(setId), criteriaSaveSchema, { method: 'PUT', body: { revision, changes } });

/** `POST /api/criteria-sets/:setId/import?revision=` with `{ csv }` — all or nothing (422 lists the problems). */
export const importCriteriaCsv = ({
  setId,
  revision,
  csv,
}: {
  setId: string;
  revision: number;
  csv: string;
}) =>
  apiRequest(path(setId, `/import?revision=${revision}`), criteriaSaveSchema, {
    method: 'POST',
    body: { csv },
  });

/** On a 409, the table as it now stands (someone saved first, or a newer version exists); else null. */
export const conflictingSet = (error: unknown): CriteriaSet | null =>
  currentOnConflict(error, criteriaSetSchema, null);

const csvErrorBody = z.object({
  errors: z.array(z.object({ line: z.number(), field: z.string(), reason: z.string() })),
});
/** On a 422 import, every problem with its line; else null. */
export function csvProblems(error: unknown) {
  if (!isApiRequestError(error) || error.status !== 422) return null;
  const parsed = csvErrorBody.safeParse(error.body);
  return parsed.success ? parsed.data.errors : null;
}

function onSaved(qc: QueryClient, saved: CriteriaSave) {
  qc.setQueryData(criteriaKeys.detail(saved.id), saved);
  if (saved.previousVersionId)
    void qc.invalidateQueries({ queryKey: criteriaKeys.detail(saved.previousVersionId) });
  void qc.invalidateQueries({ queryKey: criteriaKeys.lists() });
  void qc.invalidateQueries({ queryKey: [...criteriaKeys.all, 'versions'] });
}

const useSave = <V>(fn: (v: V) => Promise<CriteriaSave>) => {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: (saved) => onSaved(qc, saved) });
};

export const useSaveCriteriaRows = () => useSave(saveCriteriaRows);
export const useSaveCriteriaMeta = () => useSave(saveCriteriaMeta);
export const useImportCriteriaCsv = () => useSave(importCriteriaCsv);
