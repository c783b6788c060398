import { CalcInputError, requireInRange } from '@shared/calc/errors';
import type { HeatFlow } from '@shared/calc/thermal/schema';
import {
  airLayerResistance,
  firstKeptLayer,
  layerResistance,
  surfaceResistances,
} from '@shared/calc/thermal/thermal';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { engineMessage, type MoistureWarning } from '@shared/format/message-schema';
import { PERM_0C_TO_SI, PERM_23C_TO_SI } from '@shared/units';
import { assemblePath, DELTA_0, type DiffusionPath, type PathLayer, SUBLAYER_MAX_R } from './glaser';
import type { MoistureInput, MoistureLayer, MoistureLayerResult, MoistureNode, Vapour } from './schema';
import { M, ONE, RK, SRC_GLASER, SRC_LAYER_R, SRC_SD, SRC_SURFACE, SRC_SURFACE_R } from './sources';
import { RSI_SURFACE, temperatureFactor } from './surface';

/*
 * From the input layers to the diffusion path: thermal resistance by the thermal engine's own functions
 * (ISO 6946), s_d from each layer's vapour data, layers outside a well-ventilated air layer disregarded.
 */

/** A finite number greater than 0. */
const positive = (value: number, field: string, what: string): number =>
  requireInRange(value, Number.MIN_VALUE, Number.MAX_VALUE, field, what);

/** s_d of a layer from its vapour data, m: μ·d, δ₀/W, or δ₀/(perms × perm size). */
export function layerSd(vapour: Vapour, thickness: number | undefined, field: string): number {
  switch (vapour.kind) {
    case 'mu':
      if (thickness === undefined)
        throw new CalcInputError(
          `${field}.mu`,
          'μ needs a layer thickness; give s_d or a permeance for a declared-resistance layer',
        );
      return positive(vapour.mu, `${field}.mu`, 'μ') * thickness;
    case 'sd':
      return positive(vapour.sd, `${field}.sd`, 's_d');
    case 'permeance':
      return DELTA_0 / (positive(vapour.permeance, `${field}.permeance`, 'permeance') * 1e-12);
    case 'usPerm':
      return (
        DELTA_0 /
        (positive(vapour.perm, `${field}.perm`, 'permeance') *
          (vapour.reference === '23C' ? PERM_23C_TO_SI : PERM_0C_TO_SI))
      );
    default:
      throw new CalcInputError(`${field}.kind`, 'must be mu, sd, permeance or usPerm');
  }
}

interface LayerData {
  resistance: number;
  thickness: number | undefined;
  divisible: boolean;
  formula: string;
}

/**
 * R of a layer with the thermal engine's own functions. A framed layer is taken through its cavity (the
 * section of lowest λ): the clear field between members, coldest at the outer face — the members are
 * thermal bridges and are checked separately.
 */
function layerThermal(layer: MoistureLayer, i: number, heatFlow: HeatFlow): LayerData {
  const f = `layers.${i}`;
  switch (layer.kind) {
    case 'homogeneous': {
      const d = positive(layer.thickness, `${f}.thickness`, 'thickness');
      const R = layerResistance(d, positive(layer.conductivity, `${f}.conductivity`, 'conductivity λ'));
      return { resistance: R, thickness: d, divisible: true, formula: 'R = d/λ' };
    }
    case 'resistance':
      return {
        resistance: positive(layer.resistance, `${f}.resistance`, 'declared resistance'),
        thickness: undefined,
        divisible: true,
        formula: 'R = declared value',
      };
    case 'air': {
      const d = positive(layer.thickness, `${f}.thickness`, 'thickness');
      const R = airLayerResistance(d, heatFlow, layer.ventilation, layer.emissivityFactor);
      return { resistance: R, thickness: d, divisible: false, formula: 'R_g by ISO 6946 §6.9' };
    }
    case 'framed': {
      const d = positive(layer.thickness, `${f}.thickness`, 'thickness');
      if (layer.sections.length === 0)
        throw new CalcInputError(`${f}.sections`, 'needs at least one section');
      let lambda = Number.POSITIVE_INFINITY;
      layer.sections.forEach((s, q) => {
        lambda = Math.min(
          lambda,
          positive(s.conductivity, `${f}.sections.${q}.conductivity`, 'conductivity λ'),
        );
      });
      return {
        resistance: layerResistance(d, lambda),
        thickness: d,
        divisible: true,
        formula: 'R = d/λ_cavity',
      };
    }
    default:
      throw new CalcInputError(`${f}.kind`, 'must be homogeneous, resistance, air or framed');
  }
}

function nodeLabel(layers: readonly MoistureLayer[], outer: number, inner: number): string {
  if (outer < 0) return `Exterior surface of ${layers[inner]!.name}`;
  if (inner < 0) return `Interior surface of ${layers[outer]!.name}`;
  if (outer === inner) return `Within ${layers[outer]!.name}`;
  return `${layers[outer]!.name} | ${layers[inner]!.name}`;
}

function describeNodes(path: DiffusionPath, layers: readonly MoistureLayer[]): MoistureNode[] {
  const nodes: MoistureNode[] = [];
  for (let k = 0; k < path.nodeCount; k++) {
    const outer = path.outerLayer[k]!;
    const inner = path.innerLayer[k]!;
    nodes.push({
      kind:
        outer < 0
          ? 'exteriorSurface'
          : inner < 0
            ? 'interiorSurface'
            : outer === inner
              ? 'withinLayer'
              : 'interface',
      label: nodeLabel(layers, outer, inner),
      outerLayer: outer < 0 ? null : outer,
      innerLayer: inner < 0 ? null : inner,
      resistance: path.resistance[k]!,
      sd: path.sd[k]!,
    });
  }
  return nodes;
}

export interface Assembly {
  path: DiffusionPath;
  nodes: MoistureNode[];
  layers: MoistureLayerResult[];
  Rsi: number;
  Rse: number;
  /** f_Rsi of the clear field with Rsi = 0.25 m²·K/W. */
  fRsi: number;
}

/** Layers → diffusion path: R from the thermal engine's functions, s_d from the vapour data. */
export function assemble(input: MoistureInput, trace: TraceStep[], warnings: MoistureWarning[]): Assembly {
  const { layers, heatFlow } = input;
  const first = firstKeptLayer(layers);
  if (first === layers.length)
    throw new CalcInputError(`layers.${first - 1}`, 'no layer is left inside the well-ventilated air layer');
  const pathLayers: PathLayer[] = [];
  const results: MoistureLayerResult[] = layers.map((layer, i) => {
    const t = layerThermal(layer, i, heatFlow);
    const sd = layerSd(layer.vapour, t.thickness, `layers.${i}.vapour`);
    const included = i >= first;
    if (included) pathLayers.push({ resistance: t.resistance, sd, layer: i, divisible: t.divisible });
    trace.push(
      step(
        `moisture.layer.${i}.R`,
        `${layer.name}: thermal resistance`,
        t.formula,
        SRC_LAYER_R,
        {},
        t.resistance,
        RK,
      ),
      step(
        `moisture.layer.${i}.sd`,
        `${layer.name}: diffusion-equivalent air layer thickness`,
        layer.vapour.kind === 'mu'
          ? 's_d = μ·d'
          : layer.vapour.kind === 'sd'
            ? 's_d = declared value'
            : 's_d = δ₀/W',
        SRC_SD,
        {},
        sd,
        M,
        included ? undefined : 'Outside a well-ventilated air layer: disregarded',
      ),
    );
    if (layer.kind === 'air' && layer.ventilation === 'slightly' && included)
      warnings.push(
        engineMessage('slightly_ventilated_unventilated', `layers.${i}`, { layer: i, name: layer.name }),
      );
    if (layer.kind === 'framed' && included)
      warnings.push(
        engineMessage('framed_layer_between_members', `layers.${i}`, { layer: i, name: layer.name }),
      );
    return { name: layer.name, included, resistance: t.resistance, sd, sublayers: 0 };
  });
  if (first > 0)
    warnings.push(engineMessage('outside_ventilated_layer', `layers.${first - 1}`, { count: first }));

  const table = surfaceResistances(heatFlow);
  const Rsi = table.Rsi;
  const Rse = first > 0 ? Rsi : table.Rse;
  const path = assemblePath(pathLayers, Rsi, Rse);
  path.sublayers.forEach((count, j) => {
    results[pathLayers[j]!.layer]!.sublayers = count;
  });
  const surfaceRT = path.totalResistance - Rsi + RSI_SURFACE;
  const fRsi = temperatureFactor(surfaceRT);
  trace.push(
    step(
      'moisture.Rsi',
      'Internal surface resistance Rsi (interstitial)',
      'Rsi by heat-flow direction',
      SRC_SURFACE_R,
      {},
      Rsi,
      RK,
    ),
    step(
      'moisture.Rse',
      'External surface resistance Rse (interstitial)',
      first > 0 ? 'Rse = Rsi (well-ventilated air layer)' : 'Rse from Table 7',
      SRC_SURFACE_R,
      {},
      Rse,
      RK,
    ),
    step(
      'moisture.R_T',
      'Total thermal resistance R_T',
      'R_T = Rse + ΣR + Rsi',
      SRC_GLASER,
      {},
      path.totalResistance,
      RK,
      `Layers with R > ${SUBLAYER_MAX_R} m²·K/W are split into equal sub-layers for the profile`,
    ),
    step(
      'moisture.sd_T',
      'Total diffusion-equivalent thickness s_d,T',
      's_d,T = Σ s_d',
      SRC_GLASER,
      {},
      path.totalSd,
      M,
    ),
    step(
      'moisture.fRsi',
      'Temperature factor of the clear field f_Rsi',
      'f_Rsi = 1 − Rsi/R_T, Rsi = 0.25 m²·K/W',
      SRC_SURFACE,
      { Rsi: v(RSI_SURFACE, RK), R_T: v(surfaceRT, RK) },
      fRsi,
      ONE,
      'Clear field only: thermal bridges need their own f_Rsi (ISO 10211)',
    ),
  );
  return { path, nodes: describeNodes(path, layers), layers: results, Rsi, Rse, fRsi };
}
