import { CalcInputError } from '@shared/calc/errors';
import type { MovementClass } from '@shared/calc/joints/schema';
import type { AssemblyInput, BridgeValue, OrgMaterial } from '@shared/schemas/assembly';
import { clipEntryOf } from '@shared/sweep/library';
import type { SweepClipEntry, SweepParameter, SweepParameterKind, SweepProduct } from '@shared/sweep/schema';
import { planSweep, type SweepPlan } from '@shared/sweep/sweep';
import type { UnitSystem } from '@shared/units';
import type { InputMeasure } from '../../lib/input-measure';
import { measureInput } from '../assemblies/units';

/*
 * The sweep form: what a person chose for each parameter (range boxes hold SI from their number boxes, a list is
 * text in the person's units), turned into the engine's parameters, and every refusal — the form's own (an empty
 * box, an unreadable list entry) and the engine's (planSweep: steps, bounds, the cap, a parameter the assembly
 * does not have) — named by its field before any work starts.
 */

/** Most variants one sweep runs in the browser. */
export const SWEEP_BROWSER_CAP = 10_000;

export interface ParameterDraft {
  kind: SweepParameterKind;
  /** The layer, bridge or joint it varies (its index); null for "every joint" or a parameter of the whole wall. */
  target: number | null;
  /** `entries`: clip types from the firm library or the solved bridges (clipChi). */
  mode: 'range' | 'list' | 'entries';
  /** Range, SI (undefined while its box is empty or unreadable). */
  start?: number;
  stop?: number;
  step?: number;
  /** The list as typed, in the person's units, values separated by spaces or semicolons. */
  list: string;
  /** Sealant classes chosen. */
  classes: MovementClass[];
  /** Insulation products chosen from the firm library (copied: a deleted entry stays here, and is refused). */
  products: SweepProduct[];
  /** Clip types chosen: firm library χ values and the assembly's solved bridges. */
  entries: SweepClipEntry[];
}

/** The firm library the form offers (undefined while it loads, or with no firm). */
export interface SweepLibrary {
  firmName: string | null;
  materials?: OrgMaterial[];
  bridgeValues?: BridgeValue[];
}
export const NO_LIBRARY: SweepLibrary = { firmName: null };

export interface FieldProblem {
  /** The engine's path: `parameters.0.range.step`, `parameters.1.list.2`, `parameters`. */
  field: string;
  reason: string;
}

export const KIND_LABELS: Record<SweepParameterKind, string> = {
  insulationThickness: 'Insulation thickness',
  insulationProduct: 'Insulation product',
  girtSpacing: 'Girt spacing',
  clipSpacing: 'Clip spacing along the girt',
  clipChi: 'Clip χ (clip type)',
  studSpacing: 'Stud spacing',
  panelModule: 'Panel module',
  sealantClass: 'Sealant class',
};

/** How each numeric parameter is typed and shown (the assembly pages' measures). */
export const measureOf = (kind: SweepParameterKind): InputMeasure =>
  measureInput(kind === 'insulationThickness' ? 'thickness' : kind === 'clipChi' ? 'chi' : 'spacing');

export interface TargetOption {
  index: number | null;
  label: string;
}

/** What a parameter of this kind can vary on this assembly (an empty list: the assembly lacks it). */
export function targetsFor(a: AssemblyInput, kind: SweepParameterKind): TargetOption[] {
  const layers = a.thermal.layers.map((l, index) => ({ l, index }));
  switch (kind) {
    case 'insulationThickness':
    case 'insulationProduct':
      return layers
        .filter(({ l }) => l.kind === 'homogeneous' || l.kind === 'framed')
        .map(({ l, index }) => ({ index, label: `Layer ${index + 1}: ${l.name}` }));
    case 'studSpacing':
      return layers
        .filter(({ l }) => l.kind === 'framed' && l.metal && l.spacing !== undefined)
        .map(({ l, index }) => ({ index, label: `Layer ${index + 1}: ${l.name}` }));
    case 'clipChi':
      return a.thermal.bridges.flatMap((b, index) =>
        b.kind === 'point' ? [{ index, label: `Bridge ${index + 1}: ${b.name}` }] : [],
      );
    case 'sealantClass': {
      const joints = a.joints ?? [];
      return joints.length === 0
        ? []
        : [
            { index: null, label: 'Every joint' },
            ...joints.map((j, index) => ({ index, label: `Joint ${index + 1}: ${j.name}` })),
          ];
    }
    case 'girtSpacing':
    case 'clipSpacing':
      return a.attachment[kind] === undefined ? [] : [{ index: null, label: 'Design spacing' }];
    case 'panelModule':
      return a.windPanel ? [{ index: null, label: 'Wind panel' }] : [];
  }
}

/** The value the assembly has now for a parameter, SI (the middle of a first range). */
export function currentValue(a: AssemblyInput, kind: SweepParameterKind, target: number | null) {
  const layer = target === null ? undefined : a.thermal.layers[target];
  switch (kind) {
    case 'insulationThickness':
      return layer && 'thickness' in layer ? layer.thickness : undefined;
    case 'studSpacing':
      return layer?.kind === 'framed' ? layer.spacing : undefined;
    case 'clipChi': {
      const b = target === null ? undefined : a.thermal.bridges[target];
      return b?.kind === 'point' ? b.chi : undefined;
    }
    case 'girtSpacing':
    case 'clipSpacing':
      return a.attachment[kind];
    case 'panelModule':
      return a.windPanel?.panelModuleWidth;
    case 'sealantClass':
    case 'insulationProduct':
      return undefined;
  }
}

/**
 * The clip types a sweep can take for a clip: the firm's χ values, then the assembly's solved point bridges not
 * among them (the assembly's own copy: its source without the library entry, which may have been deleted since).
 */
export function clipOptions(a: AssemblyInput, values: readonly BridgeValue[] = []): SweepClipEntry[] {
  const offered = values.filter((b) => b.kind === 'point');
  const solved = a.thermal.bridges.flatMap((b) =>
    b.kind === 'point' && b.source?.computed && !offered.some((v) => v.id === b.source?.libraryEntryId)
      ? [{ name: b.name, chi: b.chi, source: { text: b.source.text, computed: b.source.computed } }]
      : [],
  );
  return [...offered.map(clipEntryOf), ...solved];
}

/** The layer a product most likely replaces: the homogeneous or framed layer of the lowest λ. */
function insulationLayer(a: AssemblyInput): number | null {
  const lambda = (i: number) => {
    const l = a.thermal.layers[i];
    if (l?.kind === 'homogeneous') return l.conductivity;
    return l?.kind === 'framed' ? Math.min(...l.sections.map((s) => s.conductivity)) : Infinity;
  };
  const layers = targetsFor(a, 'insulationProduct').map((t) => t.index ?? 0);
  return layers.reduce<number | null>(
    (best, i) => (best === null || lambda(i) < lambda(best) ? i : best),
    null,
  );
}

/** Rounds a starting value to 3 significant figures (a starting range reads 50, 100, 150 mm, not 49.999…). */
const round3 = (v: number) => Number(v.toPrecision(3));

/** A first draft of a parameter: its first target, a range from half to one and a half times today's value. */
export function newDraft(
  a: AssemblyInput,
  kind: SweepParameterKind,
  target = kind === 'insulationProduct' ? insulationLayer(a) : (targetsFor(a, kind)[0]?.index ?? null),
): ParameterDraft {
  const now = currentValue(a, kind, target);
  const base: ParameterDraft = {
    kind,
    target,
    mode: 'range',
    list: '',
    classes: [],
    products: [],
    entries: [],
  };
  if (kind === 'sealantClass') return { ...base, mode: 'list', classes: ['25', '35', '50'] };
  if (now === undefined || now <= 0) return base;
  return { ...base, start: round3(now / 2), stop: round3(now * 1.5), step: round3(now / 4) };
}

/** The list's entries: separated by spaces or semicolons (a comma may be a decimal comma, which is refused). */
const listEntries = (text: string) => text.split(/[\s;]+/).filter((t) => t !== '');

/** One draft as the engine's parameter, or the first problem of its own boxes. */
export function toParameter(
  d: ParameterDraft,
  i: number,
  system: UnitSystem,
): { parameter: SweepParameter } | { problem: FieldProblem } {
  const at = `parameters.${i}`;
  const problem = (field: string, reason: string) => ({ problem: { field: `${at}${field}`, reason } });
  if (d.kind === 'sealantClass') {
    if (d.classes.length === 0) return problem('.list', 'choose one class or more');
    return {
      parameter: { kind: d.kind, list: d.classes, ...(d.target === null ? {} : { joint: d.target }) },
    };
  }
  if (d.kind === 'insulationProduct') {
    if (d.target === null) return problem('.layer', 'choose a layer');
    if (d.products.length === 0) return problem('.products', 'choose one product or more from the library');
    return { parameter: { kind: d.kind, layer: d.target, products: d.products } };
  }
  const needs =
    d.kind === 'insulationThickness' || d.kind === 'studSpacing'
      ? 'layer'
      : d.kind === 'clipChi'
        ? 'bridge'
        : null;
  if (needs && d.target === null) return problem(`.${needs}`, `choose a ${needs}`);
  const where = needs ? { [needs]: d.target } : {};
  const as = (values: object) => ({ parameter: { kind: d.kind, ...where, ...values } as SweepParameter });
  if (d.mode === 'range') {
    for (const key of ['start', 'stop', 'step'] as const)
      if (d[key] === undefined || !Number.isFinite(d[key])) return problem(`.range.${key}`, 'enter a number');
    return as({ range: { start: d.start, stop: d.stop, step: d.step } });
  }
  if (d.mode === 'entries') {
    if (d.entries.length === 0)
      return problem('.entries', 'choose one clip type or more from the library or the solved bridges');
    return as({ entries: d.entries });
  }
  const measure = measureOf(d.kind);
  const entries = listEntries(d.list);
  if (entries.length === 0) return problem('.list', 'the list is empty: name one value or more');
  const list: number[] = [];
  for (const [j, text] of entries.entries()) {
    const read = measure.parse(text, system);
    if (read.kind !== 'ok')
      return problem(
        `.list.${j}`,
        `“${text}” is not a number in ${measure.unit(system)}; separate values by spaces or semicolons`,
      );
    list.push(read.si);
  }
  return as({ list });
}

export type Validated =
  | { ok: true; parameters: SweepParameter[]; plan: SweepPlan }
  | { ok: false; problems: FieldProblem[] };

/** Products and clip types taken from the firm library that it no longer has (deleted since), at their fields. */
export function deletedPicks(drafts: readonly ParameterDraft[], library: SweepLibrary): FieldProblem[] {
  const gone = (what: string, name: string) =>
    `“${name}” is no longer in the firm library (deleted): remove it, or pick ${what}`;
  return drafts.flatMap((d, i) => {
    const at = `parameters.${i}`;
    if (d.kind === 'insulationProduct' && library.materials) {
      const ids = new Set(library.materials.map((m) => m.id));
      return d.products.flatMap((p, j) =>
        p.libraryEntryId && !ids.has(p.libraryEntryId)
          ? [{ field: `${at}.products.${j}.libraryEntryId`, reason: gone('another product', p.name) }]
          : [],
      );
    }
    if (d.kind === 'clipChi' && d.mode === 'entries' && library.bridgeValues) {
      const ids = new Set(library.bridgeValues.map((b) => b.id));
      return d.entries.flatMap((e, j) => {
        const id = e.source?.libraryEntryId;
        return id && !ids.has(id)
          ? [{ field: `${at}.entries.${j}.source.libraryEntryId`, reason: gone('another clip', e.name) }]
          : [];
      });
    }
    return [];
  });
}

/**
 * Every draft read and the sweep planned against the assembly: the form's own problems (all of them, and a
 * library pick deleted since), else the engine's first refusal, named by its field — before a worker starts.
 */
export function validateSweep(
  a: AssemblyInput,
  drafts: readonly ParameterDraft[],
  system: UnitSystem,
  cap = SWEEP_BROWSER_CAP,
  library: SweepLibrary = NO_LIBRARY,
): Validated {
  if (drafts.length === 0)
    return {
      ok: false,
      problems: [{ field: 'parameters', reason: 'choose at least one parameter to vary' }],
    };
  const read = drafts.map((d, i) => toParameter(d, i, system));
  const problems = [
    ...read.flatMap((r) => ('problem' in r ? [r.problem] : [])),
    ...deletedPicks(drafts, library),
  ];
  if (problems.length > 0) return { ok: false, problems };
  const parameters = read.flatMap((r) => ('parameter' in r ? [r.parameter] : []));
  try {
    return { ok: true, parameters, plan: planSweep(a, parameters, cap) };
  } catch (e) {
    if (e instanceof CalcInputError) return { ok: false, problems: [{ field: e.field, reason: e.reason }] };
    throw e;
  }
}

/** The draft index and the box a problem's field names: `parameters.1.range.step` → 1, 'step'. */
export function problemBox(field: string): { parameter: number | null; box: string } {
  const m =
    /^parameters\.(\d+)(?:\.(range\.(start|stop|step)|list|layer|bridge|joint|products|entries))?/.exec(
      field,
    );
  if (!m) return { parameter: null, box: '' };
  return { parameter: Number(m[1]), box: m[3] ?? (m[2] === undefined ? '' : m[2]) };
}
