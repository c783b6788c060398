import type { Vapour } from '@shared/calc/moisture/schema';
import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import { useEffect, useMemo, useRef, useState } from 'react';
import { isApiRequestError } from '../../lib/api';
import { mergeVapour } from './merge';
import { draftsFor, readDrafts, sameVapour, type VapourDraft } from './vapour-draft';

/*
 * The vapour rows of one assembly while they are edited on the moisture sheet, and saving them as a new
 * revision of the assembly. A stale save (409) never overwrites: the person carries their entries onto the
 * saved revision or loads it. The API calls are handed in by the page (features do not import each other).
 */

export interface SaveArgs {
  assemblyId: string;
  version: number;
  note: string;
  input: AssemblyInput;
}

export interface VapourEditingOptions {
  /** The assembly as the cache holds it now (it may move on when someone else saves). */
  assembly: Assembly;
  save: (args: SaveArgs) => Promise<Assembly>;
  /** The assembly as saved by someone else, from a 409 error; null for any other error. */
  conflictOf: (error: unknown) => Assembly | null;
  /** Put their revision in the cache when the person loads it. */
  onLoadTheirs: (theirs: Assembly) => void;
  errorText: (error: unknown) => string;
}

export interface VapourConflict {
  theirs: Assembly;
  mine: (Vapour | null)[];
  merged: (Vapour | null)[] | null;
  bothChanged: number[];
}

export function useVapourEditing({
  assembly,
  save,
  conflictOf,
  onLoadTheirs,
  errorText,
}: VapourEditingOptions) {
  const [base, setBase] = useState<Assembly>(assembly);
  const layers = base.current.input.thermal.layers;
  const [drafts, setDrafts] = useState<VapourDraft[]>(() => draftsFor(layers, base.current.input.vapour));
  const [note, setNote] = useState('');
  const [saving, setSaving] = useState(false);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [problem, setProblem] = useState<string[] | null>(null);
  const [conflict, setConflict] = useState<VapourConflict | null>(null);
  const [carried, setCarried] = useState<{ onto: number; bothChanged: number[] } | null>(null);
  const [server, setServer] = useState<{ snapshot: string; errors: Record<number, string> } | null>(null);
  const savingRef = useRef(false);

  const snapshot = JSON.stringify(drafts);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for the drafts (deep)
  const read = useMemo(() => readDrafts(drafts), [snapshot]);
  const serverErrors = server && server.snapshot === snapshot ? server.errors : {};
  const rowErrors = { ...serverErrors, ...read.errors };
  const dirty =
    !sameVapour(read.vapour, base.current.input.vapour, layers.length) ||
    Object.keys(read.errors).length > 0 ||
    carried !== null;

  // Someone saved a newer revision while this page was open: take it if nothing here is edited.
  useEffect(() => {
    if (savingRef.current || conflict || assembly.version <= base.version || dirty) return;
    setBase(assembly);
    setDrafts(draftsFor(assembly.current.input.thermal.layers, assembly.current.input.vapour));
  }, [assembly, base.version, conflict, dirty]);
  const newerElsewhere = !conflict && !savingRef.current && assembly.version > base.version ? assembly : null;

  function setDraft(i: number, next: VapourDraft) {
    setSavedAs(null);
    setDrafts((list) => list.map((d, k) => (k === i ? next : d)));
  }

  function restartFrom(next: Assembly, vapour?: readonly (Vapour | null)[]) {
    setBase(next);
    setDrafts(draftsFor(next.current.input.thermal.layers, vapour ?? next.current.input.vapour));
  }

  async function saveNow() {
    setProblem(null);
    setSavedAs(null);
    if (Object.keys(read.errors).length > 0) {
      setProblem(['Some vapour values cannot be read — put right the rows marked ✕ first.']);
      return;
    }
    savingRef.current = true;
    setSaving(true);
    try {
      const saved = await save({
        assemblyId: base.id,
        version: base.version,
        note: note.trim(),
        input: { ...base.current.input, vapour: read.vapour },
      });
      restartFrom(saved);
      setNote('');
      setCarried(null);
      setSavedAs(saved.revision);
    } catch (e) {
      const theirs = conflictOf(e);
      if (theirs) {
        const { merged, bothChanged } = mergeVapour(base.current.input, read.vapour, theirs.current.input);
        setConflict({ theirs, mine: read.vapour, merged, bothChanged });
        return;
      }
      if (isApiRequestError(e) && e.fields) {
        const errors: Record<number, string> = {};
        const other: string[] = [];
        for (const [path, message] of Object.entries(e.fields)) {
          const m = /^input\.vapour\.(\d+)/.exec(path);
          if (m) errors[Number(m[1])] = message;
          else other.push(`${path}: ${message}`);
        }
        setServer({ snapshot, errors });
        setProblem(['The server did not accept some values — see the rows marked ✕.', ...other]);
        return;
      }
      setProblem([errorText(e)]);
    } finally {
      savingRef.current = false;
      setSaving(false);
    }
  }

  function carryOver() {
    if (!conflict?.merged) return;
    restartFrom(conflict.theirs, conflict.merged);
    setCarried({ onto: conflict.theirs.revision, bothChanged: conflict.bothChanged });
    setConflict(null);
  }

  function loadTheirs(theirs: Assembly) {
    onLoadTheirs(theirs);
    restartFrom(theirs);
    setCarried(null);
    setConflict(null);
    setNote('');
  }

  function discard() {
    restartFrom(base);
    setCarried(null);
    setProblem(null);
    setServer(null);
  }

  return {
    base,
    layers,
    drafts,
    setDraft,
    vapour: read.vapour,
    rowErrors,
    dirty,
    note,
    setNote,
    saving,
    savedAs,
    problem,
    conflict,
    carried,
    newerElsewhere,
    saveNow,
    carryOver,
    loadTheirs,
    discard,
  };
}

export type VapourEditing = ReturnType<typeof useVapourEditing>;
