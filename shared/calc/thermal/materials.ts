import raw from '@data/reference/materials.json';
import { z } from 'zod';
import { referenceTable } from '../reference-table';

/** One generic material (data/reference/materials.json; sources in materials.source.md). */
export const materialSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/),
  name: z.string().min(1),
  category: z.enum(['metal', 'board', 'timber', 'insulation', 'masonry', 'glass', 'gas', 'membrane']),
  conductivity: z.number().positive().describe('Design thermal conductivity λ, W/(m·K) (greater than 0)'),
  density: z.number().positive().describe('Density ρ, kg/m³ (greater than 0)'),
  mu: z.object({
    dry: z
      .number()
      .positive()
      .nullable()
      .describe('Vapour resistance factor μ (dry cup), dimensionless; null = ∞'),
    wet: z
      .number()
      .positive()
      .nullable()
      .describe('Vapour resistance factor μ (wet cup), dimensionless; null = ∞'),
  }),
  source: z.string().min(1).describe('Standard or handbook, edition and table the value belongs to'),
});

/** How a library value is worded wherever it is shown (how each row was checked is in materials.source.md). */
export const GENERIC_MATERIAL_NOTE =
  'Generic design value (ISO 10456 / ASHRAE Fundamentals) — use the maker’s declared value';
export type Material = z.infer<typeof materialSchema>;

const library = referenceTable(materialSchema, raw);

/** The parsed, validated library; importing this module throws if the JSON is malformed. */
export const materials: readonly Material[] = library.rows;

/** Look a material up by id; undefined when unknown. */
export const findMaterial = library.find;
