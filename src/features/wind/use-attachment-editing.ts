import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { isApiRequestError } from '../../lib/api';
import { evaluateAttachment } from './evaluate';
import { type AttachmentFormValues, attachmentFormValues, toFormPath, withAttachment } from './form';

/*
 * The attachment sheet's inputs while they are edited (design spacings, panel table, clip), computed live, and
 * saving them as a new revision of the assembly. A stale save (409) never overwrites: the person carries their
 * values onto the saved revision or loads it. The API calls are handed in by the page (features do not import
 * each other).
 */

export interface SaveArgs {
  assemblyId: string;
  version: number;
  note: string;
  input: AssemblyInput;
}

export interface AttachmentEditingOptions {
  project: Project;
  /** The assembly as the cache holds it now (it may move on when someone else saves). */
  assembly: Assembly;
  system: UnitSystem;
  save: (args: SaveArgs) => Promise<Assembly>;
  /** The assembly as saved by someone else, from a 409 error; null for any other error. */
  conflictOf: (error: unknown) => Assembly | null;
  /** Put their revision in the cache when the person loads it. */
  onLoadTheirs: (theirs: Assembly) => void;
  errorText: (error: unknown) => string;
}

export interface AttachmentConflict {
  theirs: Assembly;
  mine: AttachmentFormValues;
  /** Their revision changed the wind inputs too (then carrying over keeps mine there). */
  theyChangedWind: boolean;
}

/** The part of an assembly this sheet owns, for comparing revisions. */
const windPart = (a: AssemblyInput) =>
  JSON.stringify({
    g: a.attachment.girtSpacing ?? null,
    c: a.attachment.clipSpacing ?? null,
    p: a.windPanel ?? null,
  });

export function useAttachmentEditing({
  project,
  assembly,
  system,
  save,
  conflictOf,
  onLoadTheirs,
  errorText,
}: AttachmentEditingOptions) {
  const [base, setBase] = useState<Assembly>(assembly);
  const form = useForm<AttachmentFormValues>({ defaultValues: attachmentFormValues(assembly.current.input) });
  const { control, reset, formState } = form;
  const values = useWatch({ control }) as AttachmentFormValues;
  const [note, setNote] = useState('');
  const [saving, setSaving] = useState(false);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [problem, setProblem] = useState<string[] | null>(null);
  const [conflict, setConflict] = useState<AttachmentConflict | null>(null);
  const [carried, setCarried] = useState<{ onto: number; theyChangedWind: boolean } | null>(null);
  const [server, setServer] = useState<{ snapshot: string; errors: Record<string, string> } | null>(null);
  const savingRef = useRef(false);

  const snapshot = JSON.stringify(values);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for the values (deep)
  const evaluation = useMemo(
    () => evaluateAttachment(values, base.current.input, project, system),
    [snapshot, base, project, system],
  );
  const serverErrors = server && server.snapshot === snapshot ? server.errors : {};
  const errors = { ...serverErrors, ...evaluation.errors };
  const dirty = formState.isDirty || note.trim() !== '' || carried !== null;

  // Someone saved a newer revision while this page was open: take it if nothing here is edited.
  useEffect(() => {
    if (savingRef.current || conflict || assembly.version <= base.version || dirty) return;
    setBase(assembly);
    reset(attachmentFormValues(assembly.current.input));
  }, [assembly, base.version, conflict, dirty, reset]);
  const newerElsewhere = !conflict && !savingRef.current && assembly.version > base.version ? assembly : null;

  async function saveNow() {
    setProblem(null);
    setSavedAs(null);
    if (Object.keys(evaluation.errors).length > 0) {
      setProblem(['Some values cannot be used yet — put right the values marked ✕ first.']);
      return;
    }
    if (!evaluation.panel && base.current.input.windPanel) {
      setProblem([
        'The panel table and clip are empty. Enter them again, or undo your edits to keep the saved ones.',
      ]);
      return;
    }
    const input = withAttachment(base.current.input, evaluation.panel, evaluation.design);
    savingRef.current = true;
    setSaving(true);
    try {
      const saved = await save({ assemblyId: base.id, version: base.version, note: note.trim(), input });
      setBase(saved);
      reset(attachmentFormValues(saved.current.input));
      setNote('');
      setCarried(null);
      setSavedAs(saved.revision);
    } catch (e) {
      const theirs = conflictOf(e);
      if (theirs) {
        setConflict({
          theirs,
          mine: values,
          theyChangedWind: windPart(theirs.current.input) !== windPart(base.current.input),
        });
        return;
      }
      if (isApiRequestError(e) && e.fields) {
        const mapped: Record<string, string> = {};
        const elsewhere: string[] = [];
        for (const [k, v] of Object.entries(e.fields)) {
          const path = k.replace(/^input\./, '');
          if (path.startsWith('windPanel.')) mapped[toFormPath(path)] = v;
          else if (path === 'attachment.girtSpacing' || path === 'attachment.clipSpacing')
            mapped[path.slice('attachment.'.length)] = v;
          else elsewhere.push(`${path}: ${v}`);
        }
        setServer({ snapshot, errors: mapped });
        setProblem(['The server did not accept some values — see the fields marked ✕.', ...elsewhere]);
        return;
      }
      setProblem([errorText(e)]);
    } finally {
      savingRef.current = false;
      setSaving(false);
    }
  }

  function carryOver() {
    if (!conflict) return;
    setBase(conflict.theirs);
    reset(conflict.mine);
    setCarried({ onto: conflict.theirs.version, theyChangedWind: conflict.theyChangedWind });
    setConflict(null);
  }

  function loadTheirs(theirs: Assembly) {
    onLoadTheirs(theirs);
    setBase(theirs);
    reset(attachmentFormValues(theirs.current.input));
    setCarried(null);
    setConflict(null);
    setNote('');
  }

  function discard() {
    reset(attachmentFormValues(base.current.input));
    setCarried(null);
    setNote('');
    setProblem(null);
  }

  return {
    form,
    values,
    base,
    evaluation,
    errors,
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

export type AttachmentEditing = ReturnType<typeof useAttachmentEditing>;
