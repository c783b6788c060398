import demo from '@data/seed/demo-assembly.json';
import { type AssemblyInput, assemblyInputSchema } from '@shared/schemas/assembly';
import { describe, expect, it } from 'vitest';
import { mergeVapour } from './merge';

const base: AssemblyInput = assemblyInputSchema.parse(demo.assembly);

describe('mergeVapour', () => {
  it('puts back the entries this person changed on top of the saved revision', () => {
    const mine = [...(base.vapour ?? [])];
    mine[6] = { kind: 'sd', sd: 50 };
    const theirs: AssemblyInput = { ...base, description: 'edited', vapour: [...(base.vapour ?? [])] };
    theirs.vapour![7] = { kind: 'mu', mu: 4 };
    const { merged, bothChanged } = mergeVapour(base, mine, theirs);
    expect(merged?.[6]).toEqual({ kind: 'sd', sd: 50 });
    expect(merged?.[7]).toEqual({ kind: 'mu', mu: 4 });
    expect(bothChanged).toEqual([]);
  });

  it('names a layer both changed and keeps this person’s entry', () => {
    const mine = [...(base.vapour ?? [])];
    mine[6] = { kind: 'sd', sd: 50 };
    const theirs: AssemblyInput = { ...base, vapour: [...(base.vapour ?? [])] };
    theirs.vapour![6] = { kind: 'usPerm', perm: 0.06, reference: '23C' };
    expect(mergeVapour(base, mine, theirs)).toEqual({
      merged: expect.arrayContaining([{ kind: 'sd', sd: 50 }]),
      bothChanged: [6],
    });
  });

  it('refuses to match entries to layers when the layers changed', () => {
    const theirs: AssemblyInput = {
      ...base,
      thermal: { ...base.thermal, layers: base.thermal.layers.slice(1) },
      vapour: base.vapour?.slice(1),
    };
    expect(mergeVapour(base, base.vapour ?? [], theirs).merged).toBeNull();
  });
});
