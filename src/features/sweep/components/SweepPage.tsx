import { CalcInputError } from '@shared/calc/errors';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { runChecks } from '@shared/checks/runner';
import type { Assembly } from '@shared/schemas/assembly';
import type { CriteriaSet, CriteriaSetSummary } from '@shared/schemas/criteria';
import type { Project } from '@shared/schemas/project';
import type { SavedSweep } from '@shared/schemas/sweeps';
import { checkCosts } from '@shared/sweep/rank';
import type { SweepParameter, SweepParameterKind } from '@shared/sweep/schema';
import { applyVariant, planSweep, type SweepPlan } from '@shared/sweep/sweep';
import { useQueryClient } from '@tanstack/react-query';
import { startTransition, useCallback, useDeferredValue, useMemo, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Cautions } from '../../../components/ui/Cautions';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { PageSection } from '../../../components/ui/PageSection';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { revisionQueryOptions } from '../../assemblies/api/get-revision';
import { criteriaSetQueryOptions } from '../../criteria/api/get-criteria-set';
import { useMe } from '../../me/api/get-me';
import { getSavedSweep } from '../api/get-saved-sweeps';
import { useSweepCosts } from '../api/sweep-costs';
import { type CostDraft, costsOf, draftOfCosts, emptyCosts } from '../costs';
import {
  type FieldProblem,
  KIND_LABELS,
  NO_LIBRARY,
  newDraft,
  type ParameterDraft,
  problemBox,
  SWEEP_BROWSER_CAP,
  type SweepLibrary,
  targetsFor,
  validateSweep,
} from '../draft';
import { drawnChecks, type Slice, sliceVariants, valueText } from '../present';
import { draftOf } from '../saved';
import { useSweepRun } from '../use-sweep-run';
import { CostRanking } from './CostRanking';
import { MakeAssembly } from './MakeAssembly';
import { ParameterEditor } from './ParameterEditor';
import { PassFailMap } from './PassFailMap';
import { SavedSweeps, type ToSave } from './SavedSweeps';
import { SweepChart } from './SweepChart';
import { resultText } from './SweepFacts';
import { SweepProgress } from './SweepProgress';
import { SweepResultsTable } from './SweepResultsTable';
import { SweepSection } from './SweepSection';

/** What a started sweep ran on: kept with its results, so later edits of the form or the assembly do not mix in. */
interface Ran {
  plan: SweepPlan;
  parameters: SweepParameter[];
  assembly: Assembly;
  table: CriteriaSetSummary;
  rows: CriteriaSet['rows'];
}

/** The first parameters: the thickest insulation layer and the clip spacing, where the assembly has them. */
function firstDrafts(input: Assembly['current']['input']): ParameterDraft[] {
  const layers = targetsFor(input, 'insulationThickness').map((t) => t.index ?? 0);
  const thickest = layers.reduce<number | null>((best, i) => {
    const l = input.thermal.layers[i];
    const b = best === null ? undefined : input.thermal.layers[best];
    return l?.kind === 'homogeneous' && (!b || !('thickness' in b) || l.thickness > (b.thickness ?? 0))
      ? i
      : best;
  }, null);
  return [
    ...(layers.length > 0 ? [newDraft(input, 'insulationThickness', thickest ?? layers[0])] : []),
    ...(targetsFor(input, 'clipSpacing').length > 0 ? [newDraft(input, 'clipSpacing')] : []),
  ];
}

/**
 * The sweep page of an assembly: one to three parameters against a code table version, every variant through
 * the compliance runner in a pool of Web Workers (progress, time left, cancel; results streaming in), then the
 * results table, a chart with the limit, the pass/fail map, the cheapest passing variants and "Make this an
 * assembly".
 */
export function SweepPage({
  project,
  assembly,
  sets,
  mayWrite,
  firmLibrary = NO_LIBRARY,
}: {
  project: Project;
  assembly: Assembly;
  sets: CriteriaSetSummary[];
  mayWrite: boolean;
  /** The firm's materials and χ values the form offers (insulation products, clip types). */
  firmLibrary?: SweepLibrary;
}) {
  const system = useUnitSystem();
  const input = assembly.current.input;
  const [drafts, setDrafts] = useState<ParameterDraft[]>(() => firstDrafts(input));
  const [setId, setSetId] = useState(sets[0]?.id ?? '');
  const [problems, setProblems] = useState<FieldProblem[]>([]);
  const [loadError, setLoadError] = useState<string | null>(null);
  const [preparing, setPreparing] = useState(false);
  const [ran, setRan] = useState<Ran | null>(null);
  const [slice, setSlice] = useState<Slice>({ across: 0, lines: null, held: [] });
  const [checkId, setCheckId] = useState('');
  const [costs, setCosts] = useState<CostDraft>(emptyCosts);
  const [chosen, setChosen] = useState<number | null>(null);
  const [reopened, setReopened] = useState<SavedSweep | null>(null);
  const sweep = useSweepRun();
  const qc = useQueryClient();
  const me = useMe();
  const firmRole = me.data?.organisations.find((o) => o.id === project.organisationId)?.role ?? null;
  const firmCosts = useSweepCosts(firmRole ? project.organisationId : undefined);
  const library = {
    orgId: project.organisationId,
    firmName: project.organisationName,
    role: firmRole,
    entries: firmCosts.data,
  };
  const choose = useCallback((i: number) => setChosen(i), []);
  // The results redraw at React's lower priority: the page keeps answering while 10 000 variants stream in.
  const variants = useDeferredValue(sweep.variants);

  /** Starts the workers on a planned sweep of `on` (the assembly at one revision) against one code table version. */
  const launch = (on: Assembly, parameters: SweepParameter[], plan: SweepPlan, set: CriteriaSet) => {
    const sizes = plan.axes.map((x) => x.values.length);
    // The results section's first draw (the chart, the table) yields to the browser: the workers start at once.
    startTransition(() => {
      setRan({ plan, parameters, assembly: on, table: set, rows: set.rows });
      setSlice({ across: 0, lines: sizes.length > 1 ? 1 : null, held: sizes.map(() => 0) });
      setChosen(null);
    });
    sweep.start({ assembly: on.current.input, project, rows: set.rows, parameters }, plan);
  };

  const start = async () => {
    const v = validateSweep(input, drafts, system, SWEEP_BROWSER_CAP, firmLibrary);
    const table = sets.find((s) => s.id === setId);
    if (!v.ok) {
      setProblems(v.problems);
      return;
    }
    setProblems([]);
    if (!table) {
      setProblems([{ field: 'criteriaSetId', reason: 'choose a code table' }]);
      return;
    }
    setPreparing(true);
    setLoadError(null);
    try {
      launch(assembly, v.parameters, v.plan, await qc.fetchQuery(criteriaSetQueryOptions(table.id)));
      setReopened(null);
    } catch (e) {
      setLoadError(errorMessage(e));
    } finally {
      setPreparing(false);
    }
  };

  /**
   * A saved sweep back on the page: its parameters, code table version and costs in the form, and its variants
   * run again here on the revision and code table version it ran against (the same engine, the same numbers).
   */
  const reopen = async (sweepId: string) => {
    setPreparing(true);
    setLoadError(null);
    try {
      const saved = await getSavedSweep(sweepId);
      const on =
        saved.assemblyRevision === assembly.revision
          ? assembly
          : {
              ...assembly,
              revision: saved.assemblyRevision,
              current: await qc.fetchQuery(revisionQueryOptions(assembly.id, saved.assemblyRevision)),
            };
      const set = await qc.fetchQuery(criteriaSetQueryOptions(saved.criteriaSetId));
      setDrafts(saved.parameters.map((p) => draftOf(on.current.input, p, system)));
      if (sets.some((x) => x.id === saved.criteriaSetId)) setSetId(saved.criteriaSetId);
      setCosts(draftOfCosts(saved.costs, system));
      setProblems([]);
      setReopened(saved);
      launch(on, saved.parameters, planSweep(on.current.input, saved.parameters, SWEEP_BROWSER_CAP), set);
    } catch (e) {
      setLoadError(
        e instanceof CalcInputError
          ? `The saved sweep cannot run again in this browser (${e.reason}); its summary is in the list below.`
          : errorMessage(e),
      );
    } finally {
      setPreparing(false);
    }
  };

  const base = useMemo(
    () => (ran ? runChecks(ran.assembly.current.input, project, ran.rows) : null),
    [ran, project],
  );
  const drawn = useMemo(() => (base ? drawnChecks(base, system) : []), [base, system]);
  const check = drawn.find((c) => c.id === checkId) ?? drawn[0];
  const byIndex = useMemo(() => new Map(variants.map((v) => [v.index, v])), [variants]);
  const governingLabels = useMemo(() => {
    const m = new Map<string, string>();
    for (const v of variants)
      if (v.governing && !m.has(v.governing.id)) m.set(v.governing.id, v.governing.label);
    return m;
  }, [variants]);
  // Kept between renders: the chart, map and table redraw only when the results or the view change (D-032).
  const kinds = useMemo(() => (ran ? ran.plan.axes.map((x) => x.kind) : []), [ran]);
  const values = useMemo(() => (ran ? ran.plan.axes.map((x) => [...x.values]) : []), [ran]);
  const grid = useMemo(
    () =>
      ran
        ? sliceVariants(
            values.map((v) => v.length),
            slice,
            byIndex,
          )
        : [],
    [ran, values, slice, byIndex],
  );
  const drawnSlice = useMemo(
    () => ({ grid, kinds, values, across: slice.across, lines: slice.lines, system }),
    [grid, kinds, values, slice, system],
  );
  const numericAxes = values.flatMap((v, i) => (v.every((x) => typeof x === 'number') ? [i] : []));
  const state = sweep.state;
  const running = state.status === 'running';
  const chosenVariant = chosen === null ? undefined : byIndex.get(chosen);
  const describe =
    ran && chosenVariant
      ? `sweep of ${kinds.map((k) => KIND_LABELS[k].toLowerCase()).join(' × ')} against “${ran.table.name}” version ${ran.table.version} (revision ${ran.assembly.revision}): variant ${chosenVariant.index + 1} of ${ran.plan.count} — ${chosenVariant.values.map((v, i) => `${KIND_LABELS[kinds[i]!].toLowerCase()} ${valueText(kinds[i]!, v, system)}`).join(', ')}`
      : '';

  const update = (i: number, d: ParameterDraft) => setDrafts(drafts.map((x, j) => (j === i ? d : x)));
  const otherKinds = (Object.keys(KIND_LABELS) as SweepParameterKind[]).filter(
    (k) => targetsFor(input, k).length > 0,
  );
  const general = problems.filter((p) => problemBox(p.field).parameter === null);
  // The costs go with a saved sweep only when they price everything it varies (else the server refuses them).
  const priced = (() => {
    if (!ran) return undefined;
    const c = costsOf(costs, system);
    try {
      checkCosts(ran.plan, ran.assembly.current.input, c);
      return c;
    } catch (e) {
      if (e instanceof CalcInputError) return undefined;
      throw e;
    }
  })();
  const toSave: ToSave = !ran
    ? { reason: 'Run a sweep to save it here.' }
    : state.status !== 'finished'
      ? { reason: 'A sweep can be saved once it has finished.' }
      : ran.assembly.revision !== assembly.revision
        ? {
            reason: `This sweep ran on revision ${ran.assembly.revision}; the assembly is now at revision ${assembly.revision}. Run it again to save it.`,
          }
        : {
            body: {
              name: '',
              criteriaSetId: ran.table.id,
              parameters: ran.parameters,
              ...(priced ? { costs: priced } : {}),
            },
          };

  return (
    <>
      <title>{`Sweep · ${assembly.name} · Skinwright`}</title>
      <h2 className="border-b border-ink pb-2 text-2xl">Sweep of “{assembly.name}”</h2>
      <p className="max-w-prose text-sm text-ink-muted">
        Vary one to three parameters of revision {assembly.revision} and check every combination — thermal,
        moisture, wind attachment and sealant joints — against one version of a code table, as a check run
        would. The work runs in this browser; nothing is saved until you save the sweep (the server runs it
        again and keeps a summary) or make a variant an assembly.
      </p>

      <PageSection n={1} title="What varies" id="sweep-inputs">
        <form
          className="flex flex-col gap-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            void start();
          }}
        >
          <Field
            label="Code table"
            className="min-w-0 max-w-xl"
            error={general.find((p) => p.field === 'criteriaSetId')?.reason}
          >
            {(c) => (
              <Select {...c} value={setId} onChange={(e) => setSetId(e.target.value)}>
                {sets.length === 0 ? <option value="">— no code table for this project —</option> : null}
                {sets.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.organisationName}: {s.name} — version {s.version}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          {drafts.map((d, i) => (
            <ParameterEditor
              // biome-ignore lint/suspicious/noArrayIndexKey: parameters are numbered by their place
              key={i}
              n={i + 1}
              draft={d}
              assembly={input}
              system={system}
              problems={problems.filter((p) => problemBox(p.field).parameter === i)}
              library={firmLibrary}
              onChange={(next) => update(i, next)}
              onKind={(kind) => update(i, newDraft(input, kind))}
              onRemove={drafts.length > 1 ? () => setDrafts(drafts.filter((_, j) => j !== i)) : undefined}
            />
          ))}
          {drafts.length < 3 ? (
            <Button
              className="self-start"
              onClick={() =>
                setDrafts([
                  ...drafts,
                  newDraft(
                    input,
                    otherKinds.find((k) => !drafts.some((d) => d.kind === k)) ?? 'insulationThickness',
                  ),
                ])
              }
            >
              Add a parameter
            </Button>
          ) : null}
          {general
            .filter((p) => p.field !== 'criteriaSetId')
            .map((p) => (
              <Notice
                key={p.field}
                tone="caution"
                title={p.reason.charAt(0).toUpperCase() + p.reason.slice(1)}
                live
              />
            ))}
          {problems.length > 0 && general.length === 0 ? (
            <Notice tone="caution" title="Nothing was run: correct the marked boxes." live />
          ) : null}
          {loadError ? <Notice tone="caution" title={loadError} live /> : null}
          <div className="flex flex-wrap items-center gap-3">
            <Button
              type="submit"
              variant="primary"
              busy={preparing}
              busyLabel="Preparing…"
              disabled={running}
            >
              Run the sweep
            </Button>
            <span className="text-sm text-ink-muted">
              At most {SWEEP_BROWSER_CAP.toLocaleString('en-GB')} variants.
            </span>
          </div>
        </form>
      </PageSection>

      {ran ? (
        <PageSection n={2} title="Results" id="sweep-results">
          <div className="flex flex-col gap-2" aria-live="polite">
            {state.status === 'running' ? (
              <SweepProgress progress={sweep.progress} onCancel={sweep.cancel} />
            ) : state.status === 'finished' ? (
              <p className="text-sm" data-testid="sweep-finished">
                {state.total.toLocaleString('en-GB')} variants checked in {(state.ms / 1000).toFixed(2)} s
                against “{ran.table.name}” version {ran.table.version}, revision {ran.assembly.revision}.
              </p>
            ) : state.status === 'cancelled' ? (
              <Notice
                tone="warning"
                title={`Cancelled after ${state.done} of ${state.total} variants: the results below are partial.`}
              />
            ) : state.status === 'refused' ? (
              <Notice tone="caution" title={`${state.field}: ${state.reason}`} live />
            ) : null}
            {reopened ? (
              <p className="text-sm" data-testid="reopened-sweep">
                Reopened the saved sweep “{reopened.name}” ({formatDateTime(reopened.createdAt)}
                {reopened.createdBy ? ` by ${reopened.createdBy}` : ''}); the server found{' '}
                {resultText(
                  {
                    count: reopened.summary.count,
                    verdicts: reopened.summary.verdicts,
                    cheapest: reopened.summary.ranking?.top[0] ?? null,
                  },
                  system,
                )}
                .
              </p>
            ) : null}
            {ran.assembly.revision !== assembly.revision ? (
              <Notice
                tone="warning"
                title={`The assembly has changed since this sweep ran (revision ${ran.assembly.revision}, now ${assembly.revision}).`}
              />
            ) : null}
          </div>

          {check && numericAxes.length > 0 ? (
            <SweepSection id="sweep-chart-heading" title="Chart and pass/fail map">
              <div className="flex flex-wrap gap-3">
                <Field label="Figure" className="min-w-48">
                  {(c) => (
                    <Select {...c} value={check.id} onChange={(e) => setCheckId(e.target.value)}>
                      {drawn.map((d) => (
                        <option key={d.id} value={d.id}>
                          {d.label}
                        </option>
                      ))}
                    </Select>
                  )}
                </Field>
                <Field label="Across" className="min-w-44">
                  {(c) => (
                    <Select
                      {...c}
                      value={slice.across}
                      onChange={(e) => {
                        const across = Number(e.target.value);
                        setSlice({ ...slice, across, lines: slice.lines === across ? null : slice.lines });
                      }}
                    >
                      {numericAxes.map((i) => (
                        <option key={i} value={i}>
                          {KIND_LABELS[kinds[i]!]}
                        </option>
                      ))}
                    </Select>
                  )}
                </Field>
                {kinds.length > 1 ? (
                  <Field label="One line per" className="min-w-44">
                    {(c) => (
                      <Select
                        {...c}
                        value={slice.lines ?? ''}
                        onChange={(e) =>
                          setSlice({ ...slice, lines: e.target.value === '' ? null : Number(e.target.value) })
                        }
                      >
                        <option value="">— one line —</option>
                        {kinds.map((k, i) =>
                          i === slice.across ? null : (
                            <option key={k} value={i}>
                              {KIND_LABELS[k]}
                            </option>
                          ),
                        )}
                      </Select>
                    )}
                  </Field>
                ) : null}
                {kinds.map((k, i) =>
                  i === slice.across || i === slice.lines ? null : (
                    <Field key={k} label={`${KIND_LABELS[k]} held at`} className="min-w-40">
                      {(c) => (
                        <Select
                          {...c}
                          value={slice.held[i] ?? 0}
                          onChange={(e) =>
                            setSlice({
                              ...slice,
                              held: slice.held.map((h, j) => (j === i ? Number(e.target.value) : h)),
                            })
                          }
                        >
                          {values[i]!.map((v, j) => (
                            <option key={String(v)} value={j}>
                              {valueText(k, v, system)}
                            </option>
                          ))}
                        </Select>
                      )}
                    </Field>
                  ),
                )}
              </div>
              {numericAxes.includes(slice.across) ? <SweepChart slice={drawnSlice} check={check} /> : null}
              <PassFailMap slice={drawnSlice} />
            </SweepSection>
          ) : null}

          <SweepSection id="sweep-cost-heading" title="Leanest passing variants: cost, thickness or weight">
            <CostRanking
              plan={ran.plan}
              assembly={ran.assembly.current.input}
              variants={variants}
              draft={costs}
              onDraft={setCosts}
              system={system}
              chosen={chosen}
              onChoose={choose}
              library={library}
            />
          </SweepSection>

          <SweepSection id="sweep-table-heading" title="Every variant">
            <SweepResultsTable
              variants={variants}
              kinds={kinds}
              checks={drawn}
              labels={governingLabels}
              system={system}
              chosen={chosen}
              onChoose={choose}
            />
          </SweepSection>
        </PageSection>
      ) : null}

      {ran && chosenVariant ? (
        <PageSection n={3} title="Make this an assembly" id="sweep-make">
          <p className="text-sm">
            Variant {chosenVariant.index + 1}:{' '}
            {chosenVariant.values
              .map((v, i) => `${KIND_LABELS[kinds[i]!]} ${valueText(kinds[i]!, v, system)}`)
              .join(' · ')}
            .
          </p>
          {mayWrite ? (
            <MakeAssembly
              assembly={assembly}
              input={applyVariant(ran.plan, ran.assembly.current.input, chosenVariant.values)}
              describe={describe}
              sweptRevision={ran.assembly.revision}
            />
          ) : (
            <p className="text-sm text-ink-muted">Your role on this project does not edit assemblies.</p>
          )}
        </PageSection>
      ) : null}

      <PageSection n={ran && chosenVariant ? 4 : ran ? 3 : 2} title="Saved sweeps" id="sweep-saved">
        <SavedSweeps
          assembly={assembly}
          mayWrite={mayWrite}
          system={system}
          toSave={toSave}
          reopened={reopened?.id ?? null}
          onReopen={(id) => void reopen(id)}
        />
      </PageSection>

      <Cautions
        engineVersion={ENGINE_VERSION}
        items={[
          'A sweep screens variants; it is not a compliance sheet. Save the chosen variant as an assembly and run its checks to issue one.',
          'Girt and clip spacings change the wind attachment checks as well as the heat loss: the engineer of record confirms the attachment of the variant built.',
          'The bridges at the design spacing follow a spacing varied here; χ and ψ themselves stay as entered — a different clip or girt may need its own tested value.',
        ]}
      />
    </>
  );
}
