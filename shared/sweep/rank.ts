import { CalcInputError } from '../calc/errors';
import type { MovementClass } from '../calc/joints/schema';
import { findMaterial } from '../calc/thermal/materials';
import type { AssemblyInput } from '../schemas/assembly';
import type { SweepCosts, SweepRanking, SweepVariantResult } from './schema';
import { applyVariant, type SweepPlan } from './sweep';

/*
 * The leanest passing wall: the passing variants of a sweep ranked by the cost, per m² of wall, of what the
 * sweep varies, by the wall's thickness or by its weight. Quantities per m² of wall: insulation d/25 mm (priced
 * per m² per 25 mm; a product parameter's layer at that product's price, d the thickness parameter's value when
 * it varies the same layer, else the layer's own); clips 1/(s_girt·s_clip) (one per girt per clip spacing);
 * girts 1/s_girt (m of girt per m²); sealant the given m/m² at the class's price.
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
  // A layer whose product varies is priced with its product (below), not at `costs.insulation` too.
  const productLayers = plan.axes.flatMap((x) => (x.kind === 'insulationProduct' ? [x.layer] : []));
  let cost = 0;
  plan.axes.forEach((axis, i) => {
    if (axis.kind === 'insulationProduct') {
      const name = values[i] as string;
      const prices = costs.insulationProducts ?? {};
      const price = need(
        Object.hasOwn(prices, name) ? prices[name] : undefined, // a product named "toString" is not priced by it
        `costs.insulationProducts.${name}`,
        `the insulation product (${name})`,
      );
      const thick = plan.axes.findIndex((x) => x.kind === 'insulationThickness' && x.layer === axis.layer);
      const layer = a.thermal.layers[axis.layer!]!;
      const d = thick < 0 ? (layer.thickness ?? 0) : (values[thick] as number);
      cost += (price * d) / PRICE_THICKNESS;
    }
    if (axis.kind === 'insulationThickness' && !productLayers.includes(axis.layer))
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

/** What the passing variants are ranked by: cost of what varies, total wall thickness, or weight. */
export type RankMeasure = 'cost' | 'thickness' | 'weight';

const layerName = (a: AssemblyInput, i: number) => `layer ${i + 1} (${a.thermal.layers[i]!.name})`;

/** Total wall thickness of one variant, m: Σ d of its layers (a resistance layer without d is refused). */
export function variantThickness(plan: SweepPlan, a: AssemblyInput, values: readonly (number | string)[]) {
  return applyVariant(plan, a, values).thermal.layers.reduce((sum, layer, i) => {
    if (layer.thickness === undefined)
      throw new CalcInputError(
        `thermal.layers.${i}.thickness`,
        `${layerName(a, i)} has no thickness: enter it to rank by wall thickness`,
      );
    return sum + layer.thickness;
  }, 0);
}

/**
 * Mass per m² of wall of one variant, kg/m²: Σ d·ρ of its layers. ρ is the generic material's
 * (data/reference/materials.json) or the varied product's; an air layer counts 0 (ρ ≈ 1.2 kg/m³: at most
 * 0.36 kg/m² at 0.3 m). A layer without a density (a framed or resistance layer, a typed material, a product
 * without ρ) is refused, named, rather than guessed.
 */
export function variantWeight(plan: SweepPlan, a: AssemblyInput, values: readonly (number | string)[]) {
  const product = new Map(
    plan.axes.flatMap((x, i) =>
      x.kind === 'insulationProduct' ? [[x.layer!, x.products?.find((p) => p.name === values[i])]] : [],
    ),
  );
  return applyVariant(plan, a, values).thermal.layers.reduce((sum, layer, i) => {
    if (layer.kind === 'air') return sum;
    const density =
      layer.kind !== 'homogeneous'
        ? undefined
        : product.has(i)
          ? product.get(i)?.density
          : layer.materialId === undefined
            ? undefined
            : findMaterial(layer.materialId)?.density;
    if (density === undefined || layer.thickness === undefined)
      throw new CalcInputError(
        `thermal.layers.${i}`,
        `${layerName(a, i)}${product.has(i) ? `, ${product.get(i)?.name ?? 'its product'},` : ''} has no density: the wall's weight cannot be ranked`,
      );
    return sum + layer.thickness * density;
  }, 0);
}

/** The measure of one variant's values: cost per m² of wall, thickness in m, or mass in kg/m². */
export function measureOf(measure: RankMeasure, plan: SweepPlan, a: AssemblyInput, costs: SweepCosts) {
  return (values: readonly (number | string)[]) =>
    measure === 'cost'
      ? variantCost(plan, a, values, costs)
      : measure === 'thickness'
        ? variantThickness(plan, a, values)
        : variantWeight(plan, a, values);
}

/** Passing variants ranked by one measure: least first (equal ones in enumeration order). */
export interface MeasureRanking {
  ranked: {
    index: number;
    values: (number | string)[];
    value: number;
    governing: SweepVariantResult['governing'];
  }[];
  /** Runner-up − first, and that over the first (null when the first measures 0). */
  runnerUp: { difference: number; ratio: number | null } | null;
  notPassing: number;
}

/**
 * The passing variants least first by `value` (equal values in enumeration order), each with what governs it,
 * and how far the runner-up is from the first. Failing and incomplete variants are left out and counted.
 */
export function rankBy(
  variants: readonly SweepVariantResult[],
  value: (values: readonly (number | string)[]) => number,
): MeasureRanking {
  const passing = variants.filter((v) => v.verdict === 'pass');
  const ranked = passing
    .map((v) => ({ index: v.index, values: v.values, value: value(v.values), governing: v.governing }))
    .sort((x, y) => x.value - y.value || x.index - y.index);
  const [first, second] = ranked;
  return {
    ranked,
    runnerUp:
      first && second
        ? {
            difference: second.value - first.value,
            ratio: first.value > 0 ? (second.value - first.value) / first.value : null,
          }
        : null,
    notPassing: variants.length - passing.length,
  };
}

/** The passing variants cheapest first (`rankBy` on cost), in the API's words. */
export function rankVariants(
  plan: SweepPlan,
  a: AssemblyInput,
  variants: readonly SweepVariantResult[],
  costs: SweepCosts,
): SweepRanking {
  const r = rankBy(variants, measureOf('cost', plan, a, costs));
  return {
    ranked: r.ranked.map(({ value, ...v }) => ({ ...v, cost: value })),
    runnerUp: r.runnerUp && { costDifference: r.runnerUp.difference, costRatio: r.runnerUp.ratio },
    notPassing: r.notPassing,
  };
}
