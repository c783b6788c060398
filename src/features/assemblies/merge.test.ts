import { describe, expect, it } from 'vitest';
import { startingInput } from './form';
import { mergeAssemblyEdits } from './merge';

const clone = <T>(v: T): T => structuredClone(v);

describe('mergeAssemblyEdits', () => {
  it('keeps their change and carries mine over where we changed different values', () => {
    const base = startingInput('sample');
    const mine = clone(base);
    const theirs = clone(base);
    const layer = mine.thermal.layers[3];
    if (layer?.kind === 'homogeneous') layer.thickness = 0.15;
    const girts = theirs.thermal.bridges[1];
    if (girts?.kind === 'linear' && 'spacing' in girts) girts.spacing = 1;

    const { merged, bothChanged } = mergeAssemblyEdits(base, mine, theirs);
    expect(merged.thermal.layers[3]).toMatchObject({ thickness: 0.15 });
    expect(merged.thermal.bridges[1]).toMatchObject({ spacing: 1 });
    expect(bothChanged).toEqual([]);
  });

  it('keeps mine where we both changed the same value, and says where', () => {
    const base = startingInput('sample');
    const mine = { ...clone(base), name: 'Mine' };
    const theirs = { ...clone(base), name: 'Theirs', description: 'theirs' };
    const { merged, bothChanged } = mergeAssemblyEdits(base, mine, theirs);
    expect(merged.name).toBe('Mine');
    expect(merged.description).toBe('theirs');
    expect(bothChanged).toEqual(['name']);
  });

  it('takes a list whose length one side changed from that side, with its vapour data', () => {
    const base = { ...startingInput('sample'), vapour: Array(10).fill(null) };
    const mine = clone(base);
    mine.thermal.layers.splice(8, 1);
    mine.vapour = Array(9).fill(null);
    const theirs = clone(base);
    theirs.name = 'Renamed';
    const { merged } = mergeAssemblyEdits(base, mine, theirs);
    expect(merged.thermal.layers).toHaveLength(9);
    expect(merged.vapour).toHaveLength(9);
    expect(merged.name).toBe('Renamed');
  });
});
