import raw from '@data/reference/thermal-expansion.json';
import { z } from 'zod';
import { referenceTable } from '../reference-table';

const alpha = (what: string) => z.number().positive().max(5e-4).describe(`${what}, 1/K`);

/** One row of data/reference/thermal-expansion.json (sources in thermal-expansion.source.md). */
export const expansionMaterialSchema = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/),
  name: z.string().min(1),
  alpha: alpha('Mean linear coefficient of thermal expansion α near room temperature'),
  published: z.string().min(1).describe('The figure as the named table prints it'),
  range: z.object({ low: alpha('Low end'), high: alpha('High end') }).nullable(),
  source: z.string().min(1).describe('Table the value belongs to'),
});

/** How a table α is worded wherever it is shown (how each row was checked is in thermal-expansion.source.md). */
export const GENERIC_EXPANSION_NOTE = 'Generic value — use the maker’s declared coefficient where it differs';
export type ExpansionMaterial = z.infer<typeof expansionMaterialSchema>;

const table = referenceTable(expansionMaterialSchema, raw);

/** The parsed, validated table; importing this module throws if the JSON is malformed. */
export const expansionMaterials: readonly ExpansionMaterial[] = table.rows;

/** Look a material up by id; undefined when unknown. */
export const findExpansionMaterial = table.find;
