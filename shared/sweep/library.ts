import type { BridgeValue, OrgMaterial } from '../schemas/assembly';
import type { SweepClipEntry, SweepProduct } from './schema';

/*
 * A firm library entry as a sweep value: the same record whether the page picks it or the server reads it
 * again for a saved sweep (so both run the library's values, and the variant keeps the entry's name and source).
 */

/** A firm material as an insulation product of the sweep. */
export const productOf = (m: Omit<OrgMaterial, 'createdAt'>): SweepProduct => ({
  name: m.name,
  conductivity: m.conductivity,
  ...(m.density === undefined ? {} : { density: m.density }),
  ...(m.vapourResistanceFactor === undefined ? {} : { vapourResistanceFactor: m.vapourResistanceFactor }),
  source: m.source,
  libraryEntryId: m.id,
});

/** A firm χ value (a computed one with its solve) as a clip type of the sweep. */
export const clipEntryOf = (
  b: Pick<BridgeValue, 'id' | 'name' | 'value' | 'source' | 'computed'>,
): SweepClipEntry => ({
  name: b.name.slice(0, 120),
  chi: b.value,
  source: { text: b.source, libraryEntryId: b.id, ...(b.computed ? { computed: b.computed } : {}) },
});
