/**
 * Three-way merge of an assembly input after a version conflict: start from the revision someone else
 * saved ("theirs") and carry over every value this person changed since the revision they started from
 * ("base"). Lists are merged item by item while all three have the same length; a list whose length one
 * side changed (a layer added or removed) is taken whole from that side. Where both changed the same
 * value, this person's value is kept and the place is reported.
 */
export interface MergeResult<T> {
  merged: T;
  /** Dotted paths changed on both sides (this person's value kept). */
  bothChanged: string[];
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

const same = (a: unknown, b: unknown) =>
  Object.is(a, b) || JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

function merge(base: unknown, mine: unknown, theirs: unknown, path: string, both: string[]): unknown {
  if (same(mine, base)) return theirs;
  if (same(theirs, base) || same(mine, theirs)) return mine;
  if (Array.isArray(base) && Array.isArray(mine) && Array.isArray(theirs)) {
    if (base.length === mine.length && base.length === theirs.length)
      return base.map((b, i) => merge(b, mine[i], theirs[i], `${path}.${i}`, both));
    both.push(path);
    return mine;
  }
  if (isObject(base) && isObject(mine) && isObject(theirs) && mine.kind === theirs.kind) {
    const out: Record<string, unknown> = {};
    for (const k of new Set([...Object.keys(base), ...Object.keys(mine), ...Object.keys(theirs)])) {
      const v = merge(base[k], mine[k], theirs[k], path ? `${path}.${k}` : k, both);
      if (v !== undefined) out[k] = v;
    }
    return out;
  }
  both.push(path);
  return mine;
}

export function mergeAssemblyEdits<T extends { thermal: { layers: unknown[] }; vapour?: unknown[] | null }>(
  base: T,
  mine: T,
  theirs: T,
): MergeResult<T> {
  const bothChanged: string[] = [];
  const merged = merge(base, mine, theirs, '', bothChanged) as T;
  // Vapour data is one entry per layer: keep it with the list of layers it belongs to.
  if (Array.isArray(merged.vapour) && merged.vapour.length !== merged.thermal.layers.length) {
    const source = [mine, theirs].find((s) => s.thermal.layers.length === merged.thermal.layers.length);
    merged.vapour = source?.vapour;
  }
  return { merged, bothChanged };
}
