import {
  type Inspection,
  type InspectionItem,
  type ItemAnswer,
  inspectionItemSchema,
  itemAnswerResultSchema,
} from '@shared/inspections/schema';
import { type QueryClient, useMutation } from '@tanstack/react-query';
import { apiRequest, currentOnConflict } from '../../../lib/api';
import { retryWhenUnreachable } from '../../../lib/offline/queue';
import { inspectionKeys } from '../../../lib/query-keys';
import { inspectionPaths } from './paths';

/*
 * Answers are queued mutations (src/lib/offline): made with no signal they wait on the device, survive a reload,
 * and are sent in order per inspection (one `scope`) when the connection returns. Each names the item version
 * the person saw; a newer version from someone else is a 409 with the item as it is, shown as a conflict.
 */

export interface AnswerVariables {
  inspectionId: string;
  itemId: string;
  /** The item's words, for the waiting list and a conflict message after a reload. */
  label: string;
  answer: ItemAnswer;
}

/** Versions this device moved an item on by its own answers: `item:sent` → the version the server gave back. */
const ownVersions = new Map<string, number>();

/** The version to send: the one the person saw, carried past this device's own answers sent since. */
export function versionToSend(itemId: string, seen: number, own: ReadonlyMap<string, number> = ownVersions) {
  let v = seen;
  for (let next = own.get(`${itemId}:${v}`); next !== undefined; next = own.get(`${itemId}:${v}`)) v = next;
  return v;
}

/** Whether the item already says what the answer says (an answer the server took before a reload cut the reply). */
export const alreadyAnswered = (item: InspectionItem, a: ItemAnswer) =>
  item.state === a.state &&
  (a.measured === undefined || item.measured === a.measured) &&
  (a.note === undefined || item.note === a.note) &&
  (a.location === undefined || item.location === a.location);

/** `PUT /api/inspection-items/:inspectionItemId` → the item as stored (a failure opens a deficiency). */
export async function sendAnswer({ itemId, answer }: AnswerVariables): Promise<InspectionItem> {
  const version = versionToSend(itemId, answer.version);
  const remember = (item: InspectionItem) => {
    ownVersions.set(`${itemId}:${version}`, item.version);
    return item;
  };
  try {
    const result = await apiRequest(inspectionPaths.item(itemId), itemAnswerResultSchema, {
      method: 'PUT',
      body: { ...answer, version },
    });
    return remember(result.item);
  } catch (error) {
    const current = conflictingItem(error);
    if (current && alreadyAnswered(current, answer)) return remember(current);
    throw error;
  }
}

/** On a 409 the server sends the item as it now is; null for any other error. */
export const conflictingItem = (error: unknown): InspectionItem | null =>
  currentOnConflict(error, inspectionItemSchema, null);

/** The item as the server has it, put into the cached inspection. */
export function putItem(qc: QueryClient, inspectionId: string, item: InspectionItem) {
  qc.setQueryData<Inspection>(inspectionKeys.detail(inspectionId), (old) =>
    old ? { ...old, items: old.items.map((i) => (i.id === item.id ? item : i)) } : old,
  );
}

/** One queue per inspection: its answers and photos are sent one after another, in the order made. */
export const inspectionScope = (inspectionId: string) => ({ id: `inspection:${inspectionId}` });

/** After the last queued change of an inspection is through: its deficiencies, counts and list from the server. */
export function refreshWhenQueueEmpty(qc: QueryClient, inspectionId: string) {
  const waiting = qc.isMutating({
    mutationKey: inspectionKeys.all,
    predicate: (m) =>
      (m.state.variables as { inspectionId?: string } | undefined)?.inspectionId === inspectionId,
  });
  if (waiting > 1) return;
  void qc.invalidateQueries({ queryKey: inspectionKeys.detail(inspectionId) });
  void qc.invalidateQueries({ queryKey: inspectionKeys.lists() });
}

/** The function and callbacks a queued answer runs — also one restored from the device after a reload. */
export function registerAnswerDefaults(qc: QueryClient) {
  qc.setMutationDefaults<InspectionItem, Error, AnswerVariables>(inspectionKeys.answers(), {
    mutationFn: (v) => sendAnswer(v),
    retry: retryWhenUnreachable,
    onSuccess: (item, v) => putItem(qc, v.inspectionId, item),
    onError: (error, v) => {
      const current = conflictingItem(error);
      if (current) putItem(qc, v.inspectionId, current);
    },
    onSettled: (_d, _e, v) => refreshWhenQueueEmpty(qc, v.inspectionId),
  });
}

export function useAnswerItem(inspectionId: string) {
  return useMutation<InspectionItem, Error, AnswerVariables>({
    mutationKey: inspectionKeys.answers(),
    scope: inspectionScope(inspectionId),
  });
}
