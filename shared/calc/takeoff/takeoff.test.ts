import { CalcInputError } from '@shared/calc/errors';
import { describe, expect, it } from 'vitest';
import { csvField, takeoffToCsv } from './csv';
import { demoElevation } from './examples';
import { type TakeoffInput, takeoffInputSchema, takeoffResultSchema, type Wall } from './schema';
import {
  beadCrossSection,
  calculateTakeoff,
  fastenerGrid,
  fastenersInsideOpening,
  MAX_PIECES,
  modulesToCover,
  PACKAGES,
  trimPieces,
  US_FLUID_OUNCE,
  wholeUnits,
} from './takeoff';

/** One 10 m × 6 m wall, 1 m × 4 m vertical panels, rectangular beads everywhere; edit per test. */
const input = (extra: Partial<TakeoffInput> = {}, wall: Partial<Wall> = {}): TakeoffInput => ({
  walls: [{ name: 'A', length: 10, height: 6, openings: [], ...wall }],
  module: { width: 1, length: 4, orientation: 'vertical' },
  beads: {},
  wasteFactor: 0,
  trims: [],
  ...extra,
});

/** Run `fn` and return the CalcInputError it throws. */
function inputError(fn: () => unknown): CalcInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcInputError) return e;
    throw e;
  }
  throw new Error('expected a CalcInputError');
}

describe('formulas', () => {
  it('bead cross-sections: πd²/4, leg²/2, W·D', () => {
    expect(beadCrossSection({ shape: 'round', diameter: 0.01 })).toBeCloseTo((Math.PI * 1e-4) / 4, 18);
    expect(beadCrossSection({ shape: 'fillet', leg: 0.01 })).toBeCloseTo(5e-5, 18);
    expect(beadCrossSection({ shape: 'rectangular', width: 0.02, depth: 0.01 })).toBeCloseTo(2e-4, 18);
  });
  it('whole units ignore floating-point noise but never drop a real remainder', () => {
    expect(modulesToCover(24, 0.3)).toBe(80);
    expect(modulesToCover(24.01, 0.3)).toBe(81);
    expect(modulesToCover(0.2, 1)).toBe(1);
    expect(wholeUnits(0)).toBe(0);
    expect(Object.is(wholeUnits(0), -0)).toBe(false);
  });
  it('lapped trim pieces: n pieces cover n·S − (n − 1)·l', () => {
    expect(trimPieces(0, 3, 0.05)).toBe(0);
    expect(trimPieces(3, 3, 0.05)).toBe(1);
    expect(trimPieces(2 * 3 - 0.05, 3, 0.05)).toBe(2);
    expect(trimPieces(2 * 3 - 0.04, 3, 0.05)).toBe(3);
    expect(trimPieces(7.2, 3.05, 0.05)).toBe(3);
  });
  it('fastener grid and the points certainly inside an opening', () => {
    expect(fastenerGrid(3, 2.4, 0.3, 1.2)).toBe(11 * 3);
    expect(fastenersInsideOpening(0.9, 2.4, 0.3, 1.2)).toBe(2 * 1);
    expect(fastenersInsideOpening(0.2, 0.5, 0.3, 1.2)).toBe(0);
  });
  it('package sizes', () => {
    expect(PACKAGES.cartridgeUsFlOz10_1).toBeCloseTo(10.1 * US_FLUID_OUNCE, 20);
    expect(PACKAGES.cartridgeMl300).toBe(3e-4);
    expect(PACKAGES.sausageMl600).toBe(6e-4);
  });
});

describe('a single wall by hand (derived)', () => {
  it('vertical panels', () => {
    const r = calculateTakeoff(
      input({}, { corners: 1, abutments: 1, openings: [{ width: 1.2, height: 1.5, count: 2 }] }),
    );
    expect(r.lengths).toEqual({
      panel_vertical: 9 * 6,
      panel_horizontal: 1 * 10,
      perimeter: 10 + 6,
      opening: 2 * (2 * 1.2 + 2 * 1.5),
      corner: 6,
      base: 10,
    });
  });
  it('horizontal panels swap the module directions', () => {
    const r = calculateTakeoff(input({ module: { width: 1, length: 4, orientation: 'horizontal' } }));
    expect(r.lengths.panel_horizontal).toBe(5 * 10);
    expect(r.lengths.panel_vertical).toBe(2 * 6);
  });
  it('a door has no sill and interrupts the base', () => {
    const r = calculateTakeoff(input({}, { openings: [{ width: 2, height: 2.4, count: 1, kind: 'door' }] }));
    expect(r.lengths.opening).toBeCloseTo(2 + 2 * 2.4, 12);
    expect(r.lengths.base).toBe(8);
    expect(r.notes.map((n) => n.code)).toContain('base_net_of_doors');
  });
  it('sealant volume, waste and packages', () => {
    const bead = { shape: 'rectangular', width: 0.02, depth: 0.01 } as const;
    const r = calculateTakeoff(input({ beads: { panel_vertical: bead }, wasteFactor: 0.1 }));
    expect(r.sealant.byJoint).toEqual([
      { joint: 'panel_vertical', length: 54, crossSection: 2e-4, volume: 54 * 2e-4 },
    ]);
    expect(r.sealant.volumeWithWaste).toBeCloseTo(54 * 2e-4 * 1.1, 15);
    expect(r.sealant.cartridges.ml300).toBe(Math.ceil((54 * 2e-4 * 1.1) / 3e-4));
    expect(r.sealant.sausages.ml600).toBe(Math.ceil((54 * 2e-4 * 1.1) / 6e-4));
    expect(r.sealant.cartridges.usFlOz10_1).toBe(Math.ceil((54 * 2e-4 * 1.1) / (10.1 * US_FLUID_OUNCE)));
  });
  it('exactly one cartridge of sealant needs exactly one cartridge', () => {
    const L = 6 * 9;
    const area = PACKAGES.cartridgeUsFlOz10_1 / L;
    const r = calculateTakeoff(
      input({ beads: { panel_vertical: { shape: 'rectangular', width: area / 0.01, depth: 0.01 } } }),
    );
    expect(r.sealant.cartridges.usFlOz10_1).toBe(1);
  });
  it('no sealant, tape or fasteners asked → zero packages, null tape and fasteners', () => {
    const r = calculateTakeoff(input());
    expect(r.sealant.volume).toBe(0);
    expect(r.sealant.cartridges).toEqual({ usFlOz10_1: 0, ml300: 0 });
    expect(r.tape).toBeNull();
    expect(r.fasteners).toBeNull();
  });
  it('tape over the chosen joint lines, with waste, area and rolls', () => {
    const r = calculateTakeoff(
      input({
        wasteFactor: 0.1,
        tape: { width: 0.025, appliesTo: ['perimeter', 'base', 'perimeter'], rollLength: 5 },
      }),
    );
    expect(r.tape!.length).toBeCloseTo(20 * 1.1, 12);
    expect(r.tape!.area).toBeCloseTo(20 * 1.1 * 0.025, 12);
    expect(r.tape!.rolls).toBe(5);
  });
  it('trim pieces per run', () => {
    const r = calculateTakeoff(
      input(
        { trims: [{ name: 'Corner', appliesTo: 'corner', stockLength: 3.05, lapAllowance: 0.05 }] },
        { corners: 2 },
      ),
    );
    expect(r.trims).toEqual([{ name: 'Corner', appliesTo: 'corner', runs: 2, length: 12, pieces: 4 }]);
  });
  it('fasteners on the girt grid less the points inside openings', () => {
    const r = calculateTakeoff(
      input(
        { fasteners: { spacingAlongGirt: 0.5, girtSpacing: 1.5 } },
        { openings: [{ width: 1.2, height: 1.5, count: 2 }] },
      ),
    );
    expect(r.fasteners).toBe(21 * 5 - 2 * (2 * 0));
    const big = calculateTakeoff(
      input(
        { fasteners: { spacingAlongGirt: 0.5, girtSpacing: 1.5 } },
        { openings: [{ width: 2, height: 3.1, count: 1 }] },
      ),
    );
    expect(big.fasteners).toBe(21 * 5 - 3 * 2);
  });
});

describe('refuses impossible input with the field path', () => {
  const field = (extra: Partial<TakeoffInput>, wall: Partial<Wall> = {}) =>
    inputError(() => calculateTakeoff(input(extra, wall))).field;
  it.each([
    [{}, { length: 0 }, 'walls.0.length'],
    [{}, { height: -1 }, 'walls.0.height'],
    [{}, { openings: [{ width: 11, height: 1, count: 1 }] }, 'walls.0.openings.0.width'],
    [{}, { openings: [{ width: 1, height: 7, count: 1 }] }, 'walls.0.openings.0.height'],
    [{}, { openings: [{ width: 1, height: 1, count: 0 }] }, 'walls.0.openings.0.count'],
    [{}, { openings: [{ width: 9, height: 5, count: 2 }] }, 'walls.0.openings'],
    [{}, { openings: [{ width: 4, height: 2, count: 3, kind: 'door' }] }, 'walls.0.openings'],
    [{}, { corners: 2, abutments: 1 }, 'walls.0.abutments'],
    [{}, { corners: 1.5 }, 'walls.0.corners'],
    [{ module: { width: 0, length: 4, orientation: 'vertical' } }, {}, 'module.width'],
    [{ module: { width: 1, length: -4, orientation: 'vertical' } }, {}, 'module.length'],
    [{ module: { width: 1, length: 4, orientation: 'diagonal' as 'vertical' } }, {}, 'module.orientation'],
    [{ beads: { corner: { shape: 'round', diameter: 0 } } }, {}, 'beads.corner.diameter'],
    [{ beads: { base: { shape: 'rectangular', width: 0.01, depth: -1 } } }, {}, 'beads.base.depth'],
    [{ wasteFactor: 1.5 }, {}, 'wasteFactor'],
    [
      { trims: [{ name: 'T', appliesTo: 'base', stockLength: 3, lapAllowance: 3 }] },
      {},
      'trims.0.lapAllowance',
    ],
    [{ fasteners: { spacingAlongGirt: 0, girtSpacing: 1 } }, {}, 'fasteners.spacingAlongGirt'],
    [{ tape: { width: 0.02, appliesTo: [] } }, {}, 'tape.appliesTo'],
    [{ walls: [] }, {}, 'walls'],
  ] as [Partial<TakeoffInput>, Partial<Wall>, string][])('%o %o → %s', (extra, wall, path) => {
    expect(field(extra, wall)).toBe(path);
  });
});

describe('counts stay finite whole numbers: absurd values refused', () => {
  const error = (extra: Partial<TakeoffInput>, wall: Partial<Wall> = {}) =>
    inputError(() => calculateTakeoff(input(extra, wall)));
  it('the schema refuses the fuzz counterexample (fastener spacings of 5e-324 m) and other slips', () => {
    const demo = demoElevation();
    const parses = (patch: Partial<TakeoffInput>) =>
      takeoffInputSchema.safeParse({ ...demo, ...patch }).success;
    expect(parses({ fasteners: { spacingAlongGirt: 5e-324, girtSpacing: 5e-324 } })).toBe(false);
    expect(parses({ fasteners: { spacingAlongGirt: 0.01, girtSpacing: 0.05 } })).toBe(true);
    expect(parses({ module: { width: 5.4e-323, length: 6, orientation: 'vertical' } })).toBe(false);
    expect(parses({ tape: { width: 0.025, appliesTo: ['opening'], rollLength: 1e-300 } })).toBe(false);
    expect(parses({ trims: [{ name: 'T', appliesTo: 'base', stockLength: 1e-156, lapAllowance: 0 }] })).toBe(
      false,
    );
  });
  it('more than MAX_PIECES fasteners: refused on the fastener spacing', () => {
    // 1000 m × 500 m at 10 mm × 50 mm: 100 001 × 10 001 points, just over a billion.
    const e = error(
      { fasteners: { spacingAlongGirt: 0.01, girtSpacing: 0.05 } },
      { length: 1000, height: 500 },
    );
    expect(e.field).toBe('fasteners.spacingAlongGirt');
    expect(e.reason).toMatch(/Fasteners/);
    const r = calculateTakeoff(
      input({ fasteners: { spacingAlongGirt: 0.02, girtSpacing: 0.05 } }, { length: 1000, height: 500 }),
    );
    expect(r.fasteners).toBe(50_001 * 10_001);
    expect(r.fasteners).toBeLessThanOrEqual(MAX_PIECES);
  });
  it('a lap all but the stock length: refused on the lap', () => {
    const trims: TakeoffInput['trims'] = [
      { name: 'Base', appliesTo: 'base', stockLength: 3, lapAllowance: 3 - 1e-12 },
    ];
    expect(error({ trims }).field).toBe('trims.0.lapAllowance');
  });
  it('packages and rolls beyond MAX_PIECES: refused on the bead and the roll length', () => {
    const bead = { shape: 'rectangular' as const, width: 1e6, depth: 1 };
    expect(error({ beads: { corner: { shape: 'fillet', leg: 0.01 }, panel_vertical: bead } }).field).toBe(
      'beads.panel_vertical',
    );
    expect(error({ tape: { width: 0.02, appliesTo: ['perimeter'], rollLength: 1e-9 } }).field).toBe(
      'tape.rollLength',
    );
  });
});

describe('schema, example and CSV', () => {
  it('the demo elevation parses, calculates and matches the result schema', () => {
    const demo = demoElevation();
    expect(takeoffInputSchema.safeParse(demo).success).toBe(true);
    const r = calculateTakeoff(demo);
    expect(takeoffResultSchema.safeParse(r).success).toBe(true);
    for (const s of r.trace)
      expect(Number.isFinite(s.value) && s.formula.length > 0 && s.source.length > 0).toBe(true);
    expect(r.trace.slice(-r.lines.length)).toEqual(r.lines);
  });
  it('RFC 4180 quoting: commas, quotes and line breaks are quoted, quotes doubled', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
  });
  it('one CSV row per trace step after the header, CRLF line ends', () => {
    const r = calculateTakeoff(input({}, { name: 'North, "main"' }));
    const csv = takeoffToCsv(r);
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = csv.split('\r\n').slice(0, -1);
    expect(rows[0]).toBe('Item,Quantity,Unit,Formula,Source,Note');
    expect(rows).toHaveLength(r.trace.length + 1);
    expect(rows[1]!.startsWith('"North, ""main"": vertical panel joints",54,m,')).toBe(true);
  });
});
