import { ENGINE_VERSION } from '@shared/calc/trace';
import { runChecks } from '@shared/checks/runner';
import type { Assembly } from '@shared/schemas/assembly';
import type { CriteriaSetSummary } from '@shared/schemas/criteria';
import type { Project } from '@shared/schemas/project';
import type { SweepParameter, SweepParameterKind } from '@shared/sweep/schema';
import { applyVariant, type SweepPlan } from '@shared/sweep/sweep';
import { useCallback, useDeferredValue, useMemo, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Cautions } from '../../../components/ui/Cautions';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { PageSection } from '../../../components/ui/PageSection';
import { Select } from '../../../components/ui/Select';
import { errorMessage } from '../../../lib/api';
import { useUnitSystem } from '../../../lib/unit-system';
import { getCriteriaSet } from '../../criteria/api/get-criteria-set';
import {
  type FieldProblem,
  KIND_LABELS,
  newDraft,
  type ParameterDraft,
  problemBox,
  SWEEP_BROWSER_CAP,
  targetsFor,
  validateSweep,
} from '../draft';
import { drawnChecks, type Slice, sliceVariants, valueText } from '../present';
import { useSweepRun } from '../use-sweep-run';
import { type CostDraft, CostRanking, emptyCosts } from './CostRanking';
import { MakeAssembly } from './MakeAssembly';
import { ParameterEditor } from './ParameterEditor';
import { PassFailMap } from './PassFailMap';
import { SweepChart } from './SweepChart';
import { SweepResultsTable } from './SweepResultsTable';

/** What a started sweep ran on: kept with its results, so later edits of the form or the assembly do not mix in. */
interface Ran {
  plan: SweepPlan;
  parameters: SweepParameter[];
  assembly: Assembly;
  table: CriteriaSetSummary;
  rows: Awaited<ReturnType<typeof getCriteriaSet>>['rows'];
}

const seconds = (s: number) =>
  s < 1 ? 'under a second' : s < 90 ? `about ${Math.round(s)} s` : `about ${Math.round(s / 60)} min`;

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
}: {
  project: Project;
  assembly: Assembly;
  sets: CriteriaSetSummary[];
  mayWrite: boolean;
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
  const sweep = useSweepRun();
  const choose = useCallback((i: number) => setChosen(i), []);
  // The results redraw at React's lower priority: the page keeps answering while 10 000 variants stream in.
  const variants = useDeferredValue(sweep.variants);

  const start = async () => {
    const v = validateSweep(input, drafts, system, SWEEP_BROWSER_CAP);
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
      const { rows } = await getCriteriaSet(table.id);
      const kinds = v.plan.axes.map((x) => x.values.length);
      setRan({ plan: v.plan, parameters: v.parameters, assembly, table, rows });
      setSlice({ across: 0, lines: kinds.length > 1 ? 1 : null, held: kinds.map(() => 0) });
      setChosen(null);
      sweep.start({ assembly: input, project, rows, parameters: v.parameters }, v.plan);
    } catch (e) {
      setLoadError(errorMessage(e));
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
  const kinds = ran ? ran.plan.axes.map((x) => x.kind) : [];
  const values = ran ? ran.plan.axes.map((x) => [...x.values]) : [];
  const sizes = values.map((v) => v.length);
  const grid = ran ? sliceVariants(sizes, slice, byIndex) : [];
  const numericAxes = kinds.flatMap((k, i) => (k === 'sealantClass' ? [] : [i]));
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

  return (
    <>
      <title>{`Sweep · ${assembly.name} · Skinwright`}</title>
      <h2 className="border-b border-ink pb-2 text-2xl">Sweep of “{assembly.name}”</h2>
      <p className="max-w-prose text-sm text-ink-muted">
        Vary one to three parameters of revision {assembly.revision} and check every combination — thermal,
        moisture, wind attachment and sealant joints — against one version of a code table, as a check run
        would. The work runs in this browser; nothing is saved until you make a variant an assembly.
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
              <>
                <progress
                  className="h-3 w-full accent-ink"
                  max={state.total}
                  value={state.done}
                  aria-label="Variants checked"
                />
                <div className="flex flex-wrap items-center gap-3 text-sm">
                  <span className="num">
                    {state.done.toLocaleString('en-GB')} of {state.total.toLocaleString('en-GB')} variants
                    checked
                  </span>
                  <span>
                    {state.done === 0
                      ? 'estimating the time left…'
                      : `${seconds(((state.total - state.done) * (state.now - state.startedAt)) / state.done / 1000)} left`}
                  </span>
                  <Button onClick={sweep.cancel}>Cancel</Button>
                </div>
              </>
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
            {ran.assembly.revision !== assembly.revision ? (
              <Notice
                tone="warning"
                title={`The assembly has changed since this sweep ran (revision ${ran.assembly.revision}, now ${assembly.revision}).`}
              />
            ) : null}
          </div>

          {check && numericAxes.length > 0 ? (
            <section aria-labelledby="sweep-chart-heading" className="flex flex-col gap-3">
              <h4 id="sweep-chart-heading" className="font-semibold">
                Chart and pass/fail map
              </h4>
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
              {numericAxes.includes(slice.across) ? (
                <SweepChart
                  grid={grid}
                  kinds={kinds}
                  values={values}
                  across={slice.across}
                  lines={slice.lines}
                  check={check}
                  system={system}
                />
              ) : null}
              <PassFailMap
                grid={grid}
                kinds={kinds}
                values={values}
                across={slice.across}
                lines={slice.lines}
                system={system}
              />
            </section>
          ) : null}

          <section aria-labelledby="sweep-cost-heading" className="flex flex-col gap-3">
            <h4 id="sweep-cost-heading" className="font-semibold">
              Cheapest passing variants
            </h4>
            <CostRanking
              plan={ran.plan}
              assembly={ran.assembly.current.input}
              variants={variants}
              draft={costs}
              onDraft={setCosts}
              system={system}
              chosen={chosen}
              onChoose={choose}
            />
          </section>

          <section aria-labelledby="sweep-table-heading" className="flex flex-col gap-3">
            <h4 id="sweep-table-heading" className="font-semibold">
              Every variant
            </h4>
            <SweepResultsTable
              variants={variants}
              kinds={kinds}
              checks={drawn}
              labels={governingLabels}
              system={system}
              chosen={chosen}
              onChoose={choose}
            />
          </section>
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
