import { CalcInputError } from '@shared/calc/errors';
import { messageText } from '@shared/format/messages';
import { R_IP_TO_SI, siValue, U_IP_TO_SI } from '@shared/units';
import { describe, expect, it } from 'vitest';
import { metalPanelWall } from './examples';
import { findMaterial, materials } from './materials';
import {
  type FramedLayer,
  type Layer,
  MIN_CONDUCTIVITY,
  MIN_FASTENER_DIAMETER,
  MIN_FLANGE_WIDTH,
  MIN_FRACTION,
  MIN_SPACING,
  MIN_THICKNESS,
  type ThermalInput,
  thermalInputSchema,
  thermalResultSchema,
} from './schema';
import {
  AIR_LAYER_TABLE,
  airLayerResistance,
  calculateThermal,
  fastenerAlpha,
  fastenerDeltaU,
  framedLayerIsothermalResistance,
  iso6946Combined,
  iso6946Lower,
  iso6946Upper,
  isothermalPlanes,
  layerResistance,
  MAX_PARALLEL_PATHS,
  parallelPath,
  surfaceResistances,
  zoneMethod,
} from './thermal';

const wall = (layers: Layer[], extra: Partial<ThermalInput> = {}): ThermalInput => ({
  heatFlow: 'horizontal',
  bridges: [],
  layers,
  ...extra,
});
const board = (thickness: number, conductivity: number, name = 'Board'): Layer => ({
  kind: 'homogeneous',
  name,
  thickness,
  conductivity,
});
const woodStuds: Layer = {
  kind: 'framed',
  name: 'Wood studs with batts',
  thickness: 0.14,
  metal: false,
  sections: [
    { name: 'Batt', conductivity: 0.04, fraction: 0.85 },
    { name: 'Timber', conductivity: 0.13, fraction: 0.15 },
  ],
};

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

describe('layer and surface resistances', () => {
  it('R = d/λ', () => {
    expect(layerResistance(0.1, 0.04)).toBeCloseTo(2.5, 12);
  });

  it('surface resistances follow the heat-flow direction', () => {
    expect(surfaceResistances('upward').Rsi).toBeLessThan(surfaceResistances('horizontal').Rsi);
    expect(surfaceResistances('horizontal').Rsi).toBeLessThan(surfaceResistances('downward').Rsi);
  });

  it('refuses an unknown heat-flow direction with the field path', () => {
    const e = inputError(() => calculateThermal(wall([board(0.1, 1)], { heatFlow: 'sideways' as 'upward' })));
    expect(e.field).toBe('heatFlow');
  });
});

describe('air layers', () => {
  it('interpolates Table 8 linearly between tabulated thicknesses (derived)', () => {
    expect(airLayerResistance(0.02, 'horizontal', 'unventilated')).toBeCloseTo((0.17 + 0.18) / 2, 12);
    expect(airLayerResistance(0.0025, 'downward', 'unventilated')).toBeCloseTo(0.055, 12);
  });

  it('a slightly ventilated layer keeps its unventilated R (the blend is on R_T); a well-ventilated one is 0', () => {
    const full = airLayerResistance(0.05, 'downward', 'unventilated');
    expect(airLayerResistance(0.05, 'downward', 'slightly')).toBe(full);
    expect(airLayerResistance(0.05, 'downward', 'well')).toBe(0);
  });

  it('Annex D with E = 0.82 (two ε = 0.9 faces) reproduces Table 8 to its rounding (derived)', () => {
    const E = 1 / (1 / 0.9 + 1 / 0.9 - 1);
    for (const flow of ['upward', 'horizontal', 'downward'] as const)
      AIR_LAYER_TABLE.thickness.forEach((d, k) => {
        if (d === 0) return;
        expect(
          Math.abs(airLayerResistance(d, flow, 'unventilated', E) - AIR_LAYER_TABLE[flow][k]!),
        ).toBeLessThan(0.006);
      });
  });

  it('a low-emittance cavity resists more than a high-emittance one', () => {
    expect(airLayerResistance(0.025, 'horizontal', 'unventilated', 0.05)).toBeGreaterThan(
      airLayerResistance(0.025, 'horizontal', 'unventilated'),
    );
  });

  it('a well-ventilated layer discards the layers outside it and sets Rse = Rsi', () => {
    const inner = [board(0.1, 0.035), board(0.0125, 0.25)];
    const vented = calculateThermal(
      wall([
        board(0.02, 1, 'Cladding'),
        { kind: 'air', name: 'Vented cavity', thickness: 0.04, ventilation: 'well' },
        ...inner,
      ]),
    );
    const bare = calculateThermal(wall(inner));
    expect(vented.Rse).toBe(0.13);
    expect(vented.R0).toBeCloseTo(bare.R0 - 0.04 + 0.13, 12);
    expect(vented.trace.find((s) => s.id === 'thermal.Rse')?.note).toMatch(/Layers 0–1/);
  });

  describe('slightly ventilated air layers (ISO 6946:2017 §6.9.3)', () => {
    const veneer = board(0.1, 0.5, 'Masonry veneer');
    const inner = [board(0.1, 0.035), board(0.0125, 0.25)];
    const cavity = (ventilation: 'unventilated' | 'slightly' | 'well', ventArea?: number): Layer => ({
      kind: 'air',
      name: 'Cavity',
      thickness: 0.05,
      ventilation,
      ...(ventArea === undefined ? {} : { ventArea }),
    });
    const r0Of = (c: Layer) => calculateThermal(wall([veneer, c, ...inner])).R0;

    it('R_T = (1500 − A_v)/1000·R_T,u + (A_v − 500)/1000·R_T,v (derived)', () => {
      const u = r0Of(cavity('unventilated'));
      const w = r0Of(cavity('well'));
      expect(r0Of(cavity('slightly', 1000))).toBeCloseTo(0.5 * u + 0.5 * w, 12);
      expect(r0Of(cavity('slightly', 800))).toBeCloseTo(0.7 * u + 0.3 * w, 12);
      // At A_v = 1500 the slightly ventilated layer is the well-ventilated one.
      expect(r0Of(cavity('slightly', 1500))).toBeCloseTo(w, 12);
    });

    it('R falls as the vent area grows, and the trace shows the blend', () => {
      expect(r0Of(cavity('slightly', 700))).toBeGreaterThan(r0Of(cavity('slightly', 1200)));
      const r = calculateThermal(wall([veneer, cavity('slightly', 1000), ...inner]));
      expect(r.trace.find((t) => t.id === 'thermal.slightVentilation')?.inputs.A_v?.value).toBe(1000);
      expect(r.warnings).toEqual([]);
    });

    it('needs A_v, and A_v must match the class chosen', () => {
      expect(inputError(() => r0Of(cavity('slightly'))).field).toBe('layers.1.ventArea');
      expect(inputError(() => r0Of(cavity('slightly', 400))).reason).toMatch(/makes the layer unventilated/);
      expect(inputError(() => r0Of(cavity('unventilated', 900))).reason).toMatch(/slightly ventilated/);
      expect(inputError(() => r0Of(cavity('well', 1500))).reason).toMatch(/slightly ventilated/);
      expect(r0Of(cavity('unventilated', 500))).toBe(r0Of(cavity('unventilated')));
    });
  });
});

describe('methods', () => {
  it('without framed layers, parallel path and isothermal planes are the series sum', () => {
    expect(parallelPath(2.5, [])).toBeCloseTo(2.5, 12);
    expect(isothermalPlanes(2.5, [])).toBe(2.5);
  });

  it('parallel path with one framed layer: 1/R = Σ f/(R_series + d/λ) (derived)', () => {
    const framed = [
      {
        thickness: 0.1,
        sections: [
          { name: 'a', conductivity: 0.04, fraction: 0.9 },
          { name: 'b', conductivity: 0.1, fraction: 0.1 },
        ],
      },
    ];
    expect(parallelPath(0.2, framed)).toBeCloseTo(1 / (0.9 / (0.2 + 2.5) + 0.1 / (0.2 + 1)), 12);
    expect(isothermalPlanes(0.2, framed)).toBeCloseTo(0.2 + 0.1 / (0.9 * 0.04 + 0.1 * 0.1), 12);
    expect(framedLayerIsothermalResistance(0.1, framed[0]!.sections)).toBeCloseTo(0.1 / 0.046, 12);
  });

  it('ISO 6946 upper/lower limits are the parallel-path/isothermal-planes arithmetic', () => {
    expect(iso6946Upper).toBe(parallelPath);
    expect(iso6946Lower).toBe(isothermalPlanes);
  });

  it('combined method: mean of the limits and e = (R′ − R″)/(2R)', () => {
    const c = iso6946Combined(3.4, 3.0);
    expect(c.R).toBeCloseTo(3.2, 12);
    expect(c.error).toBeCloseTo(0.4 / 6.4, 12);
    expect(c.ratio).toBeCloseTo(3.4 / 3.0, 12);
  });

  it('zone method: zone A as wide as the spacing collapses to isothermal planes (derived)', () => {
    const z = zoneMethod({
      restResistance: 0.5,
      thickness: 0.1,
      memberConductivity: 50,
      memberFraction: 0.003,
      cavityConductivity: 0.04,
      flangeWidth: 0.04,
      spacing: 0.05,
      distance: 0.1,
    });
    expect(z.zoneWidth).toBe(0.05);
    expect(z.R).toBeCloseTo(0.5 + 0.1 / (0.003 * 50 + 0.997 * 0.04), 12);
  });

  it('zone method: W = m + 2d with d raised to 0.5 in', () => {
    const p = {
      restResistance: 0.5,
      thickness: 0.09,
      memberConductivity: 50,
      memberFraction: 0.0027,
      cavityConductivity: 0.04,
      flangeWidth: 0.041,
      spacing: 0.406,
    };
    expect(zoneMethod({ ...p, distance: 0.005 }).zoneWidth).toBeCloseTo(0.041 + 2 * 0.0127, 12);
    expect(zoneMethod({ ...p, distance: 0.0159 }).zoneWidth).toBeCloseTo(0.041 + 2 * 0.0159, 12);
  });

  it('non-metal framing: ISO 6946 combined is the default and all methods are reported', () => {
    const r = calculateThermal(wall([board(0.01, 0.13), woodStuds, board(0.0125, 0.25)]));
    expect(r.defaultMethod).toBe('isoCombined');
    expect(r.offeredMethods).toEqual(['parallelPath', 'isothermalPlanes', 'isoCombined']);
    expect(r.methods.isoUpper).toBe(r.methods.parallelPath);
    expect(r.methods.isoLower).toBe(r.methods.isothermalPlanes);
    expect(r.R0).toBe(r.methods.isoCombined);
    expect(r.methods.zone).toBeNull();
    expect(r.trace.find((s) => s.id === 'thermal.R0')?.note).toMatch(/no metal bridges the layers/);
  });

  it('steel framing the energy-code table covers: ISO 6946 is not offered, the energy-code path decides and the trace says why', () => {
    const r = calculateThermal(metalPanelWall());
    expect(r.defaultMethod).toBe('energyCode');
    expect(r.basis.kind).toBe('energyCode');
    expect(r.offeredMethods).toEqual(['parallelPath', 'isothermalPlanes', 'zone', 'energyCode']);
    expect(r.methods.isoCombined).toBeNull();
    expect(r.methods.isoUpper).toBeNull();
    expect(r.R0).toBe(r.methods.energyCode);
    expect(r.energyCode?.status).toBe('applied');
    const note = r.trace.find((s) => s.id === 'thermal.R0')?.note ?? '';
    expect(note).toMatch(/energy-code path for steel framing/);
    expect(note).toMatch(/ISO 6946:2017 excludes insulation bridged by metal/);
  });

  it('metal framing outside the table: the lowest R of the methods offered decides, and the reason is given', () => {
    const input = metalPanelWall();
    const studs = input.layers[6] as FramedLayer;
    input.layers[6] = { ...studs, spacing: 0.6 };
    const r = calculateThermal(input);
    expect(r.energyCode?.status).toBe('refused');
    expect(r.energyCode?.text).toMatch(/16 in and 24 in on centre; these are at 23\.62 in \(600 mm\)/);
    expect(r.methods.energyCode).toBeNull();
    expect(r.offeredMethods).toEqual(['parallelPath', 'isothermalPlanes', 'zone']);
    expect(r.basis.kind).toBe('mostConservative');
    expect(r.R0).toBe(Math.min(r.methods.parallelPath, r.methods.isothermalPlanes, r.methods.zone!));
    expect(r.basis.text).toMatch(/lowest of the methods offered/);
  });

  it('energy-code path: films, other layers and the table value in series (derived)', () => {
    const input = metalPanelWall();
    input.layers[1] = { kind: 'air', name: 'Drained cavity', thickness: 0.025, ventilation: 'unventilated' };
    const r = calculateThermal(input);
    const s = r.trace.find((t) => t.id === 'thermal.R.energyCode')!;
    const sum =
      s.inputs['R_film,e']!.value +
      s.inputs['ΣR_other layers']!.value +
      s.inputs['R_framing,eff']!.value +
      s.inputs['R_film,i']!.value;
    expect(s.value).toBeCloseTo(sum, 12);
    // ASHRAE 90.1 §A9.4.1 films and R-0.68 (IP) → SI.
    expect(s.inputs['R_film,e']!.value).toBeCloseTo(0.17 * R_IP_TO_SI, 12);
    expect(s.inputs['R_film,i']!.value).toBeCloseTo(0.68 * R_IP_TO_SI, 12);
    // 92 mm studs with λ 0.04 batts: rated, between the R-13 (6.0) and R-15 (6.4) rows at 16 in.
    const rated = 0.092 / 0.04 / R_IP_TO_SI;
    expect(s.inputs['R_framing,eff']!.value / R_IP_TO_SI).toBeCloseTo(6.0 + ((rated - 13) * 0.4) / 2, 9);
  });

  it('a second framed layer, or heat flowing up, leaves the energy-code path out with the reason', () => {
    const input = metalPanelWall();
    input.layers.splice(9, 0, { ...woodStuds, name: 'Service battens' });
    expect(calculateThermal(input).energyCode?.text).toMatch(/Service battens is framed too/);
    expect(calculateThermal({ ...metalPanelWall(), heatFlow: 'upward' }).energyCode?.text).toMatch(
      /for walls; heat flows upward/,
    );
  });

  it('homogeneous layers only: every method agrees and the spread is 0', () => {
    const r = calculateThermal(wall([board(0.2, 1), board(0.1, 0.035)]));
    expect(r.methods.parallelPath).toBeCloseTo(r.methods.isothermalPlanes, 12);
    expect(r.methodSpread).toBeCloseTo(0, 12);
    expect(r.R0).toBeCloseTo(0.13 + 0.2 + 0.1 / 0.035 + 0.04, 12);
  });

  it('method spread is (max − min)/mean of the offered methods', () => {
    const r = calculateThermal(metalPanelWall());
    const offered = [
      r.methods.parallelPath,
      r.methods.isothermalPlanes,
      r.methods.zone!,
      r.methods.energyCode!,
    ];
    const mean = offered.reduce((a, b) => a + b, 0) / offered.length;
    expect(r.methodSpread).toBeCloseTo((Math.max(...offered) - Math.min(...offered)) / mean, 12);
  });

  it('warns when R′T/R″T exceeds 1.5', () => {
    const r = calculateThermal(
      wall([
        {
          kind: 'framed',
          name: 'Concrete ribs in foam',
          thickness: 0.2,
          metal: false,
          sections: [
            { name: 'Foam', conductivity: 0.03, fraction: 0.8 },
            { name: 'Concrete', conductivity: 2.3, fraction: 0.2 },
          ],
        },
      ]),
    );
    const [w] = r.warnings;
    expect(w).toMatchObject({ code: 'combined_method_limit', values: { limit: 1.5 } });
    expect(w!.values.ratio).toBeGreaterThan(1.5);
    expect(messageText(w!)).toMatch(/exceeds 1\.5, the ISO 6946:2017 limit/);
  });
});

describe('bridges', () => {
  it('point bridges by spacing equal the same bridges by count', () => {
    const a = calculateThermal(
      wall([board(0.1, 0.035)], {
        bridges: [
          {
            kind: 'point',
            name: 'Clip',
            chi: siValue<'W/K'>(0.02),
            spacingHorizontal: 0.4,
            spacingVertical: 0.5,
          },
        ],
      }),
    );
    const b = calculateThermal(
      wall([board(0.1, 0.035)], {
        bridges: [{ kind: 'point', name: 'Clip', chi: siValue<'W/K'>(0.02), countPerArea: 5 }],
      }),
    );
    expect(a.bridges[0]!.deltaU).toBeCloseTo(0.1, 12);
    expect(b.bridges[0]!.deltaU).toBeCloseTo(0.1, 12);
  });

  it('linear bridges by spacing equal the same bridges by length per area', () => {
    const a = calculateThermal(
      wall([board(0.1, 0.035)], {
        bridges: [{ kind: 'linear', name: 'Girt', psi: siValue<'ψ W/(m·K)'>(0.05), spacing: 1.25 }],
      }),
    );
    const b = calculateThermal(
      wall([board(0.1, 0.035)], {
        bridges: [{ kind: 'linear', name: 'Girt', psi: siValue<'ψ W/(m·K)'>(0.05), lengthPerArea: 0.8 }],
      }),
    );
    expect(a.bridges[0]!.deltaU).toBeCloseTo(0.04, 12);
    expect(b.bridges[0]!.deltaU).toBeCloseTo(0.04, 12);
  });

  it('fastener: ΔU_f = α·λ_f·A_f·n_f/d₀·(R₁/R_T,h)², α = 0.8 when fully penetrating (derived)', () => {
    const r = calculateThermal(
      wall([board(0.1, 0.035, 'Insulation'), board(0.2, 2.3, 'Concrete')], {
        bridges: [
          {
            kind: 'fastener',
            name: 'Screw',
            conductivity: 50,
            diameter: 0.006,
            countPerArea: 6,
            penetration: 'full',
            layerIndex: 0,
          },
        ],
      }),
    );
    const R1 = 0.1 / 0.035;
    const expected = ((0.8 * 50 * ((Math.PI * 0.006 ** 2) / 4) * 6) / 0.1) * (R1 / r.R0) ** 2;
    expect(r.bridges[0]!.deltaU).toBeCloseTo(expected, 12);
    expect(fastenerDeltaU(0.8, 50, 1e-5, 4, 0.1, 2, 4)).toBeCloseTo(((0.8 * 50 * 1e-5 * 4) / 0.1) * 0.25, 12);
  });

  it('recessed fastener: α = 0.8·d₁/d₀ with d₁ = d₀ − recess', () => {
    expect(fastenerAlpha(0.1, 0.08)).toBeCloseTo(0.64, 12);
    const layers = [board(0.1, 0.035, 'Insulation'), board(0.2, 2.3, 'Concrete')];
    const full = calculateThermal(
      wall(layers, {
        bridges: [
          {
            kind: 'fastener',
            name: 'Screw',
            conductivity: 50,
            diameter: 0.006,
            countPerArea: 6,
            penetration: 'full',
            layerIndex: 0,
          },
        ],
      }),
    );
    const recessed = calculateThermal(
      wall(layers, {
        bridges: [
          {
            kind: 'fastener',
            name: 'Screw',
            conductivity: 50,
            diameter: 0.006,
            countPerArea: 6,
            penetration: 'recessed',
            recessDepth: 0.02,
            layerIndex: 0,
          },
        ],
      }),
    );
    expect(recessed.bridges[0]!.deltaU).toBeCloseTo(full.bridges[0]!.deltaU * 0.8, 12);
  });

  it('fasteners with λ_f < 1 W/(m·K) add nothing and the trace says why', () => {
    const r = calculateThermal(
      wall([board(0.1, 0.035)], {
        bridges: [
          {
            kind: 'fastener',
            name: 'Basalt tie',
            conductivity: 0.7,
            diameter: 0.006,
            countPerArea: 4,
            penetration: 'full',
            layerIndex: 0,
          },
        ],
      }),
    );
    expect(r.bridges[0]!.deltaU).toBe(0);
    expect(r.trace.find((s) => s.id === 'thermal.bridge.0.deltaU')?.note).toMatch(/λ_f < 1/);
  });

  it('shares of U_eff sum to 1 and U_eff = U₀ + ΣΔU', () => {
    const r = calculateThermal(metalPanelWall());
    const sumDeltaU = r.bridges.reduce((s, b) => s + b.deltaU, 0);
    expect(r.Ueff).toBeCloseTo(r.U0 + sumDeltaU, 12);
    expect(r.sharesSum).toBeCloseTo(1, 12);
    expect(r.clearFieldShare + r.bridges.reduce((s, b) => s + b.share, 0)).toBeCloseTo(1, 12);
    expect(r.Reff).toBeCloseTo(1 / r.Ueff, 12);
  });
});

describe('input errors carry the dotted field path', () => {
  const cases: [string, () => unknown, string][] = [
    [
      'zero thickness',
      () => calculateThermal(wall([board(0.1, 1), board(0.1, 1), board(0, 1)])),
      'layers.2.thickness',
    ],
    ['negative conductivity', () => calculateThermal(wall([board(0.1, -1)])), 'layers.0.conductivity'],
    ['NaN thickness', () => calculateThermal(wall([board(Number.NaN, 1)])), 'layers.0.thickness'],
    [
      'NaN declared resistance',
      () => calculateThermal(wall([{ kind: 'resistance', name: 'R', resistance: Number.NaN }])),
      'layers.0.resistance',
    ],
    [
      'a declared-R layer without its thickness in a wall with metal framing',
      () => {
        const input = metalPanelWall();
        input.layers[2] = { kind: 'resistance', name: 'Water-resistive barrier', resistance: 0.01 };
        return calculateThermal(input);
      },
      'layers.2.thickness',
    ],
    [
      'fractions that do not sum to 1',
      () =>
        calculateThermal(
          wall([
            board(0.1, 1),
            {
              ...woodStuds,
              sections: [
                { name: 'Batt', conductivity: 0.04, fraction: 0.8 },
                { name: 'Timber', conductivity: 0.13, fraction: 0.15 },
              ],
            },
          ]),
        ),
      'layers.1.sections',
    ],
    [
      'zero section conductivity',
      () =>
        calculateThermal(
          wall([
            {
              ...woodStuds,
              sections: [
                { name: 'Batt', conductivity: 0, fraction: 0.85 },
                { name: 'Timber', conductivity: 0.13, fraction: 0.15 },
              ],
            },
          ]),
        ),
      'layers.0.sections.0.conductivity',
    ],
    [
      'unknown material',
      () => calculateThermal(wall([{ ...board(0.1, 1), materialId: 'unobtainium' } as Layer])),
      'layers.0.materialId',
    ],
    [
      'air layer deeper than Table 8',
      () =>
        calculateThermal(
          wall([{ kind: 'air', name: 'Plenum', thickness: 0.5, ventilation: 'unventilated' }]),
        ),
      'layers.0.thickness',
    ],
    [
      'metal framing without a flange width',
      () => calculateThermal(wall([{ ...woodStuds, metal: true, spacing: 0.4 }])),
      'layers.0.flangeWidth',
    ],
    [
      'two metal-framed layers',
      () => {
        const studs = metalPanelWall().layers[6]!;
        return calculateThermal(wall([studs, studs]));
      },
      'layers.1.metal',
    ],
    [
      'zero linear spacing',
      () =>
        calculateThermal(
          wall([board(0.1, 1)], {
            bridges: [{ kind: 'linear', name: 'Girt', psi: siValue<'ψ W/(m·K)'>(0.05), spacing: 0 }],
          }),
        ),
      'bridges.0.spacing',
    ],
    [
      'negative point spacing',
      () =>
        calculateThermal(
          wall([board(0.1, 1)], {
            bridges: [
              {
                kind: 'point',
                name: 'Clip',
                chi: siValue<'W/K'>(0.02),
                spacingHorizontal: 0.4,
                spacingVertical: -1,
              },
            ],
          }),
        ),
      'bridges.0.spacingVertical',
    ],
    [
      'NaN χ',
      () =>
        calculateThermal(
          wall([board(0.1, 1)], {
            bridges: [{ kind: 'point', name: 'Clip', chi: siValue<'W/K'>(Number.NaN), countPerArea: 2 }],
          }),
        ),
      'bridges.0.chi',
    ],
    [
      'fastener touching metal at both ends',
      () =>
        calculateThermal(
          wall([board(0.1, 0.035)], {
            bridges: [
              {
                kind: 'fastener',
                name: 'Screw',
                conductivity: 50,
                diameter: 0.005,
                countPerArea: 4,
                penetration: 'full',
                layerIndex: 0,
                bothEndsMetal: true,
              },
            ],
          }),
        ),
      'bridges.0.bothEndsMetal',
    ],
    [
      'fastener crossing an air layer',
      () =>
        calculateThermal(
          wall([{ kind: 'air', name: 'Gap', thickness: 0.02, ventilation: 'unventilated' }], {
            bridges: [
              {
                kind: 'fastener',
                name: 'Screw',
                conductivity: 50,
                diameter: 0.005,
                countPerArea: 4,
                penetration: 'full',
                layerIndex: 0,
              },
            ],
          }),
        ),
      'bridges.0.layerIndex',
    ],
    [
      'recessed fastener without a recess depth',
      () =>
        calculateThermal(
          wall([board(0.1, 0.035)], {
            bridges: [
              {
                kind: 'fastener',
                name: 'Screw',
                conductivity: 50,
                diameter: 0.005,
                countPerArea: 4,
                penetration: 'recessed',
                layerIndex: 0,
              },
            ],
          }),
        ),
      'bridges.0.recessDepth',
    ],
  ];
  it.each(cases)('%s', (_label, fn, field) => {
    expect(inputError(fn).field).toBe(field);
  });

  it('the fastener refusal tells the user to enter a χ value instead', () => {
    const e = inputError(() =>
      calculateThermal(
        wall([board(0.1, 0.035)], {
          bridges: [
            {
              kind: 'fastener',
              name: 'Screw',
              conductivity: 50,
              diameter: 0.005,
              countPerArea: 4,
              penetration: 'full',
              layerIndex: 0,
              bothEndsMetal: true,
            },
          ],
        }),
      ),
    );
    expect(e.reason).toMatch(/χ value/);
  });
});

describe('bounds that keep every figure finite', () => {
  const allFinite = (x: unknown): boolean =>
    typeof x === 'number'
      ? Number.isFinite(x)
      : x !== null && typeof x === 'object'
        ? Object.values(x).every(allFinite)
        : true;
  const parses = (mutate: (w: ThermalInput) => unknown): boolean => {
    const w = metalPanelWall();
    mutate(w);
    return thermalInputSchema.safeParse(w).success;
  };
  const framedAt = (w: ThermalInput) => w.layers[6] as FramedLayer;

  it('the schema refuses absurdly small thickness, λ, fractions, spacings, flanges and diameters', () => {
    // Fuzz counterexample: a stud spacing of 5e-324 m made zone A's λ underflow to 0 and R₀ infinite.
    expect(parses((w) => Object.assign(framedAt(w), { spacing: 5e-324 }))).toBe(false);
    expect(parses((w) => Object.assign(framedAt(w), { spacing: MIN_SPACING }))).toBe(true);
    expect(parses((w) => Object.assign(w.layers[3]!, { thickness: 5e-324 }))).toBe(false);
    expect(parses((w) => Object.assign(w.layers[3]!, { conductivity: 1e-300 }))).toBe(false);
    expect(parses((w) => Object.assign(framedAt(w).sections[1]!, { conductivity: 8e-323 }))).toBe(false);
    expect(parses((w) => Object.assign(framedAt(w).sections[1]!, { fraction: 1e-300 }))).toBe(false);
    expect(parses((w) => Object.assign(framedAt(w), { flangeWidth: 1e-300 }))).toBe(false);
    expect(parses((w) => Object.assign(w.bridges[0]!, { spacingVertical: 2e-323 }))).toBe(false);
    expect(parses((w) => Object.assign(w.bridges[2]!, { diameter: 1e-300 }))).toBe(false);
  });

  it('every value at its bound still gives a finite result that matches the result schema', () => {
    const w = metalPanelWall();
    const framed = framedAt(w);
    framed.spacing = MIN_SPACING;
    framed.flangeWidth = MIN_FLANGE_WIDTH;
    framed.sections = [
      { name: 'Cavity', conductivity: MIN_CONDUCTIVITY, fraction: 1 - MIN_FRACTION },
      { name: 'Web', conductivity: 1000, fraction: MIN_FRACTION },
    ];
    w.layers[3] = { kind: 'homogeneous', name: 'Thin', thickness: MIN_THICKNESS, conductivity: 1000 };
    w.layers[4] = { kind: 'homogeneous', name: 'Thick', thickness: 2, conductivity: MIN_CONDUCTIVITY };
    w.bridges = [
      {
        kind: 'point',
        name: 'Clips',
        chi: siValue<'W/K'>(10),
        spacingHorizontal: MIN_SPACING,
        spacingVertical: MIN_SPACING,
      },
      { kind: 'linear', name: 'Girts', psi: siValue<'ψ W/(m·K)'>(10), spacing: MIN_SPACING },
      {
        kind: 'fastener',
        name: 'Screws',
        conductivity: 1000,
        diameter: MIN_FASTENER_DIAMETER,
        countPerArea: 10000,
        penetration: 'full',
        layerIndex: 3,
      },
    ];
    const r = calculateThermal(thermalInputSchema.parse(w));
    expect(allFinite(r)).toBe(true);
    expect(thermalResultSchema.safeParse(r).success).toBe(true);
  });

  it('refuses framed layers whose sections combine into more parallel paths than it follows', () => {
    const eight: FramedLayer = {
      kind: 'framed',
      name: 'Eight sections',
      thickness: 0.05,
      metal: false,
      sections: Array.from({ length: 8 }, (_, q) => ({
        name: `s${q}`,
        conductivity: 0.04 + q / 100,
        fraction: 0.125,
      })),
    };
    // 8⁴ = 4096 paths are followed; the fifth layer would make 32 768.
    expect(calculateThermal(wall([eight, eight, eight, eight])).methods.parallelPath).toBeGreaterThan(0);
    const e = inputError(() => calculateThermal(wall([eight, eight, eight, eight, eight])));
    expect(e.field).toBe('layers.4.sections');
    expect(e.reason).toContain(String(MAX_PARALLEL_PATHS));
  });
});

describe('result shape, units and trace', () => {
  it('the result satisfies the result schema', () => {
    expect(() => thermalResultSchema.parse(calculateThermal(metalPanelWall()))).not.toThrow();
  });

  it('the fixture satisfies the input schema', () => {
    expect(thermalInputSchema.safeParse(metalPanelWall()).success).toBe(true);
  });

  it('the input schema refuses a fraction above 1 and a negative thickness', () => {
    const bad = metalPanelWall();
    bad.layers[0] = board(-0.1, 50);
    expect(thermalInputSchema.safeParse(bad).success).toBe(false);
  });

  it('every number field of the schema states its unit', () => {
    const described = thermalInputSchema.shape.layers.element.options.flatMap((o) =>
      Object.values(o.shape).filter((f) => f.def.type === 'number'),
    );
    expect(described.length).toBeGreaterThan(3);
    for (const f of described) expect(f.description).toMatch(/,/);
  });

  it('IP figures are the SI figures divided by the NIST SP 811 factors', () => {
    const r = calculateThermal(metalPanelWall());
    expect(r.ip.R0 * R_IP_TO_SI).toBeCloseTo(r.R0, 12);
    expect(r.ip.Ueff * U_IP_TO_SI).toBeCloseTo(r.Ueff, 12);
  });

  it('every trace step is finite, sourced and uniquely identified', () => {
    const r = calculateThermal(metalPanelWall());
    const ids = new Set(r.trace.map((s) => s.id));
    expect(ids.size).toBe(r.trace.length);
    for (const s of r.trace) {
      expect(Number.isFinite(s.value)).toBe(true);
      expect(s.source.length).toBeGreaterThan(5);
      expect(s.formula.length).toBeGreaterThan(2);
    }
  });
});

describe('materials library', () => {
  it('loads about twenty rows, each naming its table (provenance: materials.source.md)', () => {
    expect(materials.length).toBeGreaterThanOrEqual(20);
    for (const m of materials)
      expect(m.source).toMatch(/ISO 10456:2007|ASHRAE Handbook—Fundamentals \(2021\)/);
  });

  it('finds a material by id', () => {
    expect(findMaterial('steel')?.conductivity).toBe(50);
    expect(findMaterial('nope')).toBeUndefined();
  });
});
