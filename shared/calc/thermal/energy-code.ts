import raw from '@data/reference/steel-framing-effective-r.json';
import { INCH, R_IP_TO_SI } from '@shared/units';
import { z } from 'zod';
import type { HeatFlow } from './schema';

/*
 * Energy-code path for steel-framed walls: the effective R-value of the insulation/framing layer from the
 * energy standard's own table, added in series with the other layers and the standard's air films
 * (ANSI/ASHRAE/IES Standard 90.1-2016 Normative Appendix A, Table A9.2-2 and §A9.4.1; rows and sources in
 * data/reference/steel-framing-effective-r.json and its .source.md). Interpolation in rated R only, never
 * extrapolation (§A1.1).
 */

const rowSchema = z.object({
  nominalDepthIn: z.number().positive(),
  actualDepthIn: z.number().positive(),
  ratedR: z.number().positive(),
  effectiveR16: z.number().positive(),
  effectiveR24: z.number().positive(),
});
const tableSchema = z.object({
  version: z.literal(1),
  note: z.string(),
  standard: z.string().min(1),
  table: z.string().min(1),
  unit: z.literal('h·ft²·°F/Btu'),
  matching: z.object({
    depthToleranceIn: z.number().positive(),
    spacingToleranceIn: z.number().positive(),
    ratedRToleranceIp: z.number().positive(),
  }),
  airFilms: z.object({
    source: z.string().min(1),
    exterior: z.number().positive(),
    interiorHorizontalFlow: z.number().positive(),
    interiorUpwardFlow: z.number().positive(),
    interiorDownwardFlow: z.number().positive(),
  }),
  rows: z.array(rowSchema).min(1),
});

/** The parsed table; importing this module throws if the JSON is malformed. */
export const STEEL_FRAMING_TABLE = tableSchema.parse(raw);

const T = STEEL_FRAMING_TABLE;
/** "ANSI/ASHRAE/IES Standard 90.1-2016, Normative Appendix A, Table A9.2-2 …" — printed with every use. */
export const ENERGY_CODE_SOURCE = `${T.standard}, ${T.table.split(' — ')[0]}`;
export const ENERGY_CODE_FILMS_SOURCE = T.airFilms.source;
const SPACINGS_IN = [16, 24] as const;

/** Air films of the energy standard, m²·K/W: exterior R-0.17; interior by heat-flow direction (§A9.4.1). */
export function energyCodeFilms(heatFlow: HeatFlow): { exterior: number; interior: number } {
  const f = T.airFilms;
  const interior =
    heatFlow === 'horizontal'
      ? f.interiorHorizontalFlow
      : heatFlow === 'upward'
        ? f.interiorUpwardFlow
        : f.interiorDownwardFlow;
  return { exterior: f.exterior * R_IP_TO_SI, interior: interior * R_IP_TO_SI };
}

export type SteelFramingLookup =
  | {
      status: 'applied';
      /** Effective framing/cavity R of the layer, m²·K/W. */
      framingR: number;
      /** Rated R of the cavity insulation, h·ft²·°F/Btu (as the table is entered). */
      ratedRIp: number;
      /** The row(s) used, in the table's words. */
      row: string;
    }
  | { status: 'refused'; reason: string };

const fmt = (x: number, digits = 2) => String(Number(x.toFixed(digits)));

/**
 * Effective R of a steel stud/cavity layer (Table A9.2-2): the row of the stud depth and spacing, linear
 * interpolation in rated R between its rows (§A1.1), refused outside them. SI in and out.
 */
export function steelFramingEffectiveR(
  depth: number,
  spacing: number,
  ratedR: number,
  heatFlow: HeatFlow,
): SteelFramingLookup {
  const tableName = T.table.split(' — ')[0];
  if (heatFlow !== 'horizontal')
    return { status: 'refused', reason: `${tableName} is for walls; heat flows ${heatFlow} here` };
  const depthIn = depth / INCH;
  const spacingIn = spacing / INCH;
  const ratedRIp = ratedR / R_IP_TO_SI;
  const rows = T.rows.filter(
    (r) => Math.abs(r.actualDepthIn - depthIn) <= T.matching.depthToleranceIn + 1e-9,
  );
  if (rows.length === 0)
    return {
      status: 'refused',
      reason: `${tableName} tabulates stud depths of ${[...new Set(T.rows.map((r) => r.actualDepthIn))].join(', ')} in; this stud is ${fmt(depthIn)} in (${fmt(depth * 1000, 1)} mm) deep`,
    };
  const at = SPACINGS_IN.find((s) => Math.abs(s - spacingIn) <= T.matching.spacingToleranceIn + 1e-9);
  if (at === undefined)
    return {
      status: 'refused',
      reason: `${tableName} tabulates studs at 16 in and 24 in on centre; these are at ${fmt(spacingIn)} in (${fmt(spacing * 1000, 0)} mm)`,
    };
  const value = (r: (typeof rows)[number]) => (at === 16 ? r.effectiveR16 : r.effectiveR24);
  const sorted = [...rows].sort((a, b) => a.ratedR - b.ratedR);
  const first = sorted[0]!;
  const last = sorted[sorted.length - 1]!;
  const tol = T.matching.ratedRToleranceIp;
  const where = `${first.actualDepthIn} in studs at ${at} in on centre`;
  if (ratedRIp < first.ratedR - tol || ratedRIp > last.ratedR + tol)
    return {
      status: 'refused',
      reason: `${tableName} covers rated R-${first.ratedR}${first === last ? '' : ` to R-${last.ratedR}`} for ${where}; this cavity is R-${fmt(ratedRIp, 1)} and the standard does not allow extrapolation`,
    };
  const r = Math.min(Math.max(ratedRIp, first.ratedR), last.ratedR);
  let k = 0;
  while (k < sorted.length - 1 && r > sorted[k + 1]!.ratedR) k++;
  const a = sorted[k]!;
  const b = sorted[Math.min(k + 1, sorted.length - 1)]!;
  const exact = a === b || r === a.ratedR || r === b.ratedR;
  const effective =
    a === b ? value(a) : value(a) + ((value(b) - value(a)) * (r - a.ratedR)) / (b.ratedR - a.ratedR);
  return {
    status: 'applied',
    framingR: effective * R_IP_TO_SI,
    ratedRIp,
    row: exact
      ? `${where}, rated R-${r === b.ratedR ? b.ratedR : a.ratedR} → effective R-${value(r === b.ratedR ? b : a).toFixed(1)}`
      : `${where}, rated R-${ratedRIp.toFixed(1)} interpolated between R-${a.ratedR} (effective R-${value(a).toFixed(1)}) and R-${b.ratedR} (R-${value(b).toFixed(1)}) → effective R-${effective.toFixed(2)}`,
  };
}
