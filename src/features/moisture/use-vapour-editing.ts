import type { Assembly } from '@shared/schemas/assembly';
import { useMemo, useState } from 'react';
import { type RevisionApi, useRevisionEditing } from '../../lib/use-revision-editing';
import { mergeVapour } from './merge';
import { draftsFor, readDrafts, sameVapour, type VapourDraft } from './vapour-draft';

/*
 * The vapour rows of one assembly while they are edited on the moisture page, saved as a new revision of the
 * assembly by the shared revision editing (src/lib/use-revision-editing.ts). A stale save (409) carries the
 * entries onto the saved revision only while its layers are the same ones in the same order.
 */

export type VapourEditingOptions = RevisionApi & { assembly: Assembly };

export interface VapourCarry {
  /** Layers whose entry both changed (this person's is kept). */
  bothChanged: number[];
}

const draftsOf = (input: Assembly['current']['input']) => draftsFor(input.thermal.layers, input.vapour);

export function useVapourEditing(io: VapourEditingOptions) {
  const [drafts, setDrafts] = useState<VapourDraft[]>(() => draftsOf(io.assembly.current.input));
  const snapshot = JSON.stringify(drafts);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for the drafts (deep)
  const read = useMemo(() => readDrafts(drafts), [snapshot]);

  const editing = useRevisionEditing<VapourDraft[], VapourCarry>({
    ...io,
    values: drafts,
    isEdited: (_, base) =>
      !sameVapour(read.vapour, base.current.input.vapour, base.current.input.thermal.layers.length) ||
      Object.keys(read.errors).length > 0,
    reset: setDrafts,
    formValues: draftsOf,
    toInput: (_, base) =>
      Object.keys(read.errors).length > 0
        ? { problem: ['Some vapour values cannot be read — put right the rows marked ✕ first.'] }
        : { input: { ...base.current.input, vapour: read.vapour } },
    carryOver: ({ base, mine, theirs }) => {
      const { merged, bothChanged } = mergeVapour(
        base.current.input,
        mine.vapour ?? [],
        theirs.current.input,
      );
      return merged
        ? { values: draftsFor(theirs.current.input.thermal.layers, merged), detail: { bothChanged } }
        : null;
    },
    noteAlone: 'ignored',
    fieldPath: (path) => /^input\.vapour\.(\d+)/.exec(path)?.[1] ?? null,
    notAccepted: (unmapped) => [
      'The server did not accept some values — see the rows marked ✕.',
      ...unmapped.map(([path, message]) => `${path}: ${message}`),
    ],
  });

  function setDraft(i: number, next: VapourDraft) {
    editing.setSavedAs(null);
    setDrafts((list) => list.map((d, k) => (k === i ? next : d)));
  }

  return {
    ...editing,
    layers: editing.base.current.input.thermal.layers,
    drafts,
    setDraft,
    vapour: read.vapour,
    rowErrors: { ...editing.serverErrors, ...read.errors } as Record<number, string>,
  };
}

export type VapourEditing = ReturnType<typeof useVapourEditing>;
