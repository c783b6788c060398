import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoComputedGirt } from '../calc/bridge/examples';
import { CalcInputError } from '../calc/errors';
import { calculateMoisture } from '../calc/moisture/monthly';
import { calculateThermal } from '../calc/thermal/thermal';
import { ENGINE_VERSION } from '../calc/trace';
import { criteriaRow, demoAssembly, demoProject } from '../checks/fixtures';
import { moistureInputFor } from '../checks/inputs';
import { runChecks } from '../checks/runner';
import type { AssemblyInput } from '../schemas/assembly';
import { clipEntryOf, productOf } from './library';
import { type SweepClipEntry, type SweepParameter, type SweepProduct, sweepRequestSchema } from './schema';
import { planSweep, runSweep, sweepSize, variantResult } from './sweep';

/*
 * The insulation product and clip type axes (D-031). Each variant is held to the single-assembly engines run on
 * an assembly built by hand with that material or clip — not through applyVariant — so a wrong apply or a reuse
 * key that leaves the material out would show (derived: the expectations are this program's own engines).
 * The products are invented demo materials.
 */

const rows = [
  criteriaRow('max_u_factor', 0.35),
  criteriaRow('max_condensation_accumulation', 0.5),
  criteriaRow('max_surface_rh', 0.8),
];
const product = (name: string, conductivity: number, mu?: number): SweepProduct => ({
  name,
  conductivity,
  ...(mu === undefined ? {} : { vapourResistanceFactor: mu }),
  source: 'Demo data sheet (invented)',
});
const PRODUCTS = [
  product('Demo PIR board', 0.022, 60),
  product('Demo mineral wool slab', 0.034, 1.3),
  product('Demo wood-fibre board', 0.045, 5),
  product('Demo board without μ', 0.03),
];

/** The demo wall with layer `i` made of `m` by hand: name and λ (a framed layer: its batt section), μ. */
function builtWith(i: number, m: SweepProduct, thickness?: number): AssemblyInput {
  const a: AssemblyInput = demoAssembly();
  const layer = a.thermal.layers[i]!;
  if (layer.kind === 'framed')
    layer.sections[0] = { ...layer.sections[0]!, name: m.name, conductivity: m.conductivity };
  else
    a.thermal.layers[i] = {
      kind: 'homogeneous',
      name: m.name,
      thickness: thickness ?? 0.1,
      conductivity: m.conductivity,
    };
  a.vapour![i] = m.vapourResistanceFactor === undefined ? null : { kind: 'mu', mu: m.vapourResistanceFactor };
  return a;
}

const refusal = (parameters: SweepParameter[], a: AssemblyInput = demoAssembly()) => {
  try {
    planSweep(a, parameters, 1000);
  } catch (e) {
    if (e instanceof CalcInputError) return e.field;
    throw e;
  }
  throw new Error('not refused');
};

describe('insulation product axis', () => {
  it('each variant equals the engines on the wall built with that product (U, moisture, every check)', () => {
    const a = demoAssembly();
    const r = runSweep(
      a,
      demoProject(),
      rows,
      [{ kind: 'insulationProduct', layer: 3, products: PRODUCTS }],
      100,
    );
    expect(r.parameters[0]!.values).toEqual(PRODUCTS.map((p) => p.name));
    PRODUCTS.forEach((m, i) => {
      const built = builtWith(3, m);
      const v = r.variants[i]!;
      expect(v).toEqual(variantResult(i, [m.name], runChecks(built, demoProject(), rows)));
      // The U check's margin is 0.35 − U of the thermal engine on the built wall.
      const u = calculateThermal(built.thermal).Ueff;
      expect(v.checks.find((c) => c.id.includes('max_u_factor'))!.margin).toBeCloseTo(0.35 - u, 12);
    });
    // Different materials, different U: the runs are not shared between products.
    const margins = r.variants.map((v) => v.checks.find((c) => c.id.includes('max_u_factor'))!.margin);
    expect(new Set(margins).size).toBe(PRODUCTS.length);
  });

  it('μ reaches the moisture engine; a product without μ leaves the moisture check not evaluated', () => {
    const r = runSweep(
      demoAssembly(),
      demoProject(),
      rows,
      [{ kind: 'insulationProduct', layer: 3, products: PRODUCTS }],
      100,
    );
    const accumulation = (i: number) => r.variants[i]!.checks.find((c) => c.id.includes('max_condensation'))!;
    const built = moistureInputFor(builtWith(3, PRODUCTS[0]!), demoProject());
    if (built.status !== 'ready') throw new Error('the demo wall has its vapour data');
    const moisture = calculateMoisture(built.input);
    expect(accumulation(0).margin).toBeCloseTo(0.5 - moisture.interstitial.maxAccumulation, 12);
    expect(accumulation(3).status).toBe('not_evaluated');
  });

  it('a framed layer’s insulation section, and thickness × product on the same layer (sampled variants)', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.constantFrom(...PRODUCTS.slice(0, 3)), {
          minLength: 1,
          maxLength: 3,
          selector: (p) => p.name,
        }),
        fc.constantFrom(0.05, 0.075, 0.15),
        fc.nat(),
        (products, thickness, pick) => {
          const parameters: SweepParameter[] = [
            { kind: 'insulationThickness', layer: 3, list: [0.1, thickness] },
            { kind: 'insulationProduct', layer: 3, products },
            { kind: 'insulationProduct', layer: 5, products },
          ];
          const r = runSweep(demoAssembly(), demoProject(), rows, parameters, 100);
          const v = r.variants[pick % r.count]!;
          const [d, p3, p5] = v.values as [number, string, string];
          const built = builtWith(3, products.find((p) => p.name === p3)!, d);
          const framed = builtWith(5, products.find((p) => p.name === p5)!);
          built.thermal.layers[5] = framed.thermal.layers[5]!;
          built.vapour![5] = framed.vapour![5]!;
          expect(v).toEqual(variantResult(v.index, v.values, runChecks(built, demoProject(), rows)));
        },
      ),
      { numRuns: 10 },
    );
  });

  it('refused before any work, the field named', () => {
    const at = (products: SweepProduct[], layer = 3) =>
      refusal([{ kind: 'insulationProduct', layer, products }]);
    expect(at([])).toBe('parameters.0.products');
    expect(at([PRODUCTS[0]!, { ...PRODUCTS[1]!, name: PRODUCTS[0]!.name }])).toBe(
      'parameters.0.products.1.name',
    );
    expect(at([{ ...PRODUCTS[0]!, conductivity: 0.0001 }])).toBe('parameters.0.products.0.conductivity');
    expect(at([{ ...PRODUCTS[0]!, vapourResistanceFactor: 0.5 }])).toBe(
      'parameters.0.products.0.vapourResistanceFactor',
    );
    expect(at(PRODUCTS, 2)).toBe('parameters.0.layer'); // a declared-R layer
    expect(at(PRODUCTS, 9)).toBe('parameters.0.layer'); // no such layer
  });

  it('a firm material becomes a product with its entry; the request schema names a bad one', () => {
    const m = {
      id: '00000000-0000-4000-8000-000000000001',
      name: 'Demo PIR board',
      conductivity: 0.022,
      vapourResistanceFactor: 60,
      source: 'Demo sheet',
    };
    expect(productOf(m)).toEqual({ ...PRODUCTS[0]!, source: 'Demo sheet', libraryEntryId: m.id });
    const body = (products: unknown[]) => ({
      assembly: demoAssembly(),
      project: demoProject(),
      rows,
      parameters: [{ kind: 'insulationProduct', layer: 3, products }],
    });
    const path = (products: unknown[]) => {
      const r = sweepRequestSchema.safeParse(body(products));
      return r.success ? null : r.error.issues[0]!.path.join('.');
    };
    expect(path([productOf(m)])).toBeNull();
    expect(path([{ ...productOf(m), conductivity: undefined }])).toBe('parameters.0.products.0.conductivity');
    expect(path([{ ...productOf(m), source: '' }])).toBe('parameters.0.products.0.source');
    expect(path([{ ...productOf(m), libraryEntryId: 'deleted' }])).toBe(
      'parameters.0.products.0.libraryEntryId',
    );
    expect(
      sweepSize([
        { kind: 'insulationProduct', layer: 3, products: PRODUCTS },
        { kind: 'clipSpacing', list: [0.4, 0.6] },
      ]),
    ).toBe(8);
  });
});

describe('clip type axis: χ from the firm library or the bridge solver', () => {
  const solved = demoComputedGirt(ENGINE_VERSION);
  const ENTRIES: SweepClipEntry[] = [
    clipEntryOf({
      id: '00000000-0000-4000-8000-000000000002',
      name: 'Demo clip, test report',
      value: 0.02,
      source: 'Demo test report 7',
    }),
    { name: 'Demo clip, solved', chi: 0.045, source: { text: 'Solved here', computed: solved } },
    { name: 'Demo clip, typed', chi: 0.06 },
  ];

  /** The demo wall with clip bridge 0 replaced by `e` by hand. */
  function builtWithClip(e: SweepClipEntry): AssemblyInput {
    const a: AssemblyInput = demoAssembly();
    const b = a.thermal.bridges[0]!;
    if (b.kind !== 'point' || !('spacingVertical' in b))
      throw new Error('demo bridge 0 is a clip by spacing');
    a.thermal.bridges[0] = {
      kind: 'point',
      name: e.name,
      chi: e.chi as typeof b.chi,
      spacingHorizontal: b.spacingHorizontal,
      spacingVertical: b.spacingVertical,
      ...(e.source ? { source: e.source } : {}),
    };
    return a;
  }

  it('each variant equals the engines on the wall built with that clip; a solved one adds its surface check', () => {
    const parameters: SweepParameter[] = [
      { kind: 'insulationThickness', layer: 3, list: [0.05, 0.1] },
      { kind: 'clipChi', bridge: 0, entries: ENTRIES },
    ];
    const r = runSweep(demoAssembly(), demoProject(), rows, parameters, 100);
    expect(r.parameters[1]!.values).toEqual(ENTRIES.map((e) => e.name));
    for (const v of r.variants) {
      const built = builtWithClip(ENTRIES.find((e) => e.name === v.values[1])!);
      built.thermal.layers[3] = { ...built.thermal.layers[3]!, thickness: v.values[0] as number } as never;
      expect(v).toEqual(variantResult(v.index, v.values, runChecks(built, demoProject(), rows)));
    }
    // The solved clip's surface check comes with it (the moisture runs are kept by clip type too).
    const surface = (i: number) =>
      r.variants[i]!.checks.some((c) => c.id.startsWith('moisture.surface.bridge'));
    expect([0, 1, 2].map(surface)).toEqual([false, true, false]);
  });

  it('refused before any work, the field named', () => {
    const at = (p: Partial<Extract<SweepParameter, { kind: 'clipChi' }>>) =>
      refusal([{ kind: 'clipChi', bridge: 0, ...p }]);
    expect(at({ entries: [] })).toBe('parameters.0.entries');
    expect(at({ entries: ENTRIES, list: [0.02] })).toBe('parameters.0');
    expect(at({ entries: [ENTRIES[0]!, { ...ENTRIES[1]!, name: ENTRIES[0]!.name }] })).toBe(
      'parameters.0.entries.1.name',
    );
    expect(at({ entries: [{ ...ENTRIES[2]!, chi: 12 }] })).toBe('parameters.0.entries.0.chi');
    expect(at({ bridge: 1, entries: ENTRIES })).toBe('parameters.0.bridge'); // a girt (linear)
  });
});
