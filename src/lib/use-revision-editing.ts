import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import { useEffect, useRef, useState } from 'react';
import { isApiRequestError } from './api';

/*
 * One assembly page's edits while they are made, and saving them as a new revision of the assembly — the same
 * for every page (build-up, moisture, attachment, joints), which differ only in the parameters below. A stale
 * save (409) never overwrites: the person carries their edits onto the revision someone else saved, or loads
 * it. Nothing is saved without a click. The page keeps its values where it likes (react-hook-form or state)
 * and hands them in with a way to replace them; the API calls are handed in too (src/lib imports no feature).
 */

export interface SaveArgs {
  assemblyId: string;
  version: number;
  note: string;
  input: AssemblyInput;
}

/**
 * Why the page's values are replaced: after a save, a create, a newer revision taken in, theirs loaded, a carry-over,
 * all edits discarded, a step of undo or redo (`history`: the base revision stays, so a form keeps its defaults).
 */
export type ResetReason = 'saved' | 'created' | 'newer' | 'theirs' | 'carried' | 'discard' | 'history';

/**
 * Whether a revision note typed on an otherwise unchanged page counts: `saves` — it is an edit (kept from
 * leaving, and it may be saved as a revision on its own); `guards` — it is kept from leaving, but Save needs an
 * edited value; `ignored` — only the values count (undo keeps the note).
 */
export type NoteAlone = 'saves' | 'guards' | 'ignored';

/** How this person's edits go onto the revision someone else saved. */
export interface Carry<V, D> {
  /** The values to go on with; absent: the page's values stay as they are. */
  values?: V;
  /** What the page tells about it (e.g. the values both changed). */
  detail: D;
}

export interface RevisionConflict<V, D> {
  /** The assembly as someone else saved it. */
  theirs: Assembly;
  /** The input this person tried to save. */
  mine: AssemblyInput;
  /** How to carry the edits over; null when they cannot be matched to their revision (only loading it is offered). */
  carry: Carry<V, D> | null;
}

/** The API calls a page hands in (src/lib imports no feature): `useAssemblyRevisionApi` in features/assemblies. */
export interface RevisionApi {
  save: (args: SaveArgs) => Promise<Assembly>;
  /** The assembly as saved by someone else, from a 409 error; null for any other error. */
  conflictOf: (error: unknown) => Assembly | null;
  /** Put their revision in the cache when the person loads it. */
  onLoadTheirs: (theirs: Assembly) => void;
  errorText: (error: unknown) => string;
}

export interface RevisionEditingOptions<V, D, A extends Assembly | undefined> extends RevisionApi {
  /** The assembly as the cache holds it now (it may move on when someone else saves); undefined while creating one. */
  assembly: A;
  /** The page's values now. */
  values: V;
  /** Whether the values differ from those of the base revision (`base` is undefined while creating). */
  isEdited: (values: V, base: A) => boolean;
  /** Put values on the page. */
  reset: (values: V, why: ResetReason) => void;
  /** The page's values for a saved input. */
  formValues: (input: AssemblyInput) => V;
  /**
   * The input to save — the base revision's input with the edits put in — or the reasons it cannot be saved yet.
   * `submitted` is what the form's resolver parsed, when the page submits through react-hook-form.
   */
  toInput: (
    values: V,
    base: A,
    submitted?: AssemblyInput,
  ) => { input: AssemblyInput; problem?: undefined } | { problem: string[] };
  /** After a 409: how the edits go onto their revision (`mine` is what was sent, `values` the page's then). */
  carryOver: (c: { base: Assembly; mine: AssemblyInput; values: V; theirs: Assembly }) => Carry<V, D> | null;
  /** After carrying over, the page counts as edited and says so until saved (default true). */
  markCarried?: boolean;
  noteAlone?: NoteAlone;
  /**
   * A server reason (400 `fields`, keyed by the request's dotted path, e.g. `input.vapour.3`): the form path it
   * is shown at on this page, or null when this page has no field for it (default: none has).
   */
  fieldPath?: (serverPath: string) => string | null;
  /** The lines of “Not saved.” after the server refused values (default: see the fields marked ✕, then the rest by path). */
  notAccepted?: (unmapped: [path: string, message: string][], mapped: Record<string, string>) => string[];
  /** The part of the values the server's reasons stay shown for: they go when it changes (default: all the values). */
  snapshot?: (values: V) => unknown;
  /** Creating the assembly, when `assembly` is undefined. */
  create?: (input: AssemblyInput) => Promise<Assembly>;
  onCreated?: (created: Assembly) => void;
}

/** What the save bar reads (any page's editing state). */
export interface RevisionSaving {
  base: Assembly | undefined;
  note: string;
  setNote: (note: string) => void;
  saving: boolean;
  savedAs: number | null;
  problem: string[] | null;
  conflict: RevisionConflict<unknown, unknown> | null;
  carried: { onto: number; detail: unknown } | null;
  /** A newer revision saved elsewhere while this page has edits. */
  newerElsewhere: Assembly | null;
  /** Unsaved work on the page (asked about before leaving). */
  dirty: boolean;
  canSave: boolean;
  /** Set when the page is left on purpose (no more asking). */
  leaving: { current: boolean };
  saveNow: (submitted?: AssemblyInput) => Promise<void>;
  carryOver: () => void;
  loadTheirs: () => void;
  discard: () => void;
  /** Undo and redo of the page's values since the last save (the note is not in the history). */
  history: ValueHistory;
}

/** The steps of a page's values since the last save. */
export interface ValueHistory {
  canUndo: boolean;
  canRedo: boolean;
  undo: () => void;
  redo: () => void;
  /** What the latest step removed, while it is the latest step (“Removed layer 3 — Undo”). */
  removed: string | null;
  /** Name what the change being made removes (call it in the same handler as the change). */
  markRemoval: (what: string) => void;
}

export interface RevisionEditing<V, D, A extends Assembly | undefined> extends RevisionSaving {
  /** The revision the edits started from (undefined while creating). */
  base: A;
  conflict: RevisionConflict<V, D> | null;
  carried: { onto: number; detail: D } | null;
  /** The values differ from the base revision's. */
  edited: boolean;
  /** The server's reasons by form path, while the values it judged are on the page. */
  serverErrors: Record<string, string>;
  setSavedAs: (revision: number | null) => void;
  setProblem: (problem: string[] | null) => void;
}

/** A box whose own native undo works on its text: the page's undo leaves Ctrl+Z to it. */
export function isTextField(el: EventTarget | null): boolean {
  if (el instanceof HTMLTextAreaElement) return true;
  if (el instanceof HTMLElement && el.isContentEditable) return true;
  return (
    el instanceof HTMLInputElement &&
    !['checkbox', 'radio', 'button', 'submit', 'reset', 'range', 'color', 'file', 'image'].includes(el.type)
  );
}

/** Typing in one text box counts as one step while the keystrokes come less than this apart. */
const TYPING_STEP_MS = 2000;

/**
 * The history of a page's values: each change is a step (keystrokes in one text box, one step), `apply` puts a
 * step's values back. `baseline` (a save, theirs loaded, …) starts it again; a change before the person has
 * touched the page since then is taken as the starting point too (a form filling in its fields).
 */
function useValueHistory<V>(values: V, apply: (values: V) => void) {
  const key = JSON.stringify(values);
  const h = useRef({
    past: [] as V[],
    future: [] as V[],
    last: structuredClone(values),
    key,
    typingIn: null as Element | null,
    at: 0,
    removing: null as string | null,
    touched: false,
  });
  const [removal, setRemoval] = useState<{ what: string; depth: number } | null>(null);
  const [, setSteps] = useState(0);
  const changed = () => setSteps((n) => n + 1);

  useEffect(() => {
    const touch = () => {
      h.current.touched = true;
    };
    const events = ['pointerdown', 'keydown', 'input', 'change'] as const;
    for (const e of events) document.addEventListener(e, touch, true);
    return () => {
      for (const e of events) document.removeEventListener(e, touch, true);
    };
  }, []);

  // biome-ignore lint/correctness/useExhaustiveDependencies: the key stands for the values (deep)
  useEffect(() => {
    const s = h.current;
    if (key === s.key) return;
    const typing = isTextField(document.activeElement) ? document.activeElement : null;
    const now = Date.now();
    if (!s.touched) {
      s.future = [];
    } else if (!(typing && typing === s.typingIn && now - s.at < TYPING_STEP_MS)) {
      s.past.push(s.last);
      s.future = [];
    }
    s.typingIn = typing;
    s.at = now;
    s.last = structuredClone(values);
    s.key = key;
    setRemoval(s.removing ? { what: s.removing, depth: s.past.length } : null);
    s.removing = null;
    changed();
  }, [key]);

  function travel(back: boolean) {
    const s = h.current;
    const to = back ? s.past.pop() : s.future.pop();
    if (to === undefined) return;
    (back ? s.future : s.past).push(s.last);
    s.last = to;
    s.key = JSON.stringify(to);
    s.typingIn = null;
    setRemoval(null);
    apply(structuredClone(to));
    changed();
  }

  function baseline(next: V) {
    Object.assign(h.current, {
      past: [],
      future: [],
      last: structuredClone(next),
      key: JSON.stringify(next),
      typingIn: null,
      removing: null,
      touched: false,
    });
    setRemoval(null);
    changed();
  }

  const { past, future } = h.current;
  const history: ValueHistory = {
    canUndo: past.length > 0,
    canRedo: future.length > 0,
    undo: () => travel(true),
    redo: () => travel(false),
    removed: removal && removal.depth === past.length && future.length === 0 ? removal.what : null,
    markRemoval: (what) => {
      h.current.removing = what;
    },
  };
  return { history, baseline };
}

const notAcceptedByPath = (unmapped: [string, string][]) => [
  'The server did not accept some values — see the fields marked ✕.',
  ...unmapped.map(([path, message]) => `${path.replace(/^input\./, '')}: ${message}`),
];

export function useRevisionEditing<V, D = undefined, A extends Assembly | undefined = Assembly>(
  options: RevisionEditingOptions<V, D, A>,
): RevisionEditing<V, D, A> {
  const {
    assembly,
    values,
    reset: resetSheet,
    formValues,
    markCarried = true,
    noteAlone = 'saves',
    fieldPath = () => null,
    notAccepted = notAcceptedByPath,
    snapshot = (v: V) => v,
  } = options;
  const [base, setBase] = useState<A>(assembly);
  const [note, setNote] = useState('');
  const [saving, setSaving] = useState(false);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [problem, setProblem] = useState<string[] | null>(null);
  const [conflict, setConflict] = useState<RevisionConflict<V, D> | null>(null);
  const [carried, setCarried] = useState<{ onto: number; detail: D } | null>(null);
  const [server, setServer] = useState<{ snapshot: string; errors: Record<string, string> } | null>(null);
  /** True from the moment a save is sent until its answer has been taken in. */
  const savingRef = useRef(false);
  const leaving = useRef(false);

  const keyOf = (v: V) => JSON.stringify(snapshot(v));
  const serverErrors = server && server.snapshot === keyOf(values) ? server.errors : {};
  const edited = options.isEdited(values, base);
  const dirty = edited || (noteAlone !== 'ignored' && note.trim() !== '') || carried !== null;
  const canSave = base === undefined || (noteAlone === 'guards' ? edited || carried !== null : dirty);
  const { history, baseline } = useValueHistory(values, (v) => resetSheet(v, 'history'));
  /** Values put on the page from outside its edits start the history again (discarding is a step of it). */
  function reset(next: V, why: ResetReason) {
    if (why !== 'discard') baseline(next);
    resetSheet(next, why);
  }

  // Someone saved a newer revision while this page was open: take it if nothing here is edited.
  // biome-ignore lint/correctness/useExhaustiveDependencies: reset and formValues are the page's (new each render)
  useEffect(() => {
    if (!assembly || !base || savingRef.current || conflict || assembly.version <= base.version || dirty)
      return;
    setBase(assembly);
    reset(formValues(assembly.current.input), 'newer');
  }, [assembly, base, conflict, dirty]);
  const newerElsewhere =
    assembly && base && !conflict && !savingRef.current && dirty && assembly.version > base.version
      ? assembly
      : null;

  async function saveNow(submitted?: AssemblyInput) {
    setProblem(null);
    setSavedAs(null);
    const made = options.toInput(values, base, submitted);
    if (made.problem) {
      setProblem(made.problem);
      return;
    }
    const { input } = made;
    savingRef.current = true;
    setSaving(true);
    try {
      if (!base) {
        if (!options.create) throw new Error('Nothing to create the assembly with.');
        const created = await options.create(input);
        leaving.current = true;
        reset(formValues(input), 'created');
        options.onCreated?.(created);
        return;
      }
      const saved = await options.save({
        assemblyId: base.id,
        version: base.version,
        note: note.trim(),
        input,
      });
      setBase(saved as A);
      reset(formValues(saved.current.input), 'saved');
      setNote('');
      setCarried(null);
      setSavedAs(saved.revision);
    } catch (e) {
      const theirs = base ? options.conflictOf(e) : null;
      if (base && theirs) {
        setConflict({ theirs, mine: input, carry: options.carryOver({ base, mine: input, values, theirs }) });
        return;
      }
      if (isApiRequestError(e) && e.fields) {
        const mapped: Record<string, string> = {};
        const unmapped: [string, string][] = [];
        for (const [path, message] of Object.entries(e.fields)) {
          const at = fieldPath(path);
          if (at === null) unmapped.push([path, message]);
          else mapped[at] = message;
        }
        setServer({ snapshot: keyOf(values), errors: mapped });
        setProblem(notAccepted(unmapped, mapped));
        return;
      }
      setProblem([options.errorText(e)]);
    } finally {
      savingRef.current = false;
      setSaving(false);
    }
  }

  function carryOver() {
    if (!conflict?.carry) return;
    const { theirs, carry } = conflict;
    setBase(theirs as A);
    if (carry.values !== undefined) reset(carry.values, 'carried');
    if (markCarried) setCarried({ onto: theirs.revision, detail: carry.detail });
    setConflict(null);
  }

  function loadTheirs() {
    if (!conflict) return;
    const { theirs } = conflict;
    options.onLoadTheirs(theirs);
    setBase(theirs as A);
    reset(formValues(theirs.current.input), 'theirs');
    setCarried(null);
    setConflict(null);
    setNote('');
  }

  function discard() {
    if (!base) return;
    reset(formValues(base.current.input), 'discard');
    setCarried(null);
    setProblem(null);
    setServer(null);
    if (noteAlone !== 'ignored') setNote('');
  }

  return {
    base,
    note,
    setNote,
    saving,
    savedAs,
    setSavedAs,
    problem,
    setProblem,
    conflict,
    carried,
    newerElsewhere,
    edited,
    dirty,
    canSave,
    serverErrors,
    leaving,
    saveNow,
    carryOver,
    loadTheirs,
    discard,
    history,
  };
}
