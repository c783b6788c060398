import { CalcInputError } from '../calc/errors';
import type { MovementClass } from '../calc/joints/schema';
import type { AssemblyInput } from '../schemas/assembly';
import type { SweepCosts, SweepRanking, SweepVariantResult } from './schema';
import type { SweepPlan } from './sweep';

/*
 * The leanest passing wall: the passing variants of a sweep ranked by the cost, per m² of wall, of what the
 * sweep varies. Quantities per m² of wall: insulation d/25 mm (priced per m² per 25 mm); clips 1/(s_girt·s_clip)
 * (one per girt per clip spacing); girts 1/s_girt (m of girt per m²); sealant the given m/m² at the class's price.
 */

/** Insulation thickness the price is quoted per, m (25 mm). */
export const PRICE_THICKNESS = 0.025;

const need = <T>(value: T | undefined, field: string, what: string): T => {
  if (value === undefined) throw new CalcInputError(field, `the sweep varies ${what}: give its cost`);
  return value;
};

/** Cost per m² of wall of what the sweep varies, for one variant's values on assembly `a`. */
export function variantCost(
  plan: SweepPlan,
  a: AssemblyInput,
  values: readonly (number | string)[],
  costs: SweepCosts,
): number {
  const kinds = plan.axes.map((x) => x.kind);
  const valueAt = (kind: string) => {
    const i = kinds.indexOf(kind as (typeof kinds)[number]);
    return i < 0 ? undefined : (values[i] as number);
  };
  let cost = 0;
  plan.axes.forEach((axis, i) => {
    if (axis.kind === 'insulationThickness')
      cost +=
        (need(costs.insulation, 'costs.insulation', 'insulation thickness') * (values[i] as number)) /
        PRICE_THICKNESS;
    if (axis.kind === 'sealantClass') {
      const s = need(costs.sealant, 'costs.sealant', 'the sealant class');
      const cls = values[i] as MovementClass;
      const price = need(s.perMetre[cls], `costs.sealant.perMetre.${cls}`, `the sealant class (${cls})`);
      cost += price * s.metresPerSquareMetre;
    }
  });
  const girt = valueAt('girtSpacing');
  const clip = valueAt('clipSpacing');
  if (girt !== undefined || clip !== undefined) {
    const sg = girt ?? a.attachment.girtSpacing;
    const sc = clip ?? a.attachment.clipSpacing;
    if (girt !== undefined) cost += need(costs.girt, 'costs.girt', 'the girt spacing') / girt;
    if (sg !== undefined && sc !== undefined)
      cost += need(costs.clip, 'costs.clip', 'the girt or clip spacing') / (sg * sc);
  }
  return cost;
}

/**
 * Refuses, before any variant runs, costs that lack a price for something the sweep varies (every value of every
 * parameter is priced once, the others at their first value): the same refusal `variantCost` would give later.
 */
export function checkCosts(plan: SweepPlan, a: AssemblyInput, costs: SweepCosts): void {
  const first = plan.axes.map((x) => x.values[0]!);
  plan.axes.forEach((axis, i) => {
    for (const v of axis.values) variantCost(plan, a, first.with(i, v), costs);
  });
}

/**
 * The passing variants cheapest first (equal costs in enumeration order), each with what governs it, and how
 * far the runner-up is from the cheapest. Failing and incomplete variants are left out and counted.
 */
export function rankVariants(
  plan: SweepPlan,
  a: AssemblyInput,
  variants: readonly SweepVariantResult[],
  costs: SweepCosts,
): SweepRanking {
  const passing = variants.filter((v) => v.verdict === 'pass');
  const ranked = passing
    .map((v) => ({
      index: v.index,
      values: v.values,
      cost: variantCost(plan, a, v.values, costs),
      governing: v.governing,
    }))
    .sort((x, y) => x.cost - y.cost || x.index - y.index);
  const [first, second] = ranked;
  return {
    ranked,
    runnerUp:
      first && second
        ? {
            costDifference: second.cost - first.cost,
            costRatio: first.cost > 0 ? (second.cost - first.cost) / first.cost : null,
          }
        : null,
    notPassing: variants.length - passing.length,
  };
}
