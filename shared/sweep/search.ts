import type { CriteriaRowInput } from '../checks/criteria';
import type { ProjectForChecks } from '../checks/inputs';
import type { CheckModule } from '../checks/module';
import { CHECK_MODULES } from '../checks/modules';
import type { AssemblyInput } from '../schemas/assembly';
import type { SweepExploration, SweepParameter, SweepResult, SweepVariantResult } from './schema';
import { planSweep, type SweepPlan, variantRunner } from './sweep';

/*
 * A sweep too large to run every variant: a bounded search that says what it explored. It leans on one
 * property, held by `search.property.test.ts` before anything relies on it: more insulation never raises U
 * (and never lowers R_eff, the continuous or the cavity insulation R). So for each combination of the other
 * parameters, a binary search over the thickness finds the thinnest thickness whose thermal criteria do not
 * fail — every thinner one fails them, and fails — and the thicknesses from there are checked upwards until
 * one passes everything: the thinnest (and, at any insulation price ≥ 0, the cheapest) passing variant of
 * that combination; the thicker ones cost as much or more and are not run. Without a thickness to vary, the
 * variants are sampled evenly. Either way the budget of variants run is never passed, and what is left is
 * counted as unexplored.
 */

/** Above this many combinations a sweep is searched, not run whole (the limit: 100 000). */
export const SWEEP_SEARCH_THRESHOLD = 100_000;
/** Most combinations a searched sweep may name (each parameter's values are capped by `SWEEP_MAX_LIST`/ranges). */
export const SWEEP_SEARCH_MAX_COMBINATIONS = 1e9;
/** Most values one range may name in a searched sweep. */
export const SWEEP_SEARCH_MAX_VALUES = 100_000;

/** The criteria whose metric only improves as insulation is added (the monotone ones). */
export const THERMAL_MONOTONE_CHECKS: ReadonlySet<string> = new Set([
  'criterion.max_u_factor',
  'criterion.min_effective_r',
  'criterion.min_continuous_insulation_r',
  'criterion.min_cavity_insulation_r',
]);

/** Whether a variant fails a thermal criterion (by the property, so does every thinner one). */
export const failsThermally = (v: SweepVariantResult) =>
  v.checks.some((c) => c.status === 'fail' && THERMAL_MONOTONE_CHECKS.has(c.id));

/** The index of the variant at `positions` (one value position per axis; the last axis fastest). */
function indexAt(plan: SweepPlan, positions: readonly number[]): number {
  let index = 0;
  for (let i = 0; i < plan.axes.length; i++) index = index * plan.axes[i]!.values.length + positions[i]!;
  return index;
}

/**
 * The value positions of number `k` in the enumeration of every axis but `skip` (mixed radix, the last axis
 * fastest; `skip` −1: of every axis, so `k` is a variant's index); the skipped axis is left at 0.
 */
function positionsOf(plan: SweepPlan, k: number, skip = -1): number[] {
  const positions: number[] = new Array(plan.axes.length).fill(0);
  let rest = k;
  for (let i = plan.axes.length - 1; i >= 0; i--) {
    if (i === skip) continue;
    const n = plan.axes[i]!.values.length;
    positions[i] = rest % n;
    rest = Math.floor(rest / n);
  }
  return positions;
}

/**
 * Runs a sweep whole when it names at most `budget` variants; otherwise searches it, running at most `budget`
 * variants, and says what was and was not explored. The variants returned are the ones run, in enumeration
 * order. Refusals are planSweep's (a searched sweep may name up to `SWEEP_SEARCH_MAX_COMBINATIONS`).
 */
export function searchSweep(
  a: AssemblyInput,
  project: ProjectForChecks,
  rows: readonly CriteriaRowInput[],
  parameters: readonly SweepParameter[],
  budget: number,
  modules: readonly CheckModule[] = CHECK_MODULES,
): Omit<SweepResult, 'ranking'> & { plan: SweepPlan; exploration: SweepExploration } {
  const plan = planSweep(a, parameters, SWEEP_SEARCH_MAX_COMBINATIONS, SWEEP_SEARCH_MAX_VALUES);
  const run = variantRunner(plan, a, project, rows, modules);
  const done = new Map<number, SweepVariantResult>();
  const at = (positions: readonly number[]) => {
    const index = indexAt(plan, positions);
    let v = done.get(index);
    if (!v) {
      v = run(
        index,
        positions.map((p, i) => plan.axes[i]!.values[p]!),
      );
      done.set(index, v);
    }
    return v;
  };
  const parameterValues = plan.axes.map((x) => ({ kind: x.kind, values: [...x.values] }));
  const result = (exploration: SweepExploration) => ({
    plan,
    count: plan.count,
    parameters: parameterValues,
    variants: [...done.values()].sort((x, y) => x.index - y.index),
    exploration,
  });

  if (plan.count <= budget) {
    for (let index = 0; index < plan.count; index++) at(positionsOf(plan, index));
    return result({
      mode: 'exhaustive',
      combinations: plan.count,
      evaluated: plan.count,
      provenFailing: 0,
      costlier: 0,
      unexplored: 0,
      notes: ['Every variant was run.'],
    });
  }

  const t = plan.axes.findIndex((x) => x.kind === 'insulationThickness');
  if (t < 0) {
    // No monotone parameter: an even sample of the variants, every stride-th one.
    const stride = Math.ceil(plan.count / budget);
    for (let index = 0; index < plan.count; index += stride) at(positionsOf(plan, index));
    return result({
      mode: 'bounded',
      combinations: plan.count,
      evaluated: done.size,
      provenFailing: 0,
      costlier: 0,
      unexplored: plan.count - done.size,
      notes: [
        `${plan.count} combinations exceed the budget of ${budget}: no insulation thickness is varied, so nothing can be ruled out — every ${stride}th variant was run, the others were not explored.`,
      ],
    });
  }

  const thickness = plan.axes[t]!.values as readonly number[];
  const order = thickness.map((_, i) => i).sort((x, y) => thickness[x]! - thickness[y]! || x - y);
  const n = order.length;
  const combos = plan.count / n;
  let provenFailing = 0;
  let costlier = 0;
  let finished = 0;
  let noneFound = 0;
  for (let k = 0; k < combos; k++) {
    const positions = positionsOf(plan, k, t);
    const indexOf = (j: number) => {
      positions[t] = order[j]!;
      return indexAt(plan, positions);
    };
    const atThickness = (j: number) => {
      positions[t] = order[j]!;
      return at(positions);
    };
    // Whether thickness j may be looked at: already run, or the budget has room.
    const may = (j: number) => done.has(indexOf(j)) || done.size < budget;
    // The thinnest thickness whose thermal criteria do not fail: binary search (fails for all below it).
    let lo = 0;
    let hi = n;
    while (lo < hi && may((lo + hi) >> 1)) {
      const mid = (lo + hi) >> 1;
      if (failsThermally(atThickness(mid))) lo = mid + 1;
      else hi = mid;
    }
    if (lo < hi) break;
    let j = lo;
    while (j < n && may(j) && atThickness(j).verdict !== 'pass') j++;
    if (j < n && !may(j)) break;
    // Ruled out without running: below lo by the property, above j by cost (those the binary search ran are counted as run).
    for (let x = 0; x < n; x++)
      if ((x < lo || (x > j && j < n)) && !done.has(indexOf(x))) x < lo ? provenFailing++ : costlier++;
    if (j === n) noneFound++;
    finished++;
  }
  const evaluated = done.size;
  const unexplored = plan.count - evaluated - provenFailing - costlier;
  const notes = [
    `${plan.count} combinations exceed the budget of ${budget} variants run, so the space was searched: more insulation never raises U (nor lowers R), so for each combination of the other parameters a binary search found the thinnest insulation thickness that meets the thermal criteria, and thicker ones were run upwards until one passed every check.`,
    `${provenFailing} thinner variants fail a thermal criterion by that property and were not run; ${costlier} thicker variants than the thinnest passing one of their combination cost as much or more and were not run.`,
    finished < combos
      ? `The budget ran out after ${finished} of ${combos} combinations of the other parameters: ${unexplored} variants were not explored.`
      : 'Every combination of the other parameters was searched.',
  ];
  if (noneFound > 0) notes.push(`${noneFound} combinations have no passing thickness in the range.`);
  return result({
    mode: 'bounded',
    combinations: plan.count,
    evaluated,
    provenFailing,
    costlier,
    unexplored,
    notes,
  });
}
