import { CRITERION_TYPES, type CriterionType } from '@shared/checks/criteria';
import type { Check, CheckReport } from '@shared/checks/report';
import type { SweepParameterKind, SweepVariantResult } from '@shared/sweep/schema';
import type { UnitSystem } from '@shared/units';
import { formatMeasure, type Measure, toShown } from '../assemblies/units';

/*
 * How a sweep's results read: a parameter's value in the person's units, the figure a code-table check was
 * judged on (recovered from its signed margin and the row's limit), and one slice of the variants — across one
 * parameter, one line or row per value of a second, the others held — for the chart and the pass/fail map.
 */

type Value = number | string;

const measureOfKind = (kind: SweepParameterKind): Measure =>
  kind === 'insulationThickness' ? 'thickness' : kind === 'clipChi' ? 'chi' : 'spacing';

/** A parameter's value as it reads: "75 mm", "3 in", "±25 %" (a sealant class), a product's or clip's name. */
export const valueText = (kind: SweepParameterKind, v: Value, system: UnitSystem) =>
  typeof v === 'number'
    ? formatMeasure(v, measureOfKind(kind), system)
    : kind !== 'sealantClass'
      ? v
      : v === '100/50'
        ? '+100/−50 %'
        : `±${v} %`;

/** A numeric value in the person's units (a chart's axis), and that unit. */
export const shownValue = (kind: SweepParameterKind, v: number, system: UnitSystem) =>
  toShown(v, measureOfKind(kind), system);

/** A code-table check that can be drawn: a number with a limit, and how it is shown. */
export interface DrawnCheck {
  id: string;
  label: string;
  direction: 'max' | 'min';
  required: number;
  /** The shown unit and how SI becomes it. */
  unit: string;
  shown: (si: number) => number;
  decimals: number;
}

/** The code table's numeric checks of the assembly as it is (their limits do not vary within a sweep). */
export function drawnChecks(base: CheckReport, system: UnitSystem): DrawnCheck[] {
  return base.checks.flatMap((c: Check) => {
    if (c.source !== 'criteria' || typeof c.required !== 'number') return [];
    if (c.direction !== 'max' && c.direction !== 'min') return [];
    const spec = CRITERION_TYPES[c.criterion as CriterionType];
    if (!spec) return [];
    const d = spec.display[system];
    return [
      {
        id: c.id,
        label: c.label,
        direction: c.direction,
        required: c.required,
        unit: d.symbol,
        shown: (si: number) => si / d.toSI,
        decimals: spec.decimals[system] + 1,
      },
    ];
  });
}

/** What a variant provides for a check, SI: margin = required − provided (max) or provided − required (min). */
export function providedOf(v: SweepVariantResult, check: DrawnCheck): number | null {
  const c = v.checks.find((x) => x.id === check.id);
  if (!c || c.margin === null) return null;
  return check.direction === 'max' ? check.required - c.margin : check.required + c.margin;
}

/** The variant number of one value index per parameter (mixed radix, the last parameter fastest). */
export const variantIndex = (sizes: readonly number[], at: readonly number[]) =>
  sizes.reduce((n, size, i) => n * size + (at[i] ?? 0), 0);

/** A view of a sweep: the parameter across, the one per line (or row), and the value index held for the rest. */
export interface Slice {
  across: number;
  lines: number | null;
  held: number[];
}

/** A slice as the chart and the pass/fail map draw it: its variants by [line][across] and the sweep's axes. */
export interface DrawnSlice {
  grid: (SweepVariantResult | undefined)[][];
  kinds: SweepParameterKind[];
  values: Value[][];
  across: number;
  lines: number | null;
  system: UnitSystem;
}

/**
 * The variants of a slice, by [line][across] (one line when none is chosen); undefined where a variant has not
 * come back yet.
 */
export function sliceVariants(
  sizes: readonly number[],
  slice: Slice,
  byIndex: ReadonlyMap<number, SweepVariantResult>,
): (SweepVariantResult | undefined)[][] {
  const lineCount = slice.lines === null ? 1 : sizes[slice.lines]!;
  return Array.from({ length: lineCount }, (_, l) =>
    Array.from({ length: sizes[slice.across]! }, (_, x) => {
      const at = sizes.map((_, i) => (i === slice.across ? x : i === slice.lines ? l : (slice.held[i] ?? 0)));
      return byIndex.get(variantIndex(sizes, at));
    }),
  );
}

/** At most `max` evenly spread indices of `n` (the first and the last always among them). */
export function spread(n: number, max: number): number[] {
  if (n <= max) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: max }, (_, i) => Math.round((i * (n - 1)) / (max - 1)));
}
