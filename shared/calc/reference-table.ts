import { z } from 'zod';

/**
 * A bundled reference table (`data/reference/*.json`: `{ version: 1, note, materials: [rows] }`, unique ids),
 * parsed and validated when its module is imported — a malformed file throws — with a lookup by id
 * (undefined when unknown).
 */
export function referenceTable<Row extends { id: string }>(row: z.ZodType<Row>, raw: unknown) {
  const rows: readonly Row[] = z
    .object({ version: z.literal(1), note: z.string(), materials: z.array(row).min(1) })
    .refine((t) => new Set(t.materials.map((r) => r.id)).size === t.materials.length, {
      message: 'material ids must be unique',
    })
    .parse(raw).materials;
  const byId = new Map(rows.map((r) => [r.id, r]));
  return { rows, find: (id: string): Row | undefined => byId.get(id) };
}
