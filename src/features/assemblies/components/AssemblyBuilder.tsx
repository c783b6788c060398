import { zodResolver } from '@hookform/resolvers/zod';
import type { ThermalInput } from '@shared/calc/thermal/schema';
import { firstKeptLayer } from '@shared/calc/thermal/thermal';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { formatR, formatU } from '@shared/format';
import {
  type Assembly,
  type AssemblyInput,
  assemblyInputSchema,
  type BridgeValue,
  type OrgMaterial,
  WALL_CATEGORIES,
  WALL_CATEGORY_LABELS,
} from '@shared/schemas/assembly';
import { useMemo } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { Field } from '../../../components/ui/Field';
import { COMPUTED_AS_YOU_TYPE } from '../../../components/ui/ResultSection';
import { staleProps } from '../../../components/ui/ResultSummary';
import { NewerRevisionNotice, RevisionSaveBar } from '../../../components/ui/RevisionSaveBar';
import { TextArea } from '../../../components/ui/TextInput';
import { useDeferredCalculation } from '../../../lib/deferred-calculation';
import { formatDateTime } from '../../../lib/format';
import { REVISION_SAVE_WORDS } from '../../../lib/revision-save-words';
import { useUnitSystem } from '../../../lib/unit-system';
import { useRevisionEditing } from '../../../lib/use-revision-editing';
import { useCreateAssembly } from '../api/create-assembly';
import { useAssemblyRevisionApi } from '../api/update-assembly';
import { assemblyErrorMap, evaluateThermal, toFormPath } from '../evaluate';
import { type AssemblyFormValues, BuilderContext, type BuilderContextValue } from '../form';
import { mergeAssemblyEdits } from '../merge';
import { SelectField, TextField } from './FormFields';
import { LayersEditor } from './LayersEditor';
import { ThermalSummary } from './ResultFigures';
import { describePath, PageSection, ResultPanel } from './ResultPanel';
import { ThermalBridgesEditor } from './ThermalBridgesEditor';

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
  saveBridgeValue?: BuilderContextValue['saveBridgeValue'];
  /** After the first save of a new assembly (the page moves to its address). */
  onCreated?: (assembly: Assembly) => void;
}

interface BuilderCarry {
  /** Form paths both changed (this person's value is kept). */
  bothChanged: string[];
}

/**
 * The assembly builder: a calculation page that reads top to bottom — build-up, thermal bridges, method,
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
  saveBridgeValue,
  onCreated,
}: AssemblyBuilderProps) {
  const system = useUnitSystem();
  const create = useCreateAssembly();
  const revisionApi = useAssemblyRevisionApi();
  const form = useForm<AssemblyFormValues, unknown, AssemblyInput>({
    resolver: zodResolver(assemblyInputSchema, { error: assemblyErrorMap(system) }),
    defaultValues: initial,
  });
  const { control, handleSubmit, reset, register, formState } = form;
  const values = useWatch({ control }) as AssemblyFormValues;

  // Every figure on the page (summary, result, charts, the bar) comes from this one, possibly deferred, result.
  const { result: evaluation, stale } = useDeferredCalculation(
    values.thermal,
    (thermal) => evaluateThermal(thermal, system),
    [system],
  );

  // Saving writes a new revision (the first save creates the assembly); a stale save never overwrites silently.
  const editing = useRevisionEditing<AssemblyFormValues, BuilderCarry, Assembly | undefined>({
    ...revisionApi,
    assembly,
    values,
    isEdited: () => formState.isDirty,
    // Carried-over values and undo/redo keep the loaded ones as the defaults, so the page counts as edited until saved.
    reset: (next, why) =>
      reset(next, why === 'carried' || why === 'history' ? { keepDefaultValues: true } : undefined),
    formValues: (input) => input,
    toInput: (v, _base, input) =>
      Object.keys(evaluateThermal(v.thermal, system).errors).length > 0 || !input
        ? { problem: ['The result cannot be computed yet: put right the values marked ✕ first.'] }
        : { input },
    carryOver: ({ base, mine, theirs }) => {
      const { merged, bothChanged } = mergeAssemblyEdits(base.current.input, mine, theirs.current.input);
      return { values: merged, detail: { bothChanged } };
    },
    fieldPath: toFormPath,
    notAccepted: (_unmapped, mapped) => [
      'The server did not accept some values — see the fields marked ✕.',
      ...(mapped.name ? [mapped.name] : []),
    ],
    snapshot: (v) => v.thermal,
    create: (input) => create.mutateAsync({ projectId, input }),
    onCreated,
  });
  const { conflict, carried } = editing;
  const errors = { ...editing.serverErrors, ...evaluation.errors };
  const result = evaluation.result;

  const layerRs = useMemo(() => {
    const map = new Map<number, number>();
    for (const s of result?.trace ?? []) {
      const m = /^thermal\.layer\.(\d+)\.R$/.exec(s.id);
      if (m) map.set(Number(m[1]), s.value);
    }
    return map;
  }, [result]);

  const counted = firstKeptLayer(values.thermal?.layers as { kind?: string; ventilation?: string }[]);
  const context: BuilderContextValue = {
    errors,
    readOnly: false,
    firmName,
    firmMaterials,
    bridgeValues,
    ...(saveBridgeValue ? { saveBridgeValue } : {}),
    layerR: (i) => layerRs.get(i),
    disregarded: (i) => i < counted,
    markRemoval: editing.history.markRemoval,
  };

  const save = handleSubmit(
    (input) => editing.saveNow(input),
    (invalid) => {
      // Reasons on parts of the assembly this page does not edit (vapour, wind, joints, take-off data)
      // have no field here: name them rather than leave the person guessing.
      const elsewhere = Object.entries(invalid)
        .filter(([k]) => !['name', 'description', 'wallCategory', 'attachment', 'thermal'].includes(k))
        .map(([k, v]) => `${k}: ${String((v as { message?: unknown })?.message ?? 'not accepted')}`);
      editing.setProblem(['Some values need attention — see the fields marked ✕.', ...elsewhere]);
    },
  );

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

          <NewerRevisionNotice newer={editing.newerElsewhere} yours="edits" />

          <ThermalSummary result={result} problems={Object.keys(evaluation.errors).length} stale={stale} />

          <PageSection n={1} title="Build-up" id="buildup-heading">
            <div className="grid gap-x-6 gap-y-4 sm:grid-cols-2 lg:grid-cols-4">
              <TextField path="name" label="Name" required className="sm:col-span-2" maxLength={200} />
              <SelectField
                path="wallCategory"
                label="Wall category"
                required
                placeholder="Choose…"
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
          </PageSection>

          <PageSection n={2} title="Thermal bridges" id="bridges-heading">
            <ThermalBridgesEditor />
          </PageSection>

          <ResultPanel
            thermal={values.thermal as ThermalInput}
            girtOrientation={values.attachment?.girtOrientation ?? 'horizontal'}
            result={result}
            errors={errors}
            engineVersion={ENGINE_VERSION}
            stale={stale}
            resultNote={COMPUTED_AS_YOU_TYPE}
          />

          <RevisionSaveBar
            editing={editing}
            words={REVISION_SAVE_WORDS.builder}
            inForm
            showNewer={false}
            scrollToConflict
            className="contents"
            conflictDetail={
              conflict ? (
                <>
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
                    puts back every value you changed; their other changes stay. Nothing is saved until you
                    save again. <strong>Load theirs</strong> replaces what is on this page with revision{' '}
                    {conflict.theirs.revision}.
                  </p>
                </>
              ) : null
            }
            carriedDetail={
              carried && carried.detail.bothChanged.length > 0 ? (
                <p>
                  {`You both changed ${carried.detail.bothChanged.length === 1 ? 'one value' : `${carried.detail.bothChanged.length} values`}; yours ${carried.detail.bothChanged.length === 1 ? 'is' : 'are'} kept: `}
                  {carried.detail.bothChanged
                    .map((path) => describePath(path, values.thermal as ThermalInput))
                    .join('; ')}
                  .
                </p>
              ) : null
            }
            live={
              <div aria-live="polite" {...staleProps(stale, 'min-w-52')}>
                <p className="label-caps">Effective, live</p>
                {result ? (
                  <p className="num text-lg" data-testid="live-Reff">
                    {formatR(result.Reff, system)}
                    <span className="ml-3 text-sm text-ink-muted max-sm:hidden">
                      {formatU(result.Ueff, system)}
                    </span>
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
            }
          />
        </form>
      </BuilderContext.Provider>
    </FormProvider>
  );
}
