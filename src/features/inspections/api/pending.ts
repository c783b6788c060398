import type { ItemAnswer } from '@shared/inspections/schema';
import { useMutationState } from '@tanstack/react-query';
import { inspectionKeys } from '../../../lib/query-keys';
import type { AnswerVariables } from './answer-item';
import type { PhotoVariables } from './upload-photo';

/*
 * What this device has done that the server has not confirmed yet, read from the queued mutations themselves
 * (not written into the cached inspection): the page shows the server's items with these on top.
 */

/** The latest waiting answer of each item of the inspection. */
export function usePendingAnswers(inspectionId: string): ReadonlyMap<string, ItemAnswer> {
  const waiting = useMutationState({
    filters: { mutationKey: inspectionKeys.answers(), status: 'pending' },
    select: (m) => m.state.variables as AnswerVariables | undefined,
  });
  return new Map(
    waiting
      .filter((v) => v?.inspectionId === inspectionId)
      .map((v) => [v?.itemId ?? '', v?.answer as ItemAnswer]),
  );
}

/** The photos of the inspection waiting on the device to be sent. */
export function usePendingPhotos(inspectionId: string): PhotoVariables[] {
  const waiting = useMutationState({
    filters: { mutationKey: inspectionKeys.photos(), status: 'pending' },
    select: (m) => m.state.variables as PhotoVariables | undefined,
  });
  return waiting.filter((v): v is PhotoVariables => v?.inspectionId === inspectionId);
}
