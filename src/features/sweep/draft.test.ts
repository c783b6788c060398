import { demoAssembly } from '@shared/checks/fixtures';
import { clipEntryOf, productOf } from '@shared/sweep/library';
import { describe, expect, it } from 'vitest';
import { clipOptions, newDraft, type ParameterDraft, problemBox, targetsFor, validateSweep } from './draft';

const a = demoAssembly();
const thickness = (over: Partial<ParameterDraft> = {}): ParameterDraft => ({
  ...newDraft(a, 'insulationThickness'),
  target: 3,
  start: 0.05,
  stop: 0.15,
  step: 0.025,
  ...over,
});

describe('sweep form validation (before any work)', () => {
  it('a good form plans the sweep: 5 thicknesses × 3 clip spacings typed as a list in mm', () => {
    const v = validateSweep(
      a,
      [thickness(), { ...newDraft(a, 'clipSpacing'), mode: 'list', list: '400 600; 800' }],
      'SI',
    );
    expect(v.ok && v.plan.count).toBe(15);
    expect(v.ok && v.parameters[1]).toEqual({ kind: 'clipSpacing', list: [0.4, 0.6, 0.8] });
  });

  it('a list is read in the person’s units: 16 and 24 in are 0.4064 and 0.6096 m (1 in = 25.4 mm, NIST SP 811)', () => {
    const v = validateSweep(a, [{ ...newDraft(a, 'clipSpacing'), mode: 'list', list: '16 24' }], 'IP');
    expect(v.ok && v.parameters[0]).toMatchObject({
      list: [expect.closeTo(0.4064, 9), expect.closeTo(0.6096, 9)],
    });
  });

  it.each([
    ['a zero step', thickness({ step: 0 }), 'parameters.0.range.step', /greater than 0/],
    ['a negative step', thickness({ step: -0.01 }), 'parameters.0.range.step', /greater than 0/],
    [
      'a stop below the start',
      thickness({ start: 0.1, stop: 0.05 }),
      'parameters.0.range.stop',
      /below the start/,
    ],
    ['an empty box', thickness({ stop: undefined }), 'parameters.0.range.stop', /enter a number/],
    [
      'a layer the assembly lacks',
      thickness({ target: 40 }),
      'parameters.0.layer',
      /the assembly has 8 layers/,
    ],
    ['an air layer', thickness({ target: 1 }), 'parameters.0.layer', /homogeneous or framed/],
    [
      'an unreadable list entry',
      { ...thickness(), mode: 'list' as const, list: '50 6o' },
      'parameters.0.list.1',
      /“6o” is not a number in mm/,
    ],
    ['an empty list', { ...thickness(), mode: 'list' as const, list: ' ' }, 'parameters.0.list', /empty/],
    [
      'no sealant class',
      { ...newDraft(a, 'sealantClass'), classes: [] },
      'parameters.0.list',
      /choose one class/,
    ],
  ])('refuses %s with the field named', (_, draft, field, reason) => {
    const v = validateSweep(a, [draft], 'SI');
    expect(v.ok).toBe(false);
    if (!v.ok) {
      expect(v.problems[0]!.field).toBe(field);
      expect(v.problems[0]!.reason).toMatch(reason);
    }
  });

  it('refuses more variants than the cap, and no parameter at all', () => {
    const v = validateSweep(
      a,
      [
        thickness({ start: 0.01, stop: 0.2, step: 0.001 }),
        { ...newDraft(a, 'clipSpacing'), mode: 'list', list: '300 400 500 600 700 800' },
      ],
      'SI',
      1000,
    );
    expect(v.ok ? null : v.problems[0]).toEqual({
      field: 'parameters',
      reason: '1146 variants — at most 1000 in one sweep',
    });
    expect(validateSweep(a, [], 'SI')).toMatchObject({ ok: false, problems: [{ field: 'parameters' }] });
  });

  it('offers only what the assembly has, and names the box of a problem', () => {
    expect(targetsFor({ ...a, windPanel: undefined }, 'panelModule')).toEqual([]);
    expect(targetsFor(a, 'clipChi').map((t) => t.index)).toEqual([0]);
    expect(problemBox('parameters.1.range.step')).toEqual({ parameter: 1, box: 'step' });
    expect(problemBox('parameters.0.list.3')).toEqual({ parameter: 0, box: 'list' });
    expect(problemBox('parameters')).toEqual({ parameter: null, box: '' });
  });
});

describe('library picks: insulation products and clip types', () => {
  const material = (id: string, name: string, conductivity: number) => ({
    id: `00000000-0000-4000-8000-00000000000${id}`,
    name,
    conductivity,
    vapourResistanceFactor: 40,
    source: 'Demo data sheet (invented)',
    createdAt: '2026-12-05T00:00:00Z',
  });
  const materials = [material('1', 'Demo PIR board', 0.022), material('2', 'Demo wool slab', 0.034)];
  const bridgeValue = {
    id: '00000000-0000-4000-8000-000000000009',
    name: 'Demo clip',
    kind: 'point' as const,
    value: 0.02,
    sourceType: 'test_report' as const,
    source: 'Demo test report',
    notes: '',
    createdAt: '2026-12-05T00:00:00Z',
  };
  const library = { firmName: 'Demo firm', materials, bridgeValues: [bridgeValue] };
  const products = (over: Partial<ParameterDraft> = {}): ParameterDraft => ({
    ...newDraft(a, 'insulationProduct'),
    products: materials.map(productOf),
    ...over,
  });

  it('products picked from the library become the engine’s parameter on the chosen layer', () => {
    expect(targetsFor(a, 'insulationProduct').map((t) => t.index)).toEqual([0, 3, 4, 5, 6, 7]);
    const v = validateSweep(a, [products({ target: 3 })], 'SI', 100, library);
    expect(v.ok && v.parameters[0]).toEqual({
      kind: 'insulationProduct',
      layer: 3,
      products: materials.map(productOf),
    });
    expect(v.ok && v.plan.axes[0]!.values).toEqual(['Demo PIR board', 'Demo wool slab']);
  });

  it('none chosen, or one deleted from the library since, is refused at its field before any work', () => {
    const none = validateSweep(a, [products({ target: 3, products: [] })], 'SI', 100, library);
    expect(!none.ok && none.problems).toEqual([
      { field: 'parameters.0.products', reason: expect.stringMatching(/choose one product/) },
    ]);
    const deleted = validateSweep(a, [products({ target: 3 })], 'SI', 100, {
      ...library,
      materials: materials.slice(0, 1),
    });
    expect(!deleted.ok && deleted.problems).toEqual([
      {
        field: 'parameters.0.products.1.libraryEntryId',
        reason: expect.stringMatching(/“Demo wool slab” is no longer in the firm library/),
      },
    ]);
    expect(problemBox('parameters.0.products.1.libraryEntryId')).toEqual({ parameter: 0, box: 'products' });
  });

  it('clip types: the library’s χ values and the solved clips; a deleted entry is refused at its field', () => {
    const entries = clipOptions(a, [bridgeValue]);
    expect(entries).toEqual([clipEntryOf(bridgeValue)]); // the demo wall has no solved clip
    const clip = { ...newDraft(a, 'clipChi'), mode: 'entries' as const, entries };
    const v = validateSweep(a, [clip], 'SI', 100, library);
    expect(v.ok && v.parameters[0]).toEqual({ kind: 'clipChi', bridge: 0, entries });
    const gone = validateSweep(a, [clip], 'SI', 100, { ...library, bridgeValues: [] });
    expect(!gone.ok && gone.problems[0]!.field).toBe('parameters.0.entries.0.source.libraryEntryId');
    const empty = validateSweep(a, [{ ...clip, entries: [] }], 'SI', 100, library);
    expect(!empty.ok && empty.problems[0]!.field).toBe('parameters.0.entries');
  });
});
