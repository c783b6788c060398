import { z } from 'zod';
import { calendarDate, text } from '../../schemas/common';
import { MAX_COORD } from './schema';
import {
  clipTemplateSchema,
  edgeTemplateSchema,
  fastenerTemplateSchema,
  girtTemplateSchema,
} from './template-schema';

/*
 * What a χ or ψ computed by the bridge solver carries with it — on the assembly's bridge (its source) and in a
 * firm library entry: the detail it was solved from (so it can be drawn and solved again), the solve (engine,
 * date, mesh, iterations, energy balance), the coldest inside surface and f_Rsi, and a coarse temperature map.
 */

/** Cells of the stored map along each axis at most (the map a sheet draws; the solve's own field is finer). */
export const MAP_CELLS = 48;

const coord = z.number().min(-MAX_COORD).max(MAX_COORD);
const temperature = z.number().min(-80).max(80).describe('Temperature θ, °C');

export const bridgeMapSchema = z
  .object({
    x: z
      .array(coord)
      .min(2)
      .max(MAP_CELLS + 1)
      .describe('Cell edges along x, m'),
    y: z
      .array(coord)
      .min(2)
      .max(MAP_CELLS + 1)
      .describe('Cell edges along y, m'),
    values: z
      .array(temperature.nullable())
      .max(MAP_CELLS * MAP_CELLS)
      .describe('Cell temperatures row by row (y outer), °C; null = no material'),
  })
  .refine((m) => m.values.length === (m.x.length - 1) * (m.y.length - 1), {
    message: 'one value per cell: (x edges − 1) × (y edges − 1)',
    path: ['values'],
  });

/** The detail a value was solved from: a template and its inputs. */
export const bridgeDetailSchema = z.discriminatedUnion('template', [
  z.object({ template: z.literal('girt'), input: girtTemplateSchema }),
  z.object({ template: z.literal('clip'), input: clipTemplateSchema }),
  z.object({ template: z.literal('fastener'), input: fastenerTemplateSchema }),
  z.object({ template: z.literal('edge'), input: edgeTemplateSchema }),
]);
export type BridgeDetail = z.infer<typeof bridgeDetailSchema>;
export type BridgeDetailInput = z.input<typeof bridgeDetailSchema>;

export const computedBridgeSchema = z.object({
  detail: bridgeDetailSchema,
  engineVersion: text(40).min(1),
  date: calendarDate(),
  cells: z.number().int().min(1).max(10_000_000),
  iterations: z.number().int().min(0).max(10_000_000),
  energyBalance: z.number().min(0).max(1).describe('|Σ heat in − Σ heat out| / Σ heat in'),
  value: z.number().min(-10).max(10).describe('χ (W/K) or ψ (W/(m·K)) as solved'),
  inside: temperature.describe('Inside environment θi, °C'),
  outside: temperature.describe('Outside environment θe, °C'),
  minInsideSurface: temperature.describe('θsi,min at the bridge, °C'),
  fRsi: z.number().min(-1).max(2).describe('f_Rsi = (θsi,min − θe) / (θi − θe) at the bridge'),
  surface: z
    .object({
      rsi: z
        .number()
        .min(0)
        .max(1)
        .describe('Inside surface resistance of the surface-humidity check, m²·K/W'),
      fRsi: z.number().min(-1).max(2),
      minInsideSurface: temperature,
    })
    .describe('The same detail solved with Rsi = 0.25 m²·K/W for the ISO 13788 surface check'),
  map: bridgeMapSchema,
});
export type ComputedBridge = z.infer<typeof computedBridgeSchema>;

/** χ (3-D: clip, fastener) or ψ (2-D: girt, edge) — what a detail gives. */
export const detailGives = (d: Pick<BridgeDetail, 'template'>): 'chi' | 'psi' =>
  d.template === 'clip' || d.template === 'fastener' ? 'chi' : 'psi';
