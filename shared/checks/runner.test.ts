import { describe, expect, it } from 'vitest';
import { calculateWindSchedule } from '../calc/wind/attachment';
import { checkDesignSpacing } from '../calc/wind/design';
import { storedMessageText as said } from '../format/messages';
import type { AssemblyInput } from '../schemas/assembly';
import { canonicalJson } from './canonical';
import { CRITERION_TYPE_KEYS, CRITERION_TYPES } from './criteria';
import { demoAssembly, demoProject, criteriaRow as row } from './fixtures';
import { windDesignInputFor } from './inputs';
import { continuousInsulationR, INSULATION_MAX_CONDUCTIVITY } from './metrics';
import { defineCheckModule } from './module';
import { CHECK_MODULES, thermalModule } from './modules';
import { runChecks } from './runner';

const check = (report: ReturnType<typeof runChecks>, id: string) => report.checks.find((c) => c.id === id)!;

describe('the compliance runner on the demo assembly', () => {
  const all = [
    row('max_u_factor', 0.35),
    row('min_effective_r', 3),
    row('min_continuous_insulation_r', 1.5),
    row('min_cavity_insulation_r', 1.5),
    row('max_condensation_accumulation', 0.5),
    row('must_dry_within_year', true),
    row('max_surface_rh', 0.8),
    row('min_deflection_limit', 180),
    row('min_sealant_movement_class', 25),
  ];
  const report = runChecks(demoAssembly(), demoProject(), all);

  it('evaluates every criterion type from the metric it declares', () => {
    expect(report.matchedRows).toBe(CRITERION_TYPE_KEYS.length);
    for (const type of CRITERION_TYPE_KEYS) {
      const c = check(report, `criterion.${type}`);
      expect(c.status, type).toBe('pass');
      expect(report.metrics[CRITERION_TYPES[type].metric]!.value).toEqual(c.provided);
    }
    expect(report.criteriaVerdict).toBe('pass');
  });

  it('reads U_eff and R_eff from the thermal result, with their trace steps', () => {
    const u = check(report, 'criterion.max_u_factor');
    // The demo's 92 mm steel studs at 406 mm are in ASHRAE 90.1 Table A9.2-2: the energy-code path decides.
    expect(u.provided).toBeCloseTo(0.300343, 5);
    expect(u.margin).toBeCloseTo(0.35 - (u.provided as number), 12);
    expect(u.marginRatio).toBeCloseTo((u.margin as number) / 0.35, 12);
    expect(u.traceStepIds).toEqual(['thermal.Ueff', 'thermal.R0']);
    expect(report.steps.find((s) => s.id === 'thermal.Ueff')!.value).toBe(u.provided);
    expect(check(report, 'criterion.min_effective_r').provided).toBeCloseTo(1 / (u.provided as number), 12);
  });

  it('names the method that decides the thermal rows, with the other methods beside it', () => {
    for (const id of ['criterion.max_u_factor', 'criterion.min_effective_r']) {
      const m = check(report, id).method!;
      expect(m.method).toBe('energyCode');
      expect(m.kind).toBe('energyCode');
      expect(m.others.map((o) => o.method)).toEqual(['parallelPath', 'isothermalPlanes', 'zone']);
      expect(m.text).toMatch(/Table A9\.2-2/);
    }
    expect(check(report, 'criterion.min_continuous_insulation_r').method).toBeUndefined();
  });

  it('uses the lowest R of the methods offered when no energy-code path applies, and says so', () => {
    const a: AssemblyInput = demoAssembly();
    const studs = a.thermal.layers[5];
    if (studs?.kind !== 'framed') throw new Error('the demo wall has changed');
    a.thermal.layers[5] = { ...studs, spacing: 0.6 };
    const r = runChecks(a, demoProject(), [row('min_effective_r', 1)]);
    const c = check(r, 'criterion.min_effective_r');
    expect(c.method!.kind).toBe('mostConservative');
    expect(c.method!.text).toMatch(/lowest of the methods offered/);
    expect(c.method!.others.every((o) => o.R >= (c.provided as number))).toBe(true);
  });

  it('counts continuous insulation by its convention: homogeneous, λ ≤ 0.065, inside the ventilated cavity', () => {
    // Mineral wool board 100 mm at 0.035 W/(m·K); the steel face outside the cavity and the gypsum are not insulation.
    expect(check(report, 'criterion.min_continuous_insulation_r').provided).toBeCloseTo(0.1 / 0.035, 12);
    // Glass-fibre batt 92 mm at 0.040 W/(m·K) between the studs.
    expect(check(report, 'criterion.min_cavity_insulation_r').provided).toBeCloseTo(0.092 / 0.04, 12);
    const outside = continuousInsulationR([
      { kind: 'homogeneous', name: 'Foam outside the vented cavity', thickness: 0.05, conductivity: 0.03 },
      { kind: 'air', name: 'Vented cavity', thickness: 0.025, ventilation: 'well' },
      {
        kind: 'homogeneous',
        name: 'Board at the threshold',
        thickness: 0.065,
        conductivity: INSULATION_MAX_CONDUCTIVITY,
      },
      { kind: 'resistance', name: 'Declared panel', resistance: 2 },
    ]);
    expect(outside.value).toBeCloseTo(1, 12);
    expect(said(outside.note)).toMatch(/Declared-resistance layers not counted: Declared panel/);
  });

  it('takes the highest interior surface RH over the months (p_i/p_sat(θ_si)) and the lowest sealant class', () => {
    const rh = check(report, 'criterion.max_surface_rh');
    expect(rh.provided).toBeGreaterThan(0.7);
    expect(rh.provided).toBeLessThan(0.8);
    // HJ-1 uses a class 25 sealant; 50 and 100/50 are higher.
    expect(check(report, 'criterion.min_sealant_movement_class')).toMatchObject({ provided: 25, margin: 0 });
    expect(check(report, 'criterion.min_deflection_limit')).toMatchObject({ provided: 180, status: 'pass' });
  });

  it('gives the modules’ own verdicts: wind spacing per zone, every joint, the surface check', () => {
    expect(check(report, 'wind.zone4.girtSpacing')).toMatchObject({
      provided: 1.2,
      status: 'pass',
      unit: 'm',
    });
    expect(check(report, 'wind.zone5.clipSpacing')).toMatchObject({ provided: 0.8, status: 'pass' });
    expect(check(report, 'wind.zone5.table').status).toBe('pass');
    expect(check(report, 'moisture.surface').status).toBe('pass');
    // The demo's HJ-1 and PJ-1 joints are too narrow for their movement.
    expect(['joints.0', 'joints.1', 'joints.2'].map((id) => check(report, id).status)).toEqual([
      'pass',
      'fail',
      'fail',
    ]);
    expect(check(report, 'joints.1').margin).toBeLessThan(0);
    expect(report.moduleVerdict).toBe('fail');
    expect(report.verdict).toBe('fail');
    expect(report.cautions.some((c) => /licensed professional/.test(said(c)))).toBe(true);
  });

  it('judges the design girt and clip spacing with the engine’s checkDesignSpacing, and refers to its steps', () => {
    const ready = windDesignInputFor(demoAssembly(), demoProject());
    if (ready.status !== 'ready') throw new Error('the demo wind input is incomplete');
    const design = checkDesignSpacing(ready.input, calculateWindSchedule(ready.input));
    for (const d of design.zones) {
      const girt = check(report, `wind.zone${d.zone}.girtSpacing`);
      const clip = check(report, `wind.zone${d.zone}.clipSpacing`);
      expect(girt).toMatchObject({ required: d.maxGirtSpacing, provided: d.girtSpacing });
      expect(girt.status).toBe(d.girt === 'meets' ? 'pass' : 'fail');
      // The clip spacing is compared with the maximum at the design girt spacing, not at the maximum girt spacing.
      expect(clip).toMatchObject({ required: d.maxClipAtDesignGirt, provided: d.clipSpacing });
      expect(clip.status).toBe(d.clip === 'meets' ? 'pass' : 'fail');
      expect(clip.margin).toBeCloseTo(d.maxClipAtDesignGirt! - d.clipSpacing!, 12);
      for (const id of [...girt.traceStepIds, ...clip.traceStepIds])
        expect(report.steps.some((s) => s.id === id)).toBe(true);
      expect(clip.traceStepIds).toContain(`wind.zone${d.zone}.design.clip`);
    }
    const wind = report.modules.find((m) => m.id === 'wind')!.result as { design: unknown };
    expect(wind.design).toEqual(design);
  });

  it('fails a design girt spacing beyond the maximum, and one the table cannot reach is not evaluated', () => {
    const a = demoAssembly();
    const beyond = runChecks({ ...a, attachment: { ...a.attachment, girtSpacing: 2.9 } }, demoProject(), []);
    const girt = check(beyond, 'wind.zone4.girtSpacing');
    expect(girt.status).toBe('fail');
    expect(girt.margin).toBeLessThan(0);
    const short = runChecks({ ...a, attachment: { ...a.attachment, girtSpacing: 0.5 } }, demoProject(), []);
    expect(check(short, 'wind.zone4.girtSpacing').status).toBe('not_evaluated');
    expect(said(check(short, 'wind.zone4.girtSpacing').reason)).toMatch(
      /shorter than the table’s shortest span/,
    );
  });

  it('fails a tightened maximum and says by how much', () => {
    const tight = runChecks(demoAssembly(), demoProject(), [row('max_u_factor', 0.3)]);
    const u = check(tight, 'criterion.max_u_factor');
    expect(u.status).toBe('fail');
    expect(u.margin).toBeCloseTo(0.3 - (u.provided as number), 12);
    expect(tight.criteriaVerdict).toBe('fail');
  });
});

describe('what cannot be evaluated is reported, never passed', () => {
  it('names the missing project climate and wind data', () => {
    const r = runChecks(demoAssembly(), { ...demoProject(), climate: null, wind: null }, [
      row('max_surface_rh', 0.8),
      row('must_dry_within_year', true),
      row('min_deflection_limit', 180),
      row('max_u_factor', 0.35),
    ]);
    expect(check(r, 'criterion.max_surface_rh')).toMatchObject({ status: 'not_evaluated', provided: null });
    expect(said(check(r, 'criterion.max_surface_rh').reason)).toBe(
      'the project’s monthly climate is missing',
    );
    expect(check(r, 'criterion.must_dry_within_year').status).toBe('not_evaluated');
    expect(said(check(r, 'criterion.min_deflection_limit').reason)).toBe(
      'the project’s wind data is missing',
    );
    expect(check(r, 'moisture.run').status).toBe('not_evaluated');
    expect(check(r, 'wind.run').status).toBe('not_evaluated');
    expect(r.criteriaVerdict).toBe('incomplete');
    expect(r.modules.map((m) => m.status)).toEqual(['ran', 'missing', 'missing', 'ran']);
  });

  it('does not check the design spacing that was not entered, and says so', () => {
    const a = demoAssembly();
    const r = runChecks({ ...a, attachment: { ...a.attachment, girtSpacing: undefined } }, demoProject(), []);
    expect(check(r, 'wind.zone4.girtSpacing')).toMatchObject({
      status: 'not_evaluated',
      reason: { code: 'girt_spacing_missing', path: 'attachment.girtSpacing' },
    });
    expect(said(check(r, 'wind.zone4.girtSpacing').reason)).toBe(
      'the design girt spacing is not entered on the assembly',
    );
  });

  it('says when the code table has no row for the zone and category', () => {
    const r = runChecks(demoAssembly(), demoProject(), [
      row('max_u_factor', 0.35, '7'),
      row('max_u_factor', 0.35, '5A', 'mass'),
    ]);
    expect(r.matchedRows).toBe(0);
    expect(check(r, 'criteria.none')).toMatchObject({ status: 'not_evaluated' });
    expect(said(check(r, 'criteria.none').reason)).toMatch(/no row for climate zone 5A .* steel-framed wall/);
    expect(r.criteriaVerdict).toBe('incomplete');
  });

  it('reports a criterion whose module is not registered as not evaluated', () => {
    const r = runChecks(
      demoAssembly(),
      demoProject(),
      [row('max_u_factor', 0.35), row('max_surface_rh', 0.8)],
      [thermalModule],
    );
    expect(check(r, 'criterion.max_u_factor').status).toBe('pass');
    expect(check(r, 'criterion.max_surface_rh')).toMatchObject({ status: 'not_evaluated', module: '—' });
  });

  it('reports a calculation that refuses its input, with the field', () => {
    const a = demoAssembly();
    const bad = { ...a, thermal: { ...a.thermal, bridges: [{ ...a.thermal.bridges[2]!, layerIndex: 40 }] } };
    const r = runChecks(bad as typeof a, demoProject(), [row('max_u_factor', 0.35)]);
    expect(r.modules[0]!.status).toBe('error');
    expect(check(r, 'criterion.max_u_factor').status).toBe('not_evaluated');
    expect(said(check(r, 'criterion.max_u_factor').reason)).toMatch(/refused the input \(bridges\.0/);
  });
});

describe('rows, wildcards and the module registry', () => {
  it('prefers a row naming the zone over an all-zones row for the same criterion', () => {
    const r = runChecks(demoAssembly(), demoProject(), [
      row('max_u_factor', 0.2, '*'),
      row('max_u_factor', 0.35, '5A'),
    ]);
    expect(check(r, 'criterion.max_u_factor')).toMatchObject({
      required: 0.35,
      status: 'pass',
      row: { climateZone: '5A' },
    });
    const wild = runChecks(demoAssembly(), demoProject(), [row('max_u_factor', 0.2, '*')]);
    expect(check(wild, 'criterion.max_u_factor')).toMatchObject({ required: 0.2, status: 'fail' });
  });

  it('takes a module that lands later without changing the runner', () => {
    const acoustic = defineCheckModule({
      id: 'acoustic',
      label: 'Acoustic check',
      provides: [],
      build: (a) => ({ status: 'ready', input: a.thermal.layers.length }),
      run: (layers: number) => ({ layers }),
      metrics: () => ({}),
      verdicts: (r) => [
        {
          id: 'acoustic.layers',
          criterion: 'layers',
          label: 'At least three layers',
          required: 3,
          provided: r.layers,
          unit: '',
          direction: 'min',
          margin: r.layers - 3,
          marginRatio: null,
          status: r.layers >= 3 ? 'pass' : 'fail',
          reason: null,
          traceStepIds: [],
        },
      ],
      trace: () => [],
      cautions: () => ['Acoustic caution'],
    });
    const r = runChecks(demoAssembly(), demoProject(), [], [...CHECK_MODULES, acoustic]);
    expect(check(r, 'acoustic.layers')).toMatchObject({
      status: 'pass',
      module: 'acoustic',
      source: 'module',
    });
    expect(r.modules.at(-1)).toMatchObject({ id: 'acoustic', status: 'ran' });
    expect(r.cautions).toContain('Acoustic caution');
  });

  it('gives the same report, byte for byte, for the same inputs', () => {
    const rows = [row('max_u_factor', 0.35), row('max_surface_rh', 0.8, '*')];
    expect(canonicalJson(runChecks(demoAssembly(), demoProject(), rows))).toBe(
      canonicalJson(runChecks(demoAssembly(), demoProject(), rows)),
    );
  });
});
