import type { Vapour } from '@shared/calc/moisture/schema';
import type { AssemblyInput } from '@shared/schemas/assembly';

/*
 * After a 409 on saving vapour data: carry this person's vapour entries onto the revision someone else saved.
 * Only possible while the layers are the same ones in the same order — otherwise the entries cannot be
 * matched to layers, and the person is told so rather than having them put on the wrong layer.
 */

const key = (v: Vapour | null | undefined) => JSON.stringify(v ?? null);

/** The same layers (kind and name) in the same order. */
export function sameLayers(a: AssemblyInput, b: AssemblyInput): boolean {
  const la = a.thermal.layers;
  const lb = b.thermal.layers;
  return la.length === lb.length && la.every((l, i) => l.kind === lb[i]!.kind && l.name === lb[i]!.name);
}

export interface VapourMerge {
  /** Theirs with every entry this person changed put back; null when the layers differ. */
  merged: (Vapour | null)[] | null;
  /** Layers whose entry both changed (this person's is kept). */
  bothChanged: number[];
}

export function mergeVapour(
  base: AssemblyInput,
  mine: readonly (Vapour | null)[],
  theirs: AssemblyInput,
): VapourMerge {
  if (!sameLayers(base, theirs)) return { merged: null, bothChanged: [] };
  const bothChanged: number[] = [];
  const merged = theirs.thermal.layers.map((_, i) => {
    const b = base.vapour?.[i] ?? null;
    const t = theirs.vapour?.[i] ?? null;
    const m = mine[i] ?? null;
    if (key(m) === key(b)) return t;
    if (key(t) !== key(b) && key(t) !== key(m)) bothChanged.push(i);
    return m;
  });
  return { merged, bothChanged };
}
