import { CalcInputError } from '@shared/calc/errors';
import { messageText } from '@shared/format/messages';
import { INCH } from '@shared/units';
import { describe, expect, it } from 'vitest';
import { demoJointSchedule } from './examples';
import { expansionMaterials, findExpansionMaterial } from './expansion';
import {
  backerFor,
  calculateJoint,
  calculateJointSchedule,
  DEFAULT_MINIMUM_WIDTH,
  MOVEMENT_CAPABILITY,
  marginText,
  sealantDepth,
  thermalMovement,
  widthForMovement,
} from './joints';
import { type JointInput, jointInputSchema, jointScheduleResultSchema } from './schema';
import {
  defaultSurfaceTemperatureRange,
  NIGHT_SKY_DROP,
  SURFACE_RISE_ABOVE_AIR,
} from './surface-temperature';

/** A 3 m aluminium panel moving into a joint against fixed construction; edit per test. */
const joint = (extra: Partial<JointInput> = {}): JointInput => ({
  name: 'Test joint',
  type: 'panel_vertical',
  designWidth: 0.02,
  sides: [{ alpha: 24e-6, length: 3 }],
  surfaceTemperatureRange: { min: -20, max: 80 },
  installationTemperature: 20,
  sealant: { movementClass: '25' },
  constructionTolerance: 0,
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
  it('ΔL = α·L·ΔT', () => {
    expect(thermalMovement(24e-6, 3, 100)).toBeCloseTo(7.2e-3, 15);
  });
  it('W = (100/X)·movement + tolerance', () => {
    expect(widthForMovement(0.002, 25, 0.003)).toBeCloseTo(0.011, 15);
    expect(widthForMovement(0.002, 100, 0)).toBeCloseTo(0.002, 15);
  });
  it('ASTM C920 classes: symmetric except 100/50 (+100 % extension, −50 % compression)', () => {
    for (const c of ['12.5', '25', '35', '50'] as const)
      expect(MOVEMENT_CAPABILITY[c].extension).toBe(MOVEMENT_CAPABILITY[c].compression);
    expect(MOVEMENT_CAPABILITY['100/50']).toEqual({ extension: 100, compression: 50 });
  });
  it('depth rule: D = min(W, ½ in) — no step at ½ in', () => {
    expect(sealantDepth(0.25 * INCH)).toBeCloseTo(0.25 * INCH, 15);
    expect(sealantDepth(0.5 * INCH)).toBeCloseTo(0.5 * INCH, 15);
    // The review's case: 12.70 mm used to give 6.36 mm; now just under ½ in, as deep as wide.
    expect(sealantDepth(0.0127)).toBeCloseTo(0.0127, 15);
    expect(sealantDepth(0.01271)).toBeCloseTo(0.5 * INCH, 15);
    expect(sealantDepth(0.75 * INCH)).toBeCloseTo(0.5 * INCH, 15);
    expect(sealantDepth(2 * INCH)).toBeCloseTo(0.5 * INCH, 15);
  });
  it('backer: closed-cell 1.25–1.33 W, open-cell 1.40–1.50 W, tape when the rod does not fit', () => {
    expect(backerFor(0.02, 0.01, 'closed_cell')).toEqual({
      kind: 'rod',
      cell: 'closed_cell',
      minDiameter: 0.025,
      maxDiameter: 1.33 * 0.02,
    });
    const open = backerFor(0.02, 0.01, 'open_cell', 0.05);
    expect(open.kind === 'rod' && open.minDiameter).toBeCloseTo(0.028, 15);
    expect(backerFor(0.02, 0.01, 'closed_cell', 0.034)).toEqual({ kind: 'bond_breaker_tape', width: 0.02 });
    expect(backerFor(0.02, 0.01, 'closed_cell', 0.035).kind).toBe('rod');
  });
  it('margin in words', () => {
    expect(marginText(0.0224, 0.02)).toBe('meets — margin 12 %');
    expect(marginText(0.02, 0.02)).toBe('meets — margin 0 %');
    expect(marginText(0.0168, 0.02)).toBe('short by 3.2 mm');
  });
});

describe('calculateJoint', () => {
  it('splits movement at the installation temperature (derived)', () => {
    const r = calculateJoint(joint());
    expect(r.deltaTExtension).toBe(40);
    expect(r.deltaTCompression).toBe(60);
    expect(r.movementExtension).toBeCloseTo(24e-6 * 3 * 40, 15);
    expect(r.movementCompression).toBeCloseTo(24e-6 * 3 * 60, 15);
    expect(r.governing).toBe('compression');
    expect(r.requiredWidth).toBeCloseTo(4 * 24e-6 * 3 * 60, 15);
  });

  it('an installation range takes the warm end for extension and the cool end for compression', () => {
    const r = calculateJoint(joint({ installationTemperature: { min: 5, max: 30 } }));
    expect(r.deltaTExtension).toBe(50);
    expect(r.deltaTCompression).toBe(75);
  });

  it('sums both sides and the other movement', () => {
    const r = calculateJoint(
      joint({
        sides: [
          { alpha: 24e-6, length: 3 },
          { material: 'concrete', length: 4 },
        ],
        otherMovement: { extension: 0.001, compression: 0.002 },
      }),
    );
    const concrete = findExpansionMaterial('concrete')!.alpha;
    expect(r.movementExtension).toBeCloseTo((24e-6 * 3 + concrete * 4) * 40 + 0.001, 15);
    expect(r.movementCompression).toBeCloseTo((24e-6 * 3 + concrete * 4) * 60 + 0.002, 15);
    expect(r.sides.map((s) => s.label)).toEqual(['custom α', 'Concrete (normal weight)']);
  });

  it('the 100/50 class sizes extension at 100 % and compression at 50 %', () => {
    const r = calculateJoint(joint({ sealant: { movementClass: '100/50' }, constructionTolerance: 0.003 }));
    expect(r.widthForExtension).toBeCloseTo(r.movementExtension + 0.003, 15);
    expect(r.widthForCompression).toBeCloseTo(2 * r.movementCompression + 0.003, 15);
  });

  it('the minimum practical width governs tiny movements (6 mm by default)', () => {
    const r = calculateJoint(joint({ sides: [{ alpha: 1e-6, length: 0.1 }] }));
    expect(r.governing).toBe('minimum');
    expect(r.requiredWidth).toBe(DEFAULT_MINIMUM_WIDTH);
    expect(
      calculateJoint(joint({ sides: [{ alpha: 1e-6, length: 0.1 }], minimumPracticalWidth: 0.01 }))
        .requiredWidth,
    ).toBe(0.01);
  });

  it('verdict, margin and words agree', () => {
    const pass = calculateJoint(joint({ designWidth: 0.02 }));
    expect(pass.verdict).toBe('pass');
    expect(pass.margin).toBeCloseTo(0.02 / pass.requiredWidth - 1, 12);
    expect(pass.marginText).toMatch(/^meets — margin \d+ %$/);
    const fail = calculateJoint(joint({ designWidth: 0.01 }));
    expect(fail.verdict).toBe('fail');
    expect(fail.margin).toBeLessThan(0);
    expect(fail.marginText).toBe(`short by ${((fail.requiredWidth - 0.01) * 1000).toFixed(1)} mm`);
  });

  it('depth and backer follow the design width', () => {
    const r = calculateJoint(joint({ designWidth: 0.025, openingDepth: 0.05 }));
    expect(r.requiredDepth).toBeCloseTo(0.5 * INCH, 15);
    expect(r.backer).toEqual({
      kind: 'rod',
      cell: 'closed_cell',
      minDiameter: 1.25 * 0.025,
      maxDiameter: 1.33 * 0.025,
    });
    const shallow = calculateJoint(joint({ designWidth: 0.025, openingDepth: 0.02 }));
    expect(shallow.backer).toEqual({ kind: 'bond_breaker_tape', width: 0.025 });
  });

  it('warns on excess or too-shallow depth, an over-wide joint, a shallow opening and a generic α', () => {
    const w = (extra: Partial<JointInput>) =>
      calculateJoint(joint(extra))
        .warnings.map((m) => messageText(m))
        .join('\n');
    expect(w({ designWidth: 0.02, designDepth: 0.015 })).toMatch(/deeper than the depth rule/);
    expect(w({ designDepth: 0.004 })).toMatch(/below the 6\u202fmm needed/);
    expect(w({ designWidth: 0.06 })).toMatch(/wider than 50\.8\u202fmm/);
    expect(w({ openingDepth: 0.005 })).toMatch(/shallower than the sealant depth/);
    expect(w({ sides: [{ material: 'pvc-rigid', length: 1 }] })).toMatch(
      /α of PVC, rigid \(unplasticised\): generic value — use the maker’s declared coefficient/,
    );
    expect(calculateJoint(joint()).warnings).toEqual([]);
  });

  it('a joint wider than 2 in (51 mm) is a message with its width and the limit in m, worded in SI and IP', () => {
    const [wide] = calculateJoint(joint({ designWidth: 0.06 })).warnings.filter(
      (m) => m.code === 'joint_over_wide',
    );
    // 2 in = 0.0508 m exactly (NIST SP 811 [memory]).
    expect(wide).toEqual({
      code: 'joint_over_wide',
      path: 'joint.designWidth',
      values: { width: 0.06, limit: 2 * INCH },
    });
    expect(messageText(wide!, 'IP')).toMatch(/wider than 2\u202fin: have the sealant manufacturer review it/);
  });

  it('every trace step carries a formula, a source and a finite value', () => {
    for (const s of calculateJoint(
      joint({
        sides: [
          { alpha: 24e-6, length: 3 },
          { material: 'glass-soda-lime', length: 1 },
        ],
      }),
    ).trace) {
      expect(s.formula.length).toBeGreaterThan(0);
      expect(s.source.length).toBeGreaterThan(0);
      expect(Number.isFinite(s.value)).toBe(true);
    }
  });
});

describe('refuses impossible input with the field path', () => {
  const field = (j: Partial<JointInput>) => inputError(() => calculateJointSchedule([joint(j)])).field;
  it.each([
    [{ designWidth: -0.01 }, 'joints.0.designWidth'],
    [{ designDepth: 0 }, 'joints.0.designDepth'],
    [{ surfaceTemperatureRange: { min: 30, max: 30 } }, 'joints.0.surfaceTemperatureRange'],
    [{ surfaceTemperatureRange: { min: 40, max: 10 } }, 'joints.0.surfaceTemperatureRange'],
    [{ sides: [{ material: 'unobtainium', length: 1 }] }, 'joints.0.sides.0.material'],
    [{ sides: [{ alpha: -1e-6, length: 1 }] }, 'joints.0.sides.0.alpha'],
    [{ sides: [{ alpha: 1e-5, length: 0 }] }, 'joints.0.sides.0.length'],
    [{ sides: [] }, 'joints.0.sides'],
    [{ installationTemperature: 90 }, 'joints.0.installationTemperature'],
    [{ installationTemperature: { min: 25, max: 5 } }, 'joints.0.installationTemperature'],
    [{ otherMovement: { extension: -0.001, compression: 0 } }, 'joints.0.otherMovement.extension'],
    [{ constructionTolerance: -0.001 }, 'joints.0.constructionTolerance'],
    [{ minimumPracticalWidth: 0 }, 'joints.0.minimumPracticalWidth'],
    [{ openingDepth: -0.01 }, 'joints.0.openingDepth'],
    [{ sealant: { movementClass: '75' as '50' } }, 'joints.0.sealant.movementClass'],
  ] as [Partial<JointInput>, string][])('%o → %s', (j, path) => {
    expect(field(j)).toBe(path);
  });
  it('an empty schedule', () => {
    expect(inputError(() => calculateJointSchedule([])).field).toBe('joints');
  });
  it('the second joint of a schedule is named by its index', () => {
    expect(inputError(() => calculateJointSchedule([joint(), joint({ designWidth: 0 })])).field).toBe(
      'joints.1.designWidth',
    );
  });
});

describe('schedule, schema and example', () => {
  it('the demo schedule parses, calculates and matches the result schema', () => {
    const input = demoJointSchedule();
    for (const j of input) expect(jointInputSchema.safeParse(j).success).toBe(true);
    const r = calculateJointSchedule(input);
    expect(jointScheduleResultSchema.safeParse(r).success).toBe(true);
    expect(r.passCount + r.failCount).toBe(input.length);
    expect(r.passCount).toBe(r.joints.filter((j) => j.verdict === 'pass').length);
  });
  it('the schema refuses what the engine refuses at the edge', () => {
    expect(jointInputSchema.safeParse(joint({ designWidth: -1 })).success).toBe(false);
    expect(jointInputSchema.safeParse(joint({ sides: [] })).success).toBe(false);
  });
});

describe('expansion table', () => {
  it('every row names a table; α lies inside any tabulated range (provenance: thermal-expansion.source.md)', () => {
    for (const row of expansionMaterials) {
      expect(row.source.length).toBeGreaterThan(0);
      if (row.range) {
        expect(row.alpha).toBeGreaterThanOrEqual(row.range.low);
        expect(row.alpha).toBeLessThanOrEqual(row.range.high);
      }
    }
  });
  it('covers the façade materials the schedule needs', () => {
    for (const id of [
      'carbon-steel',
      'stainless-304',
      'stainless-316',
      'aluminium-3003',
      'aluminium-5005',
      'aluminium-6063',
      'zinc-titanium',
      'copper',
      'glass-soda-lime',
      'concrete',
      'brick-clay',
      'pvc-rigid',
      'fibre-cement',
    ])
      expect(findExpansionMaterial(id)).toBeDefined();
  });
});

describe('default surface temperatures (trade practice, editable)', () => {
  it('dark in sun runs hottest; the night sky cools every surface below the air', () => {
    const dark = defaultSurfaceTemperatureRange({ min: -20, max: 35 }, 'dark', 'sun');
    expect(dark).toEqual({ min: -20 - NIGHT_SKY_DROP, max: 35 + SURFACE_RISE_ABOVE_AIR.sun.dark });
    const light = defaultSurfaceTemperatureRange({ min: -20, max: 35 }, 'light', 'sun');
    const shade = defaultSurfaceTemperatureRange({ min: -20, max: 35 }, 'dark', 'shade');
    expect(dark.max).toBeGreaterThan(light.max);
    expect(light.max).toBeGreaterThan(shade.max);
  });
  it('refuses an inverted air range', () => {
    expect(inputError(() => defaultSurfaceTemperatureRange({ min: 10, max: 0 }, 'dark', 'sun')).field).toBe(
      'air',
    );
  });
});
