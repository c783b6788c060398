import { CalcInputError } from '../calc/errors';
import type { TraceStep } from '../calc/trace';
import { type EngineMessage, engineMessage, type StoredMessage } from '../format/message-schema';
import type { AssemblyInput } from '../schemas/assembly';
import { applicableRows, type CriteriaRowInput, criterionSpec, type MetricKey } from './criteria';
import type { CheckInput, ProjectForChecks } from './inputs';
import { type CheckModule, compare } from './module';
import { CHECK_MODULES } from './modules';
import {
  type Check,
  type CheckReport,
  type Metric,
  type MetricOutcome,
  type ModuleOutcome,
  verdictOf,
} from './report';

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

/** One module's run on one assembly: its outcome, the metrics it provides and its own checks. */
export interface ModuleRun {
  module: CheckModule;
  outcome: ModuleOutcome;
  /** Every metric the module provides: its value, or why there is none. */
  metrics: Map<MetricKey, MetricOutcome>;
  /** The module's own checks (or one `not_evaluated` check when it could not run). */
  checks: Check[];
  trace: TraceStep[];
  cautions: StoredMessage[];
}

/** A module that did not run: every metric it provides with the reason, and its one `not_evaluated` check. */
function notRun(module: CheckModule, outcome: ModuleOutcome, reason: EngineMessage): ModuleRun {
  const run: ModuleRun = { module, outcome, metrics: new Map(), checks: [], trace: [], cautions: [] };
  for (const key of module.provides) run.metrics.set(key, { value: null, reason });
  run.checks.push(
    notEvaluated(unmeasured(`${module.id}.run`, 'module', 'run', module.label), module.id, reason),
  );
  return run;
}

/** Builds and runs one module on an assembly of a project (a refusal of the engine is its outcome). */
export function runModule(
  module: CheckModule,
  assembly: AssemblyInput,
  project: ProjectForChecks,
): ModuleRun {
  const base = { id: module.id, label: module.label };
  const built: CheckInput<unknown> = module.build(assembly, project);
  if (built.status === 'missing')
    return notRun(
      module,
      { ...base, status: 'missing', missing: built.missing, error: null, result: null },
      engineMessage('module_missing', '', { items: built.missing }),
    );
  let result: unknown;
  try {
    result = module.run(built.input);
  } catch (e) {
    if (!(e instanceof CalcInputError)) throw e;
    return notRun(
      module,
      {
        ...base,
        status: 'error',
        missing: [],
        error: engineMessage('calc_refused', e.field, { reason: e.reason }),
        result: null,
      },
      engineMessage('module_refused', e.field, { module: module.label, reason: e.reason }),
    );
  }
  const reported = module.metrics(result, assembly);
  const metrics = new Map<MetricKey, MetricOutcome>();
  for (const key of module.provides)
    metrics.set(
      key,
      reported[key] ?? {
        value: null,
        reason: engineMessage('metric_not_reported', '', { module: module.label }),
      },
    );
  return {
    module,
    outcome: { ...base, status: 'ran', missing: [], error: null, result },
    metrics,
    checks: module
      .verdicts(result, assembly)
      .map((v) => ({ ...v, module: module.id, source: 'module' as const })),
    trace: module.trace(result),
    cautions: module.cautions(result),
  };
}

/** What a check is about before anything is measured: its id, source, criterion, label, requirement, unit. */
type CriterionBase = Omit<
  Check,
  'provided' | 'margin' | 'marginRatio' | 'status' | 'reason' | 'module' | 'traceStepIds' | 'method'
>;

/** A check that could not be evaluated, with the module it waits for and why. */
const notEvaluated = (base: CriterionBase, module: string, reason: Check['reason']): Check => ({
  ...base,
  provided: null,
  margin: null,
  marginRatio: null,
  status: 'not_evaluated',
  reason,
  module,
  traceStepIds: [],
});

/** The head of a check with no requirement to measure against (a module that did not run, no rows). */
const unmeasured = (
  id: string,
  source: Check['source'],
  criterion: string,
  label: string,
): CriterionBase => ({ id, source, criterion, label, required: null, unit: '', direction: null });

/** A yes/no criterion the table sets to "no", with the metric's note (a note stored as words is kept as such). */
const notRequired = (note: Metric['note'] | null): Check['reason'] =>
  typeof note === 'string'
    ? `The table does not require it. ${note}`.trim()
    : engineMessage('not_required', '', { note: note ?? null });

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
  if (!found)
    return notEvaluated(base, '—', engineMessage('no_module_measures', '', { criterion: spec.label }));
  const { outcome, run } = found;
  if (outcome.value === null) return notEvaluated(base, run.module.id, outcome.reason);
  const method = 'method' in outcome && outcome.method ? { method: outcome.method } : {};
  const note = 'note' in outcome && outcome.note ? outcome.note : null;
  if (spec.direction === 'required') {
    if (typeof row.value !== 'boolean' || typeof outcome.value !== 'boolean')
      return notEvaluated(base, run.module.id, engineMessage('not_both_yes_no', '', {}));
    return Object.assign(checked(base, run, outcome.traceStepIds, outcome.value), method, {
      margin: null,
      marginRatio: null,
      status: !row.value || outcome.value ? 'pass' : 'fail',
      reason: row.value ? note : notRequired(note),
    } as const);
  }
  if (typeof row.value !== 'number' || typeof outcome.value !== 'number')
    return notEvaluated(base, run.module.id, engineMessage('not_both_numbers', '', {}));
  return Object.assign(
    checked(base, run, outcome.traceStepIds, outcome.value),
    method,
    compare(spec.direction, row.value, outcome.value),
    { reason: note },
  );
}

/**
 * The part of an evaluated criterion's check that does not depend on the comparison. Built by assignment, not
 * object spread: a sweep makes one per row per variant, and V8's spread of several objects costs ≈ 30× more.
 */
function checked(
  base: CriterionBase,
  run: ModuleRun,
  traceStepIds: string[],
  provided: number | boolean,
): Omit<Check, 'margin' | 'marginRatio' | 'status' | 'reason'> {
  return Object.assign({}, base, { module: run.module.id, traceStepIds, provided });
}

/** The metrics of the runs by key, each with the run that provides it (a later module's wins). */
function metricsOf(runs: readonly ModuleRun[]) {
  const metrics = new Map<MetricKey, { outcome: MetricOutcome; run: ModuleRun }>();
  for (const run of runs) for (const [key, outcome] of run.metrics) metrics.set(key, { outcome, run });
  return metrics;
}

/**
 * The checks of one assembly from its module runs: each applicable row against its metric (one
 * `not_evaluated` check when no row applies), then the modules' own checks. `runChecks` reports them; a sweep
 * calls this with the runs it keeps, so a variant is judged by the same code as a check run.
 */
export function checksOf(
  runs: readonly ModuleRun[],
  applicable: readonly CriteriaRowInput[],
  climateZone: ProjectForChecks['climateZone'],
  wallCategory: AssemblyInput['wallCategory'],
) {
  const metrics = metricsOf(runs);
  const criteriaChecks = applicable.map((row) => criterionCheck(row, metrics));
  if (applicable.length === 0)
    criteriaChecks.push(
      notEvaluated(
        unmeasured('criteria.none', 'criteria', 'rows', 'Rows of the code table for this wall'),
        '—',
        engineMessage('no_matching_rows', '', { climateZone, wallCategory }),
      ),
    );
  const moduleChecks = runs.flatMap((run) => run.checks);
  return { metrics, criteriaChecks, moduleChecks, checks: [...criteriaChecks, ...moduleChecks] };
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
  const applicable = applicableRows(rows, project.climateZone, assembly.wallCategory);
  const { metrics, criteriaChecks, moduleChecks, checks } = checksOf(
    runs,
    applicable,
    project.climateZone,
    assembly.wallCategory,
  );

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
    cautions: [
      ...new Map(
        [...runs.flatMap((r) => r.cautions), ...RUN_CAUTIONS].map((c) => [JSON.stringify(c), c]),
      ).values(),
    ],
  };
}
