import { describe, expect, it } from 'vitest';
import { CalcInputError } from '../calc/errors';
import { criteriaRow, demoAssembly, demoProject } from '../checks/fixtures';
import { runChecks } from '../checks/runner';
import { demoSweep } from './examples';
import type { SweepParameter } from './schema';
import { applyVariant, enumerateVariants, planSweep, runSweep, variantValues } from './sweep';

const refusal = (parameters: SweepParameter[], cap = 1000, a = demoAssembly()) => {
  try {
    planSweep(a, parameters, cap);
  } catch (e) {
    if (e instanceof CalcInputError) return e.field;
    throw e;
  }
  throw new Error('not refused');
};
const thickness = (range: { start: number; stop: number; step: number }): SweepParameter => ({
  kind: 'insulationThickness',
  layer: 3,
  range,
});

describe('planning a sweep refuses before any work, naming the field', () => {
  it('a zero or negative step', () => {
    expect(refusal([thickness({ start: 0.05, stop: 0.1, step: 0 })])).toBe('parameters.0.range.step');
    expect(refusal([thickness({ start: 0.05, stop: 0.1, step: -0.01 })])).toBe('parameters.0.range.step');
  });
  it('a stop below the start', () => {
    expect(refusal([thickness({ start: 0.1, stop: 0.05, step: 0.01 })])).toBe('parameters.0.range.stop');
  });
  it('more variants than the cap, counted without enumerating', () => {
    const p: SweepParameter[] = [
      thickness({ start: 0.01, stop: 0.2, step: 0.001 }),
      { kind: 'clipSpacing', range: { start: 0.2, stop: 1.2, step: 0.01 } },
    ];
    expect(refusal(p, 10_000)).toBe('parameters');
    expect(refusal([thickness({ start: 0.01, stop: 1, step: 1e-9 })], 10_000)).toBe(
      'parameters.0.range.step',
    );
  });
  it('an empty list, and a range with a list', () => {
    expect(refusal([{ kind: 'clipSpacing', list: [] }])).toBe('parameters.0.list');
    expect(refusal([{ kind: 'sealantClass', list: [] }])).toBe('parameters.0.list');
    expect(refusal([{ kind: 'clipSpacing', list: [0.4], range: { start: 0.4, stop: 0.6, step: 0.1 } }])).toBe(
      'parameters.0',
    );
  });
  it('a layer, bridge or joint the assembly does not have', () => {
    expect(refusal([{ kind: 'insulationThickness', layer: 8, list: [0.05] }])).toBe('parameters.0.layer');
    expect(refusal([{ kind: 'insulationThickness', layer: 2, list: [0.05] }])).toBe('parameters.0.layer'); // declared R
    expect(refusal([{ kind: 'studSpacing', layer: 3, list: [0.6] }])).toBe('parameters.0.layer'); // not framed
    expect(refusal([{ kind: 'clipChi', bridge: 1, list: [0.01] }])).toBe('parameters.0.bridge'); // linear
    expect(refusal([{ kind: 'clipChi', bridge: 3, list: [0.01] }])).toBe('parameters.0.bridge');
    expect(refusal([{ kind: 'sealantClass', joint: 3, list: ['25'] }])).toBe('parameters.0.joint');
  });
  it('no girts, no clips, no panel, no joints on the assembly', () => {
    const bare = demoAssembly();
    bare.attachment = { girtOrientation: 'horizontal', clipType: '', fastenerType: '' };
    delete bare.windPanel;
    delete bare.joints;
    expect(refusal([{ kind: 'girtSpacing', list: [1] }], 1000, bare)).toBe('parameters.0');
    expect(refusal([{ kind: 'clipSpacing', list: [1] }], 1000, bare)).toBe('parameters.0');
    expect(refusal([{ kind: 'panelModule', list: [0.6] }], 1000, bare)).toBe('parameters.0');
    expect(refusal([{ kind: 'sealantClass', list: ['25'] }], 1000, bare)).toBe('parameters.0');
  });
  it('a value outside the bounds of the field it varies, and the same parameter twice', () => {
    expect(refusal([{ kind: 'clipSpacing', list: [0.4, 0] }])).toBe('parameters.0.list.1');
    expect(refusal([thickness({ start: -0.01, stop: 0.1, step: 0.01 })])).toBe('parameters.0.range.start');
    expect(refusal([{ kind: 'clipChi', bridge: 0, list: [11] }])).toBe('parameters.0.list.0');
    expect(
      refusal([
        thickness({ start: 0.05, stop: 0.1, step: 0.05 }),
        thickness({ start: 0.05, stop: 0.1, step: 0.05 }),
      ]),
    ).toBe('parameters.1');
  });
});

describe('variants', () => {
  it('ranges include the stop when it falls on a step, values rounded; the last parameter varies fastest', () => {
    const plan = planSweep(demoAssembly(), demoSweep().parameters, 1000);
    expect(plan.axes[0]!.values).toEqual([0.025, 0.05, 0.075, 0.1, 0.125, 0.15]);
    expect(plan.count).toBe(24);
    expect(variantValues(plan, 0)).toEqual([0.025, 0.4]);
    expect(variantValues(plan, 5)).toEqual([0.05, 0.6]);
    expect([...enumerateVariants(plan)].map((v) => v.values)).toHaveLength(24);
  });

  it('apply puts the values in a new document; the girt and clip bridges follow their spacings', () => {
    const a = demoAssembly();
    const before = JSON.stringify(a);
    const plan = planSweep(
      a,
      [
        { kind: 'girtSpacing', list: [0.9] },
        { kind: 'clipSpacing', list: [1.2] },
        { kind: 'studSpacing', layer: 5, list: [0.61] },
      ],
      10,
    );
    const v = applyVariant(plan, a, [0.9, 1.2, 0.61]);
    expect(JSON.stringify(a)).toBe(before);
    expect(v.attachment).toMatchObject({ girtSpacing: 0.9, clipSpacing: 1.2 });
    // The demo's clips sit at 0.8 m along and 1.2 m across the horizontal girts; the girt ψ at 1.2 m.
    expect(v.thermal.bridges[0]).toMatchObject({ spacingHorizontal: 1.2, spacingVertical: 0.9 });
    expect(v.thermal.bridges[1]).toMatchObject({ spacing: 0.9 });
    const studs = v.thermal.layers[5];
    if (studs?.kind !== 'framed') throw new Error('the demo wall has changed');
    expect(studs.spacing).toBe(0.61);
    expect(studs.sections[1]!.fraction).toBeCloseTo((0.00270935960591133 * 0.406) / 0.61, 15);
    expect(studs.sections.reduce((s, x) => s + x.fraction, 0)).toBeCloseTo(1, 14);
    expect(v.vapour).toBe(a.vapour); // untouched parts are shared
  });
});

describe('running a sweep', () => {
  const rows = [criteriaRow('max_u_factor', 0.35)];

  it('U never rises with insulation thickness (margin of U ≤ limit never falls)', () => {
    const r = runSweep(
      demoAssembly(),
      demoProject(),
      rows,
      [thickness({ start: 0.01, stop: 0.3, step: 0.01 })],
      100,
    );
    const margins = r.variants.map((v) => v.checks.find((c) => c.id === 'criterion.max_u_factor')!.margin!);
    expect(margins).toHaveLength(30);
    for (let i = 1; i < margins.length; i++) expect(margins[i]!).toBeGreaterThanOrEqual(margins[i - 1]!);
  });

  it('each variant gives the runner’s verdict, its governing check and every check’s margin', () => {
    const s = demoSweep();
    const r = runSweep(s.assembly, s.project, s.rows, s.parameters, 1000);
    expect(r.variants).toHaveLength(24);
    const v = r.variants[13]!;
    const direct = runChecks(applyVariant(r.plan, s.assembly, v.values), s.project, s.rows);
    expect(v.verdict).toBe(direct.verdict);
    expect(v.checks.map((c) => [c.id, c.status, c.margin])).toEqual(
      direct.checks.map((c) => [c.id, c.status, c.margin]),
    );
    const failing = direct.checks.filter((c) => c.status === 'fail');
    if (failing.length > 0) expect(v.governing!.status).toBe('fail');
    else
      expect(v.governing!.marginRatio).toBe(Math.min(...direct.checks.map((c) => c.marginRatio ?? Infinity)));
  });
});
