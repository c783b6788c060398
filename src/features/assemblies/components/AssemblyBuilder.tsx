import { zodResolver } from '@hookform/resolvers/zod';
import type { ThermalInput } from '@shared/calc/thermal/schema';
import { ENGINE_VERSION } from '@shared/calc/trace';
import {
  type Assembly,
  type AssemblyInput,
  assemblyInputSchema,
  type BridgeValue,
  type OrgMaterial,
  WALL_CATEGORIES,
  WALL_CATEGORY_LABELS,
} from '@shared/schemas/assembly';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { useBlocker } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { assemblyKeys } from '../../../lib/query-keys';
import { useUnitSystem } from '../../../lib/unit-system';
import { useCreateAssembly } from '../api/create-assembly';
import { conflictingAssembly, useUpdateAssembly } from '../api/update-assembly';
import { assemblyErrorMap, evaluateThermal, toFormPath } from '../evaluate';
import {
  type AssemblyFormValues,
  BuilderContext,
  type BuilderContextValue,
  firstCountedLayer,
} from '../form';
import { mergeAssemblyEdits } from '../merge';
import { formatR, formatU } from '../units';
import { AttachmentsEditor } from './AttachmentsEditor';
import { SelectField, TextField } from './FormFields';
import { LayersEditor } from './LayersEditor';
import { describePath, ResultPanel, SheetSection } from './ResultPanel';

const HEAT_FLOW = [
  { value: 'horizontal', label: 'Horizontal (walls)' },
  { value: 'upward', label: 'Upward' },
  { value: 'downward', label: 'Downward' },
] as const;

interface AssemblyBuilderProps {
  projectId: string;
  /** The input the form starts from (the current revision, the sample, or blank). */
  initial: AssemblyInput;
  /** The saved assembly being revised; absent when creating one. */
  assembly?: Assembly;
  firmName?: string | null;
  firmMaterials?: readonly OrgMaterial[];
  bridgeValues?: readonly BridgeValue[];
  /** After the first save of a new assembly (the page moves to its address). */
  onCreated?: (assembly: Assembly) => void;
}

interface Conflict {
  theirs: Assembly;
  /** What this person tried to save. */
  mine: AssemblyInput;
}

/**
 * The assembly builder: a calculation sheet that reads top to bottom — build-up, attachments, method,
 * result, cautions — and recomputes in the browser on every keystroke with the shared engine. Saving
 * writes a new revision; a stale save never overwrites silently.
 */
export function AssemblyBuilder({
  projectId,
  initial,
  assembly,
  firmName = null,
  firmMaterials = [],
  bridgeValues = [],
  onCreated,
}: AssemblyBuilderProps) {
  const system = useUnitSystem();
  const qc = useQueryClient();
  const create = useCreateAssembly();
  const update = useUpdateAssembly();
  const form = useForm<AssemblyFormValues, unknown, AssemblyInput>({
    resolver: zodResolver(assemblyInputSchema, { error: assemblyErrorMap(system) }),
    defaultValues: initial,
  });
  const { control, handleSubmit, reset, register, formState } = form;
  const values = useWatch({ control }) as AssemblyFormValues;

  const [baseVersion, setBaseVersion] = useState(assembly?.version ?? 0);
  const [note, setNote] = useState('');
  const [conflict, setConflict] = useState<Conflict | null>(null);
  /** The saved input the edits started from (the base of a three-way merge after a conflict). */
  const [baseInput, setBaseInput] = useState<AssemblyInput>(initial);
  const [carried, setCarried] = useState<{ onto: number; bothChanged: string[] } | null>(null);
  const [saveProblem, setSaveProblem] = useState<string[] | null>(null);
  const [savedAs, setSavedAs] = useState<number | null>(null);
  const [server, setServer] = useState<{ snapshot: string; errors: Record<string, string> } | null>(null);
  const leaving = useRef(false);
  /** True from the moment a save is sent until its answer has been taken in. */
  const savingRef = useRef(false);
  const conflictRef = useRef<HTMLDivElement>(null);

  const thermalSnapshot = JSON.stringify(values.thermal);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the snapshot stands for values.thermal (deep)
  const evaluation = useMemo(() => evaluateThermal(values.thermal, system), [thermalSnapshot, system]);
  const serverErrors = server && server.snapshot === thermalSnapshot ? server.errors : {};
  const errors = { ...serverErrors, ...evaluation.errors };
  const result = evaluation.result;

  const layerRs = useMemo(() => {
    const map = new Map<number, number>();
    for (const s of result?.trace ?? []) {
      const m = /^thermal\.layer\.(\d+)\.R$/.exec(s.id);
      if (m) map.set(Number(m[1]), s.value);
    }
    return map;
  }, [result]);

  const counted = firstCountedLayer(values.thermal?.layers as { kind?: string; ventilation?: string }[]);
  const context: BuilderContextValue = {
    errors,
    readOnly: false,
    firmName,
    firmMaterials,
    bridgeValues,
    layerR: (i) => layerRs.get(i),
    disregarded: (i) => i < counted,
  };

  // Someone saved while this page was open: take their revision if nothing here has been edited.
  useEffect(() => {
    if (!assembly || conflict || savingRef.current || assembly.version <= baseVersion) return;
    if (!formState.isDirty) {
      reset(assembly.current.input);
      setBaseInput(assembly.current.input);
      setBaseVersion(assembly.version);
    }
  }, [assembly, baseVersion, conflict, formState.isDirty, reset]);
  const newerElsewhere =
    assembly && !conflict && !savingRef.current && assembly.version > baseVersion ? assembly : null;

  // Unsaved edits: ask before leaving the page (in-app links and the browser alike).
  const dirty = formState.isDirty || note.trim() !== '' || carried !== null;
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty &&
      !leaving.current &&
      (currentLocation.pathname !== nextLocation.pathname || currentLocation.search !== nextLocation.search),
  );
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const saving = create.isPending || update.isPending;

  const save = handleSubmit(
    async (input) => {
      setSaveProblem(null);
      setSavedAs(null);
      if (Object.keys(evaluation.errors).length > 0) {
        setSaveProblem(['The result cannot be computed yet: put right the values marked ✕ first.']);
        return;
      }
      savingRef.current = true;
      try {
        if (!assembly) {
          const created = await create.mutateAsync({ projectId, input });
          leaving.current = true;
          reset(input);
          onCreated?.(created);
          return;
        }
        const saved = await update.mutateAsync({
          assemblyId: assembly.id,
          version: baseVersion,
          note: note.trim(),
          input,
        });
        setBaseVersion(saved.version);
        setBaseInput(saved.current.input);
        setCarried(null);
        setNote('');
        reset(saved.current.input);
        setSavedAs(saved.revision);
      } catch (e) {
        const theirs = conflictingAssembly(e);
        if (theirs) {
          setConflict({ theirs, mine: input });
          requestAnimationFrame(() => conflictRef.current?.scrollIntoView({ block: 'center' }));
          return;
        }
        if (isApiRequestError(e) && e.fields) {
          const mapped: Record<string, string> = {};
          for (const [k, v] of Object.entries(e.fields)) mapped[toFormPath(k)] = v;
          setServer({ snapshot: thermalSnapshot, errors: mapped });
          const names = mapped.name ? [mapped.name] : [];
          setSaveProblem(['The server did not accept some values — see the fields marked ✕.', ...names]);
          return;
        }
        setSaveProblem([errorMessage(e)]);
      } finally {
        savingRef.current = false;
      }
    },
    (invalid) => {
      // Reasons on parts of the assembly this page does not edit (vapour, wind, joints, take-off data)
      // have no field here: name them rather than leave the person guessing.
      const elsewhere = Object.entries(invalid)
        .filter(([k]) => !['name', 'description', 'wallCategory', 'attachment', 'thermal'].includes(k))
        .map(([k, v]) => `${k}: ${String((v as { message?: unknown })?.message ?? 'not accepted')}`);
      setSaveProblem(['Some values need attention — see the fields marked ✕.', ...elsewhere]);
    },
  );

  function carryMineOver({ theirs, mine }: Conflict) {
    const { merged, bothChanged } = mergeAssemblyEdits(baseInput, mine, theirs.current.input);
    // Keep the loaded values as the defaults, so the page still counts as edited until it is saved.
    reset(merged, { keepDefaultValues: true });
    setBaseVersion(theirs.version);
    setBaseInput(theirs.current.input);
    setCarried({ onto: theirs.version, bothChanged });
    setConflict(null);
  }

  function loadTheirs(theirs: Assembly) {
    qc.setQueryData(assemblyKeys.detail(theirs.id), theirs);
    void qc.invalidateQueries({ queryKey: assemblyKeys.revisions(theirs.id) });
    reset(theirs.current.input);
    setBaseVersion(theirs.version);
    setBaseInput(theirs.current.input);
    setCarried(null);
    setConflict(null);
    setNote('');
  }

  const nextRevision = assembly ? baseVersion + 1 : 1;

  return (
    <FormProvider {...form}>
      <BuilderContext.Provider value={context}>
        <form onSubmit={save} noValidate aria-label="Assembly builder" className="flex flex-col gap-10 pb-4">
          <header className="flex flex-col gap-1">
            <p className="label-caps">
              {assembly
                ? `Assembly · revision ${assembly.revision} saved ${formatDateTime(assembly.current.createdAt)}${assembly.current.createdBy ? ` by ${assembly.current.createdBy}` : ''}`
                : 'New assembly · not saved yet'}
            </p>
            <h2 className="text-3xl">{values.name?.trim() || 'Untitled assembly'}</h2>
          </header>

          {newerElsewhere ? (
            <Notice
              tone="warning"
              title={`Revision ${newerElsewhere.revision} was saved by someone else while you were editing.`}
            >
              <p>
                Your edits are kept. When you save, you will be asked whether to carry them over or load
                theirs.
              </p>
            </Notice>
          ) : null}

          <SheetSection n={1} title="Build-up" id="buildup-heading">
            <div className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
              <TextField path="name" label="Name" required className="sm:col-span-2" maxLength={200} />
              <SelectField
                path="wallCategory"
                label="Wall category"
                options={WALL_CATEGORIES.map((c) => ({ value: c, label: WALL_CATEGORY_LABELS[c] }))}
              />
              <SelectField
                path="thermal.heatFlow"
                label="Heat-flow direction"
                options={HEAT_FLOW}
                hint="Sets the surface resistances (ISO 6946 Table 7)."
              />
              <Field label="Description" className="sm:col-span-2 lg:col-span-4">
                {(c) => <TextArea {...c} {...register('description')} rows={2} className="min-h-0 text-sm" />}
              </Field>
            </div>
            <LayersEditor />
          </SheetSection>

          <SheetSection n={2} title="Attachments" id="attachments-heading">
            <AttachmentsEditor />
          </SheetSection>

          <ResultPanel
            thermal={values.thermal as ThermalInput}
            girtOrientation={values.attachment?.girtOrientation ?? 'horizontal'}
            result={result}
            errors={errors}
            engineVersion={ENGINE_VERSION}
            resultNote={<span className="text-xs text-ink-muted">computed in your browser as you type</span>}
          />

          {conflict ? (
            <div ref={conflictRef}>
              <Notice tone="warning" title="Someone else saved this assembly first." live>
                <p>
                  Revision <span className="num">{conflict.theirs.revision}</span> was saved{' '}
                  {conflict.theirs.current.createdBy ? `by ${conflict.theirs.current.createdBy} ` : ''}at{' '}
                  <span className="num">{formatDateTime(conflict.theirs.current.createdAt)}</span>
                  {conflict.theirs.current.note ? ` (“${conflict.theirs.current.note}”)` : ''} while you were
                  editing revision <span className="num">{baseVersion}</span>. Nothing of yours has been
                  saved, and your edits are still on this page.
                </p>
                <table className="num my-1 text-sm">
                  <tbody>
                    <tr>
                      <th scope="row" className="pr-4 text-left font-sans font-normal">
                        Yours (not saved)
                      </th>
                      <td className="pr-4">{formatR(result?.Reff, system)}</td>
                      <td>{formatU(result?.Ueff, system)}</td>
                    </tr>
                    <tr>
                      <th scope="row" className="pr-4 text-left font-sans font-normal">
                        Theirs (rev. {conflict.theirs.revision})
                      </th>
                      <td className="pr-4">{formatR(conflict.theirs.Reff, system)}</td>
                      <td>{formatU(conflict.theirs.Ueff, system)}</td>
                    </tr>
                  </tbody>
                </table>
                <p>
                  <strong>Carry my changes over</strong> starts from revision {conflict.theirs.revision} and
                  puts back every value you changed; their other changes stay. Nothing is saved until you save
                  again. <strong>Load theirs</strong> replaces what is on this page with revision{' '}
                  {conflict.theirs.revision}.
                </p>
                <div className="flex flex-wrap gap-3 pt-1">
                  <Button variant="secondary" onClick={() => carryMineOver(conflict)}>
                    Carry my changes over
                  </Button>
                  <Button variant="secondary" onClick={() => loadTheirs(conflict.theirs)}>
                    Load theirs (discard my edits)
                  </Button>
                </div>
              </Notice>
            </div>
          ) : carried !== null ? (
            <Notice
              tone="info"
              title={`Your changes are now on top of revision ${carried.onto}. Check them, then save as revision ${carried.onto + 1}.`}
            >
              {carried.bothChanged.length > 0 ? (
                <p>
                  {`You both changed ${carried.bothChanged.length === 1 ? 'one value' : `${carried.bothChanged.length} values`}; yours ${carried.bothChanged.length === 1 ? 'is' : 'are'} kept: `}
                  {carried.bothChanged
                    .map((path) => describePath(path, values.thermal as ThermalInput))
                    .join('; ')}
                  .
                </p>
              ) : null}
            </Notice>
          ) : null}

          {blocker.state === 'blocked' ? (
            <Notice tone="warning" title="This assembly has edits that are not saved." live>
              <div className="flex flex-wrap gap-3 pt-1">
                <Button variant="secondary" onClick={() => blocker.reset?.()}>
                  Stay and keep editing
                </Button>
                <Button variant="danger" onClick={() => blocker.proceed?.()}>
                  Leave without saving
                </Button>
              </div>
            </Notice>
          ) : null}

          {saveProblem ? (
            <Notice tone="caution" title="Not saved." live>
              {saveProblem.map((m) => (
                <p key={m}>{m}</p>
              ))}
            </Notice>
          ) : null}

          <div className="sticky bottom-0 z-10 -mx-4 border-t-2 border-ink bg-paper px-4 py-3 sm:-mx-6 sm:px-6">
            <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
              <div className="min-w-52" aria-live="polite">
                <p className="label-caps">Effective, live</p>
                {result ? (
                  <p className="num text-lg" data-testid="live-Reff">
                    {formatR(result.Reff, system)}
                    <span className="ml-3 text-sm text-ink-muted">{formatU(result.Ueff, system)}</span>
                  </p>
                ) : (
                  <p className="text-sm text-caution">
                    <span aria-hidden="true">✕ </span>
                    {Object.keys(evaluation.errors).length === 1
                      ? 'One value needs attention'
                      : `${Object.keys(evaluation.errors).length} values need attention`}
                  </p>
                )}
              </div>
              {assembly ? (
                <Field
                  label="Revision note"
                  hint="What changed, and why (kept with the revision)."
                  className="min-w-64 flex-1"
                >
                  {(c) => (
                    <TextInput
                      {...c}
                      value={note}
                      maxLength={500}
                      onChange={(e) => setNote(e.target.value)}
                      placeholder="e.g. clip spacing to 600 mm per maker's layout"
                      className="py-1.5 text-sm"
                    />
                  )}
                </Field>
              ) : (
                <p className="flex-1 text-sm text-ink-muted">The first save creates revision 1.</p>
              )}
              <div className="flex flex-col items-end gap-1">
                <Button
                  type="submit"
                  variant="primary"
                  busy={saving}
                  busyLabel="Saving…"
                  disabled={conflict !== null || (assembly !== undefined && !dirty)}
                >
                  {assembly ? `Save as revision ${nextRevision}` : 'Create assembly'}
                </Button>
                {savedAs !== null && !dirty ? (
                  <p role="status" className="text-xs">
                    <span aria-hidden="true">✓ </span>Saved as revision {savedAs}.
                  </p>
                ) : assembly && !dirty ? (
                  <p className="text-xs text-ink-muted">No changes to save.</p>
                ) : null}
              </div>
            </div>
          </div>
        </form>
      </BuilderContext.Provider>
    </FormProvider>
  );
}
