import { CalcInputError } from '../calc/errors';
import type { TraceStep } from '../calc/trace';
import { engineMessage, missingText, storedMessageText } from '../format/messages';
import type { AssemblyInput } from '../schemas/assembly';
import { WALL_CATEGORY_LABELS } from '../schemas/assembly';
import { applicableRows, type CriteriaRowInput, criterionSpec, type MetricKey, zoneLabel } from './criteria';
import type { ProjectForChecks } from './inputs';
import { type CheckModule, compare, type ModuleCheck } from './module';
import { CHECK_MODULES } from './modules';
import { type Check, type CheckReport, type MetricOutcome, type ModuleOutcome, verdictOf } from './report';

/*
 * The compliance runner: every registered module builds its input from the assembly and its project, runs,
 * reports the metrics a code table can demand and its own verdicts; then each applicable row of the code
 * table is compared with its metric. Pure and deterministic: the same assembly, project and rows give the
 * same report, byte for byte. A criterion that cannot be evaluated is reported as such — never passed.
 */

/** Cautions printed with every run, whatever the result. */
export const RUN_CAUTIONS: readonly string[] = [
  'The criteria are the values the firm entered for its adopted code, edition and amendments; Skinwright does not supply or verify them. Check each row against the adopted code before relying on the result.',
  'Skinwright is an aid to — never a substitute for — the licensed professional of record and the local code official.',
];

interface ModuleRun {
  module: CheckModule;
  outcome: ModuleOutcome;
  metrics: Partial<Record<MetricKey, MetricOutcome>>;
  verdicts: ModuleCheck[];
  trace: TraceStep[];
  cautions: string[];
}

/** Why a module gave no result, in plain words (shared/format words the messages). */
function whyNot(run: ModuleRun): string {
  const o = run.outcome;
  if (o.status === 'missing') return missingText(o.missing);
  return `the ${run.module.label.toLowerCase()} refused the input (${o.error === null ? '' : storedMessageText(o.error)})`;
}

function runModule(module: CheckModule, assembly: AssemblyInput, project: ProjectForChecks): ModuleRun {
  const base = { id: module.id, label: module.label };
  const built = module.build(assembly, project);
  if (built.status === 'missing')
    return {
      module,
      outcome: { ...base, status: 'missing', missing: built.missing, error: null, result: null },
      metrics: {},
      verdicts: [],
      trace: [],
      cautions: [],
    };
  let result: unknown;
  try {
    result = module.run(built.input);
  } catch (e) {
    if (!(e instanceof CalcInputError)) throw e;
    return {
      module,
      outcome: {
        ...base,
        status: 'error',
        missing: [],
        error: engineMessage('calc_refused', e.field, { reason: e.reason }),
        result: null,
      },
      metrics: {},
      verdicts: [],
      trace: [],
      cautions: [],
    };
  }
  return {
    module,
    outcome: { ...base, status: 'ran', missing: [], error: null, result },
    metrics: module.metrics(result, assembly),
    verdicts: module.verdicts(result, assembly),
    trace: module.trace(result),
    cautions: module.cautions(result),
  };
}

function criterionCheck(
  row: CriteriaRowInput,
  metrics: Map<MetricKey, { outcome: MetricOutcome; run: ModuleRun }>,
): Check {
  const spec = criterionSpec(row.criterion);
  const base = {
    id: `criterion.${row.criterion}`,
    source: 'criteria' as const,
    criterion: row.criterion,
    label: spec.label,
    required: row.value,
    unit: spec.unit,
    direction: spec.direction,
    row: { climateZone: row.climateZone, wallCategory: row.wallCategory },
  };
  const found = metrics.get(spec.metric);
  const notEvaluated = (module: string, reason: string): Check => ({
    ...base,
    provided: null,
    margin: null,
    marginRatio: null,
    status: 'not_evaluated',
    reason,
    module,
    traceStepIds: [],
  });
  if (!found) return notEvaluated('—', `no check module measures ${spec.label.toLowerCase()} yet`);
  const { outcome, run } = found;
  if (outcome.value === null)
    return notEvaluated(run.module.id, run.outcome.status === 'ran' ? outcome.reason : whyNot(run));
  const common = {
    module: run.module.id,
    traceStepIds: outcome.traceStepIds,
    provided: outcome.value,
    ...('method' in outcome && outcome.method ? { method: outcome.method } : {}),
  };
  const note = 'note' in outcome && outcome.note ? outcome.note : '';
  if (spec.direction === 'required') {
    if (typeof row.value !== 'boolean' || typeof outcome.value !== 'boolean')
      return notEvaluated(run.module.id, 'the criterion and the metric are not both yes/no');
    const pass = !row.value || outcome.value;
    return {
      ...base,
      ...common,
      margin: null,
      marginRatio: null,
      status: pass ? 'pass' : 'fail',
      reason: row.value ? note : `The table does not require it. ${note}`.trim(),
    };
  }
  if (typeof row.value !== 'number' || typeof outcome.value !== 'number')
    return notEvaluated(run.module.id, 'the criterion and the metric are not both numbers');
  return { ...base, ...common, ...compare(spec.direction, row.value, outcome.value), reason: note };
}

/**
 * Checks an assembly of a project against the rows of a code table with every registered module.
 * Rows apply when they name the project's climate zone (or all zones) and the assembly's wall category.
 */
export function runChecks(
  assembly: AssemblyInput,
  project: ProjectForChecks,
  rows: readonly CriteriaRowInput[],
  modules: readonly CheckModule[] = CHECK_MODULES,
): CheckReport {
  const runs = modules.map((m) => runModule(m, assembly, project));

  const metrics = new Map<MetricKey, { outcome: MetricOutcome; run: ModuleRun }>();
  for (const run of runs)
    for (const key of run.module.provides)
      metrics.set(key, {
        run,
        outcome:
          run.outcome.status === 'ran'
            ? (run.metrics[key] ?? {
                value: null,
                reason: `the ${run.module.label.toLowerCase()} did not report it`,
              })
            : { value: null, reason: whyNot(run) },
      });

  const applicable = applicableRows(rows, project.climateZone, assembly.wallCategory);
  const criteriaChecks = applicable.map((row) => criterionCheck(row, metrics));
  if (applicable.length === 0)
    criteriaChecks.push({
      id: 'criteria.none',
      source: 'criteria',
      criterion: 'rows',
      label: 'Rows of the code table for this wall',
      required: null,
      provided: null,
      unit: '',
      direction: null,
      margin: null,
      marginRatio: null,
      status: 'not_evaluated',
      reason: `the code table has no row for climate zone ${zoneLabel(project.climateZone)} (or all zones) and ${WALL_CATEGORY_LABELS[assembly.wallCategory].toLowerCase()}s, so nothing was checked against it`,
      module: '—',
      traceStepIds: [],
    });

  const moduleChecks: Check[] = runs.flatMap((run) =>
    run.outcome.status === 'ran'
      ? run.verdicts.map((v) => ({ ...v, module: run.module.id, source: 'module' as const }))
      : [
          {
            id: `${run.module.id}.run`,
            source: 'module' as const,
            criterion: 'run',
            label: run.module.label,
            required: null,
            provided: null,
            unit: '',
            direction: null,
            margin: null,
            marginRatio: null,
            status: 'not_evaluated' as const,
            reason: whyNot(run),
            module: run.module.id,
            traceStepIds: [],
          },
        ],
  );
  const checks = [...criteriaChecks, ...moduleChecks];

  const allSteps = new Map<string, TraceStep>();
  for (const run of runs) for (const s of run.trace) if (!allSteps.has(s.id)) allSteps.set(s.id, s);
  const referenced = new Map<string, TraceStep>();
  const refer = (ids: readonly string[]) => {
    for (const id of ids) {
      const s = allSteps.get(id);
      if (s && !referenced.has(id)) referenced.set(id, s);
    }
  };
  for (const c of checks) refer(c.traceStepIds);
  const metricRecord: Record<string, MetricOutcome> = {};
  for (const [key, { outcome }] of metrics) {
    metricRecord[key] = outcome;
    if (outcome.value !== null) refer(outcome.traceStepIds);
  }

  return {
    climateZone: project.climateZone,
    wallCategory: assembly.wallCategory,
    matchedRows: applicable.length,
    modules: runs.map((r) => r.outcome),
    metrics: metricRecord,
    checks,
    verdict: verdictOf(checks),
    criteriaVerdict: verdictOf(criteriaChecks),
    moduleVerdict: verdictOf(moduleChecks),
    steps: [...referenced.values()],
    cautions: [...new Set([...runs.flatMap((r) => r.cautions), ...RUN_CAUTIONS])],
  };
}
