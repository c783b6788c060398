import { CalcInputError } from '../calc/errors';
import type { MovementClass } from '../calc/joints/schema';
import {
  framedLayerSchema,
  homogeneousLayerSchema,
  pointBridgeBySpacingSchema,
} from '../calc/thermal/schema';
import { panelSchema } from '../calc/wind/schema';
import { applicableRows, type CriteriaRowInput } from '../checks/criteria';
import type { ProjectForChecks } from '../checks/inputs';
import type { CheckModule } from '../checks/module';
import { CHECK_MODULES } from '../checks/modules';
import { type Check, type CheckReport, verdictOf } from '../checks/report';
import { checksOf, type ModuleRun, runModule } from '../checks/runner';
import type { AssemblyInput } from '../schemas/assembly';
import { attachmentSchema, orgMaterialInputSchema } from '../schemas/assembly';
import type { SweepClipEntry, SweepParameter, SweepProduct, SweepResult, SweepVariantResult } from './schema';

/*
 * The sweep engine: plan (every refusal before any work), apply one variant to an assembly (a new document;
 * the parts it does not touch are shared), enumerate lazily, and run each variant through the one compliance
 * runner (shared/checks/runner.ts) with the registered modules.
 */

type Value = number | string;
type Assembly = AssemblyInput;

/** One parameter, planned: its values, which modules it can change, and how it goes onto a document. */
export interface SweepAxis {
  kind: SweepParameter['kind'];
  values: readonly Value[];
  /** Ids of the check modules whose input this parameter changes. */
  touches: readonly string[];
  apply(a: Assembly, value: Value): Assembly;
  /** The layer it varies (insulation thickness or product): the ranking prices and weighs that layer. */
  layer?: number;
  /** An insulation product parameter's products (their density weighs the layer). */
  products?: readonly SweepProduct[];
}

export interface SweepPlan {
  axes: SweepAxis[];
  count: number;
}

/** Number of values of start, start + step, … ≤ stop; the 1e-9 absorbs binary noise in (stop − start)/step. */
export const rangeCount = (start: number, stop: number, step: number) =>
  Math.floor((stop - start) / step + 1e-9) + 1;

/** The i-th value of a range, rounded to 12 significant digits so 0.1 + 2·0.05 reads 0.2. */
const rangeValue = (start: number, step: number, i: number) => Number((start + i * step).toPrecision(12));

interface Bounds {
  safeParse(v: unknown): { success: boolean; error?: { issues: { message: string }[] } };
}

/** Every value a parameter names, refused at its field when the step, the list or a value cannot be. */
function numericValues(
  p: Extract<SweepParameter, { range?: unknown }>,
  at: string,
  bounds: Bounds,
  cap: number,
): number[] {
  const { range, list } = p;
  if (range && list) throw new CalcInputError(at, 'give a range or a list, not both');
  if (list) {
    if (list.length === 0)
      throw new CalcInputError(`${at}.list`, 'the list is empty: name one value or more');
    for (const [i, v] of list.entries()) checkBounds(v, `${at}.list.${i}`, bounds);
    return [...list];
  }
  if (!range) throw new CalcInputError(at, 'give a range (start, stop, step) or a list of values');
  if (!(range.step > 0))
    throw new CalcInputError(`${at}.range.step`, `the step must be greater than 0 (got ${range.step})`);
  if (range.stop < range.start)
    throw new CalcInputError(
      `${at}.range.stop`,
      `the stop (${range.stop}) is below the start (${range.start})`,
    );
  checkBounds(range.start, `${at}.range.start`, bounds);
  checkBounds(range.stop, `${at}.range.stop`, bounds);
  const n = rangeCount(range.start, range.stop, range.step);
  if (n > cap)
    throw new CalcInputError(`${at}.range.step`, `the range has ${n} values — at most ${cap} in one sweep`);
  return Array.from({ length: n }, (_, i) => rangeValue(range.start, range.step, i));
}

function checkBounds(v: number, field: string, bounds: Bounds) {
  const r = bounds.safeParse(v);
  if (!r.success)
    throw new CalcInputError(field, r.error?.issues[0]?.message ?? 'outside the field’s bounds');
}

const replaceAt = <T>(list: readonly T[], i: number, item: T): T[] =>
  list.map((x, j) => (j === i ? item : x));

type Layer = Assembly['thermal']['layers'][number];
type Bridge = Assembly['thermal']['bridges'][number];

/** The assembly with thermal layer `i` replaced (the rest of the document shared). */
const withLayer = (d: Assembly, i: number, layer: Layer): Assembly => ({
  ...d,
  thermal: { ...d.thermal, layers: replaceAt(d.thermal.layers, i, layer) },
});

/** The assembly with thermal bridge `i` replaced. */
const withBridge = (d: Assembly, i: number, bridge: Bridge): Assembly => ({
  ...d,
  thermal: { ...d.thermal, bridges: replaceAt(d.thermal.bridges, i, bridge) },
});

/** The layer at `index`, refused when there is none or it is not one of `kinds`. */
function layerAt(a: Assembly, index: number, field: string, kinds: readonly string[], what: string) {
  const layer = a.thermal.layers[index];
  if (!layer)
    throw new CalcInputError(
      field,
      `the assembly has ${a.thermal.layers.length} layers (0 to ${a.thermal.layers.length - 1})`,
    );
  if (!kinds.includes(layer.kind))
    throw new CalcInputError(field, `layer ${index} (${layer.name}) is a ${layer.kind} layer: ${what}`);
  return layer;
}

/**
 * Bridges that follow the girts or the clips: linear bridges by spacing at the design girt spacing, and point
 * bridges whose spacing across the girts (girts horizontal: vertical) is the girt spacing, or along them the
 * clip spacing. Matched once, on the assembly as given, so two spacings varied together do not confuse them.
 */
function followers(a: Assembly, spacing: 'girt' | 'clip') {
  const design = spacing === 'girt' ? a.attachment.girtSpacing : a.attachment.clipSpacing;
  const horizontal = a.attachment.girtOrientation === 'horizontal';
  const across = horizontal ? 'spacingVertical' : 'spacingHorizontal';
  const along = horizontal ? 'spacingHorizontal' : 'spacingVertical';
  const out: { index: number; key: 'spacing' | 'spacingVertical' | 'spacingHorizontal' }[] = [];
  a.thermal.bridges.forEach((b, index) => {
    if (spacing === 'girt' && b.kind === 'linear' && 'spacing' in b && b.spacing === design)
      out.push({ index, key: 'spacing' });
    if (b.kind === 'point' && 'spacingVertical' in b) {
      const key = spacing === 'girt' ? across : along;
      if (b[key] === design) out.push({ index, key });
    }
  });
  return out;
}

function setBridgeSpacing(a: Assembly, follow: ReturnType<typeof followers>, v: number): Assembly['thermal'] {
  let bridges = a.thermal.bridges;
  for (const f of follow)
    bridges = replaceAt(bridges, f.index, { ...bridges[f.index]!, [f.key]: v } as (typeof bridges)[number]);
  return { ...a.thermal, bridges };
}

const unwrap = <T extends { unwrap(): Bounds }>(s: T) => s.unwrap();

/**
 * The names of a list of products or clip types, each once: a variant's value is the name (its label, and the
 * key its module runs are kept by, so two materials under one name would share a run).
 */
function namedValues(items: readonly { name: string }[], at: string, what: string): string[] {
  if (items.length === 0) throw new CalcInputError(at, `the list is empty: name one ${what} or more`);
  const seen = new Map<string, number>();
  items.forEach(({ name }, i) => {
    const first = seen.get(name);
    if (first !== undefined)
      throw new CalcInputError(
        `${at}.${i}.name`,
        `${what}s ${first + 1} and ${i + 1} are both named “${name}”: each needs its own name`,
      );
    seen.set(name, i);
  });
  return items.map((x) => x.name);
}

/** The item a variant's value names (its name, checked unique by namedValues). */
const byName = <T extends { name: string }>(items: readonly T[]) => {
  const m = new Map(items.map((x) => [x.name, x]));
  return (v: Value) => m.get(v as string)!;
};

/**
 * The assembly with a product in layer `i`: the layer's name and λ (in a framed layer, those of section
 * `section`, its insulation), and its vapour data μ (none given: not entered — the moisture check says so).
 * A homogeneous layer drops its `materialId` (that names the generic library, not this product).
 */
function withProduct(d: Assembly, i: number, section: number, m: SweepProduct): Assembly {
  const layer = d.thermal.layers[i]!;
  const name = m.name.slice(0, 120);
  let next = layer;
  if (layer.kind === 'framed')
    next = {
      ...layer,
      sections: replaceAt(layer.sections, section, {
        ...layer.sections[section]!,
        name,
        conductivity: m.conductivity,
      }),
    };
  else if (layer.kind === 'homogeneous') {
    const { materialId: _generic, ...rest } = layer;
    next = { ...rest, name, conductivity: m.conductivity };
  }
  const mu = m.vapourResistanceFactor;
  return {
    ...withLayer(d, i, next),
    vapour: d.vapour && replaceAt(d.vapour, i, mu === undefined ? null : { kind: 'mu' as const, mu }),
  };
}

/** The assembly with clip type `e` at point bridge `i`: its name, χ and source (a solved one's surface f_Rsi too). */
function withClip(d: Assembly, i: number, e: SweepClipEntry): Assembly {
  const b = d.thermal.bridges[i]!;
  if (b.kind !== 'point') return d;
  const { source: _old, ...bridge } = b;
  const next = { ...bridge, name: e.name, chi: e.chi, ...(e.source ? { source: e.source } : {}) };
  return withBridge(d, i, next as Bridge);
}

/** One parameter planned against the assembly: every refusal of a parameter the assembly does not have. */
function planAxis(a: Assembly, p: SweepParameter, at: string, cap: number): SweepAxis {
  switch (p.kind) {
    case 'insulationThickness': {
      layerAt(
        a,
        p.layer,
        `${at}.layer`,
        ['homogeneous', 'framed'],
        'only a homogeneous or framed layer has a thickness to vary',
      );
      return {
        kind: p.kind,
        values: numericValues(p, at, homogeneousLayerSchema.shape.thickness, cap),
        touches: ['thermal', 'moisture'],
        layer: p.layer,
        apply: (d, v) => withLayer(d, p.layer, { ...d.thermal.layers[p.layer]!, thickness: v as number }),
      };
    }
    case 'insulationProduct': {
      const layer = layerAt(
        a,
        p.layer,
        `${at}.layer`,
        ['homogeneous', 'framed'],
        'only a homogeneous or framed layer has a material to change',
      );
      const values = namedValues(p.products, `${at}.products`, 'product');
      p.products.forEach((m, i) => {
        checkBounds(
          m.conductivity,
          `${at}.products.${i}.conductivity`,
          homogeneousLayerSchema.shape.conductivity,
        );
        if (m.vapourResistanceFactor !== undefined)
          checkBounds(
            m.vapourResistanceFactor,
            `${at}.products.${i}.vapourResistanceFactor`,
            unwrap(orgMaterialInputSchema.shape.vapourResistanceFactor),
          );
      });
      // A framed layer's insulation: its lowest-λ section, as the cavity-insulation metric reads it.
      const section =
        layer.kind === 'framed'
          ? layer.sections.reduce((m, s, i, all) => (s.conductivity < all[m]!.conductivity ? i : m), 0)
          : 0;
      const product = byName(p.products);
      return {
        kind: p.kind,
        values,
        touches: ['thermal', 'moisture'],
        layer: p.layer,
        products: p.products,
        apply: (d, v) => withProduct(d, p.layer, section, product(v)),
      };
    }
    case 'girtSpacing':
    case 'clipSpacing': {
      const girt = p.kind === 'girtSpacing';
      if (a.attachment[p.kind] === undefined)
        throw new CalcInputError(
          at,
          `the assembly has no design ${girt ? 'girt' : 'clip'} spacing (attachment.${p.kind}): enter it first`,
        );
      const follow = followers(a, girt ? 'girt' : 'clip');
      return {
        kind: p.kind,
        values: numericValues(p, at, unwrap(attachmentSchema.shape[p.kind]), cap),
        touches: follow.length > 0 ? ['thermal', 'wind'] : ['wind'],
        apply: (d, v) => ({
          ...d,
          attachment: { ...d.attachment, [p.kind]: v as number },
          thermal: follow.length > 0 ? setBridgeSpacing(d, follow, v as number) : d.thermal,
        }),
      };
    }
    case 'clipChi': {
      const b = a.thermal.bridges[p.bridge];
      if (!b)
        throw new CalcInputError(`${at}.bridge`, `the assembly has ${a.thermal.bridges.length} bridges`);
      if (b.kind !== 'point')
        throw new CalcInputError(
          `${at}.bridge`,
          `bridge ${p.bridge} (${b.name}) is not a point bridge (a clip)`,
        );
      if (p.entries) {
        if (p.range || p.list)
          throw new CalcInputError(at, 'give a range, a list or clip types — one of them');
        const values = namedValues(p.entries, `${at}.entries`, 'clip type');
        p.entries.forEach((e, i) => {
          checkBounds(e.chi, `${at}.entries.${i}.chi`, pointBridgeBySpacingSchema.shape.chi);
        });
        const entry = byName(p.entries);
        // The name and a solved source's surface f_Rsi reach the moisture check too.
        return {
          kind: p.kind,
          values,
          touches: ['thermal', 'moisture'],
          apply: (d, v) => withClip(d, p.bridge, entry(v)),
        };
      }
      return {
        kind: p.kind,
        values: numericValues(p, at, pointBridgeBySpacingSchema.shape.chi, cap),
        touches: ['thermal'],
        apply: (d, v) => withBridge(d, p.bridge, { ...d.thermal.bridges[p.bridge]!, chi: v } as Bridge),
      };
    }
    case 'studSpacing': {
      const layer = layerAt(a, p.layer, `${at}.layer`, ['framed'], 'only a framed layer has studs');
      if (layer.kind !== 'framed' || !layer.metal || layer.spacing === undefined)
        throw new CalcInputError(
          `${at}.layer`,
          `layer ${p.layer} (${layer.name}) is not metal framing with a spacing entered`,
        );
      const base = layer.spacing;
      // The framing sections' area fractions go as 1/s (one member per spacing); the cavity (the largest section) takes the rest.
      const cavity = layer.sections.reduce((m, s, i, all) => (s.fraction > all[m]!.fraction ? i : m), 0);
      const values = numericValues(p, at, unwrap(framedLayerSchema.shape.spacing), cap);
      values.forEach((v, i) => {
        const framing = layer.sections.reduce(
          (sum, s, j) => (j === cavity ? sum : sum + (s.fraction * base) / v),
          0,
        );
        if (framing >= 1)
          throw new CalcInputError(
            `${at}.${p.list ? `list.${i}` : 'range.start'}`,
            `at ${v} m the framing would fill the whole layer`,
          );
      });
      return {
        kind: p.kind,
        values,
        touches: ['thermal', 'moisture'],
        apply: (d, v) => {
          const l = d.thermal.layers[p.layer]!;
          if (l.kind !== 'framed') return d;
          const scaled = l.sections.map((s, j) =>
            j === cavity ? s : { ...s, fraction: (s.fraction * base) / (v as number) },
          );
          const rest = 1 - scaled.reduce((sum, s, j) => (j === cavity ? sum : sum + s.fraction), 0);
          const sections = scaled.map((s, j) => (j === cavity ? { ...s, fraction: rest } : s));
          return withLayer(d, p.layer, { ...l, spacing: v as number, sections });
        },
      };
    }
    case 'panelModule': {
      if (!a.windPanel)
        throw new CalcInputError(at, 'the assembly has no wind panel (windPanel): enter the panel first');
      return {
        kind: p.kind,
        values: numericValues(p, at, panelSchema.shape.panelModuleWidth, cap),
        touches: ['wind'],
        apply: (d, v) => ({
          ...d,
          windPanel: d.windPanel && { ...d.windPanel, panelModuleWidth: v as number },
          takeoff: d.takeoff && { ...d.takeoff, module: { ...d.takeoff.module, width: v as number } },
        }),
      };
    }
    case 'sealantClass': {
      const joints = a.joints ?? [];
      if (joints.length === 0)
        throw new CalcInputError(at, 'the assembly has no joints: enter the joint schedule first');
      if (p.joint !== undefined && p.joint >= joints.length)
        throw new CalcInputError(
          `${at}.joint`,
          `the assembly has ${joints.length} joints (0 to ${joints.length - 1})`,
        );
      if (p.list.length === 0)
        throw new CalcInputError(`${at}.list`, 'the list is empty: name one class or more');
      return {
        kind: p.kind,
        values: [...p.list],
        touches: ['joints'],
        apply: (d, v) => ({
          ...d,
          joints: d.joints?.map((j, i) =>
            p.joint === undefined || i === p.joint
              ? { ...j, sealant: { ...j.sealant, movementClass: v as MovementClass } }
              : j,
          ),
        }),
      };
    }
  }
}

const targetOf = (p: SweepParameter) =>
  `${p.kind}:${'layer' in p ? p.layer : 'bridge' in p ? p.bridge : 'joint' in p ? (p.joint ?? '*') : ''}`;

/**
 * Plans a sweep: each parameter against the assembly (one range at most `valuesCap` values), the number of
 * variants against `cap` — every refusal (CalcInputError naming `parameters.<i>…`) before any variant is run.
 */
export function planSweep(
  a: Assembly,
  parameters: readonly SweepParameter[],
  cap: number,
  valuesCap = cap,
): SweepPlan {
  if (parameters.length === 0)
    throw new CalcInputError('parameters', 'choose at least one parameter to vary');
  if (parameters.length > 3) throw new CalcInputError('parameters', 'at most three parameters at once');
  const seen = new Set<string>();
  const axes = parameters.map((p, i) => {
    const target = targetOf(p);
    if (seen.has(target)) throw new CalcInputError(`parameters.${i}`, 'the same parameter is varied twice');
    seen.add(target);
    return planAxis(a, p, `parameters.${i}`, valuesCap);
  });
  const count = axes.reduce((n, x) => n * x.values.length, 1);
  if (count > cap) throw new CalcInputError('parameters', `${count} variants — at most ${cap} in one sweep`);
  return { axes, count };
}

/**
 * How many variants the parameters name, from their ranges and lists alone (a range that cannot be counted
 * counts 1: planSweep refuses it) — for a work budget checked before the assembly is looked at.
 */
export const sweepSize = (parameters: readonly SweepParameter[]) =>
  parameters.reduce((n, p) => {
    const named = 'products' in p ? p.products : 'entries' in p ? p.entries : undefined;
    if (named) return n * Math.max(named.length, 1);
    if ('list' in p && p.list) return n * Math.max(p.list.length, 1);
    const r = 'range' in p ? p.range : undefined;
    return r && r.step > 0 && r.stop >= r.start ? n * rangeCount(r.start, r.stop, r.step) : n;
  }, 1);

/** The values of variant `index` (mixed radix, the last parameter fastest). */
export function variantValues(plan: SweepPlan, index: number): Value[] {
  const values: Value[] = new Array(plan.axes.length);
  let rest = index;
  for (let i = plan.axes.length - 1; i >= 0; i--) {
    const axis = plan.axes[i]!;
    values[i] = axis.values[rest % axis.values.length]!;
    rest = Math.floor(rest / axis.values.length);
  }
  return values;
}

/** The assembly with one variant's values put in: a new document; `a` is not changed. */
export const applyVariant = (plan: SweepPlan, a: Assembly, values: readonly Value[]): Assembly =>
  plan.axes.reduce((d, axis, i) => axis.apply(d, values[i]!), a);

/** Every variant's index and values, lazily, in order. */
export function* enumerateVariants(plan: SweepPlan): Generator<{ index: number; values: Value[] }> {
  for (let index = 0; index < plan.count; index++) yield { index, values: variantValues(plan, index) };
}

/** The check that decides: the worst failing; else one not evaluated; else the tightest passing. */
export function governingCheck(checks: readonly Check[]): Check | null {
  const rank = { fail: 0, not_evaluated: 1, pass: 2 } as const;
  let best: Check | null = null;
  for (const c of checks) {
    if (best === null) best = c;
    else if (rank[c.status] !== rank[best.status]) best = rank[c.status] < rank[best.status] ? c : best;
    else if (c.marginRatio !== null && (best.marginRatio === null || c.marginRatio < best.marginRatio))
      best = c;
  }
  return best;
}

const margin = (c: Check) => ({ id: c.id, status: c.status, margin: c.margin, marginRatio: c.marginRatio });

/** One variant's report as the sweep keeps it: verdict, the governing check, each check's margin. */
export function variantResult(
  index: number,
  values: Value[],
  report: Pick<CheckReport, 'verdict' | 'checks'>,
): SweepVariantResult {
  const g = governingCheck(report.checks);
  return {
    index,
    values,
    verdict: report.verdict,
    governing: g && { ...margin(g), label: g.label },
    checks: report.checks.map(margin),
  };
}

/**
 * A runner for the variants of one plan: each module's run (outcome, metrics, own checks) is kept by the values
 * of the parameters that change its input (a module no parameter touches runs once per sweep; unknown modules
 * are never kept), a variant's document is made only when a module must run on it, and the rows that apply are
 * found once (the climate zone and wall category no parameter changes). The checks come from the runner's own
 * `checksOf`, so a variant is judged as a check run judges it (the property test holds every variant to
 * `runChecks` on its own assembly). At most 256 runs are kept per module.
 */
export function variantRunner(
  plan: SweepPlan,
  a: Assembly,
  project: ProjectForChecks,
  rows: readonly CriteriaRowInput[],
  modules: readonly CheckModule[] = CHECK_MODULES,
) {
  const known = ['thermal', 'moisture', 'wind', 'joints'];
  const kept = modules.map((m) => ({
    module: m,
    axes: plan.axes.flatMap((x, i) => (!known.includes(m.id) || x.touches.includes(m.id) ? [i] : [])),
    runs: new Map<string, ModuleRun>(),
  }));
  const applicable = applicableRows(rows, project.climateZone, a.wallCategory);
  const runs: ModuleRun[] = new Array(kept.length);
  return (index: number, values: Value[]): SweepVariantResult => {
    let doc: Assembly | undefined;
    for (let m = 0; m < kept.length; m++) {
      const k = kept[m]!;
      let key = '';
      for (const i of k.axes) key += `${values[i]}|`;
      let run = k.runs.get(key);
      if (!run) {
        if (k.runs.size >= 256) k.runs.clear();
        doc ??= applyVariant(plan, a, values);
        // Kept without its result, trace and cautions (a variant needs only the metrics and checks): less to carry into the old generation.
        const { outcome, ...whole } = runModule(k.module, doc, project);
        run = { ...whole, outcome: { ...outcome, result: null }, trace: [], cautions: [] };
        k.runs.set(key, run);
      }
      runs[m] = run;
    }
    const { checks } = checksOf(runs, applicable, project.climateZone, a.wallCategory);
    return variantResult(index, values, { verdict: verdictOf(checks), checks });
  };
}

/**
 * Runs every variant of a sweep through the compliance runner against the rows of one code table version.
 * A module's refusal (CalcInputError) is reported for each variant it refuses, as runChecks reports it.
 */
export function runSweep(
  a: Assembly,
  project: ProjectForChecks,
  rows: readonly CriteriaRowInput[],
  parameters: readonly SweepParameter[],
  cap: number,
  modules: readonly CheckModule[] = CHECK_MODULES,
): Omit<SweepResult, 'ranking'> & { plan: SweepPlan } {
  const plan = planSweep(a, parameters, cap);
  const run = variantRunner(plan, a, project, rows, modules);
  const variants: SweepVariantResult[] = new Array(plan.count);
  for (const { index, values } of enumerateVariants(plan)) variants[index] = run(index, values);
  return {
    plan,
    count: plan.count,
    parameters: plan.axes.map((x) => ({ kind: x.kind, values: [...x.values] })),
    variants,
  };
}
