import { CalcInputError } from '@shared/calc/errors';
import { storedMessageText as said } from '@shared/format/messages';
import { PERM_0C_TO_SI } from '@shared/units';
import { describe, expect, it } from 'vitest';
import { layerSd } from './assembly';
import { coldClimateYear, metalPanelMoistureWall } from './examples';
import { DELTA_0 } from './glaser';
import { designInteriorPressure, HUMIDITY_CLASS_EXCESS, humidityClassExcess } from './interior';
import { calculateMoisture, MONTH_DAYS } from './monthly';
import { dewPoint } from './psychrometrics';
import {
  type MoistureInput,
  type MoistureLayer,
  type MonthClimate,
  moistureInputSchema,
  moistureResultSchema,
} from './schema';
import {
  minSurfaceTemperature,
  minTemperatureFactor,
  surfaceTemperature,
  temperatureFactor,
} from './surface';

const sameMonths = (exteriorTemperature: number, exteriorRelativeHumidity: number): MonthClimate[] =>
  Array.from({ length: 12 }, () => ({ exteriorTemperature, exteriorRelativeHumidity }));

/** Vapour-tight membrane over mineral wool and gypsum: condenses under the membrane in the cold. */
const membraneRoofWall = (months: MonthClimate[]): MoistureInput => ({
  heatFlow: 'horizontal',
  interior: { kind: 'humidityClass', temperature: 20, humidityClass: 4 },
  months,
  layers: [
    { kind: 'resistance', name: 'Membrane', resistance: 0.01, vapour: { kind: 'sd', sd: 1000 } },
    {
      kind: 'homogeneous',
      name: 'Mineral wool',
      thickness: 0.1,
      conductivity: 0.035,
      vapour: { kind: 'mu', mu: 1 },
    },
    {
      kind: 'homogeneous',
      name: 'Gypsum',
      thickness: 0.0125,
      conductivity: 0.25,
      vapour: { kind: 'mu', mu: 10 },
    },
  ],
});

const errorOf = (f: () => unknown): CalcInputError => {
  try {
    f();
  } catch (e) {
    if (e instanceof CalcInputError) return e;
    throw e;
  }
  throw new Error('expected a CalcInputError');
};

describe('calculateMoisture — demo metal-panel wall (invented climate)', () => {
  it('with the polyethylene retarder: no interstitial condensation, surface passes, result matches its schema', () => {
    const r = calculateMoisture(moistureInputSchema.parse(metalPanelMoistureWall()));
    expect(moistureResultSchema.safeParse(r).success).toBe(true);
    expect(r.interstitial.condensationOccurs).toBe(false);
    expect(r.startMonthRule).toBe('noCondensation');
    expect(r.surface.pass).toBe(true);
    expect(said(r.verdict)).toMatch(/^No interstitial condensation/);
    expect(r.layers[0]!.included).toBe(false);
    expect(r.layers[1]!.included).toBe(false);
    expect(r.Rse).toBe(r.Rsi);
    expect(r.warnings.map((w) => said(w)).join(' ')).toMatch(/well-ventilated/);
    expect(r.warnings.map((w) => said(w)).join(' ')).toMatch(/cavity between the members/);
    expect(r.warnings.find((w) => w.code === 'outside_ventilated_layer')).toEqual({
      code: 'outside_ventilated_layer',
      path: 'layers.1',
      values: { count: 2 },
    });
  });

  it('without it: the sheathing plane condenses from November, peaks in February and dries by April', () => {
    const r = calculateMoisture(metalPanelMoistureWall({ vapourRetarder: false }));
    expect(r.startMonthRule).toBe('firstCondensingMonth');
    expect(r.startMonth).toBe(11);
    expect(r.months.map((m) => m.month)).toEqual([11, 12, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(r.interstitial.planes.map((p) => p.label)).toEqual([
      'Water-resistive barrier | Mineral wool board',
    ]);
    expect(r.interstitial.maxAccumulationMonth).toBe(2);
    expect(r.interstitial.driesOut).toBe(true);
    expect(r.months.find((m) => m.month === 3)!.evaporationNodes).toEqual([1]);
    expect(said(r.verdict)).toMatch(/evaporates within the year/);
  });

  it('reports per month the node arrays, g in kg/(m²·s) and g·t in g/m² per month', () => {
    const r = calculateMoisture(metalPanelMoistureWall({ vapourRetarder: false }));
    const dec = r.months[1]!;
    expect(dec.month).toBe(12);
    expect(dec.seconds).toBe(31 * 86400);
    for (const a of [
      dec.temperature,
      dec.saturationPressure,
      dec.vapourPressure,
      dec.rate,
      dec.amount,
      dec.accumulation,
    ])
      expect(a).toHaveLength(r.nodes.length);
    expect(dec.amount[1]).toBeCloseTo(dec.rate[1]! * dec.seconds * 1000, 9);
    expect(dec.vapourPressure[1]).toBe(dec.saturationPressure[1]);
    expect(r.nodes[1]!.kind).toBe('interface');
    expect(r.nodes[0]!.kind).toBe('exteriorSurface');
    expect(r.nodes.at(-1)!.kind).toBe('interiorSurface');
    expect(r.nodes.some((n) => n.kind === 'withinLayer')).toBe(true);
  });

  it('honours a given start month', () => {
    const r = calculateMoisture({ ...metalPanelMoistureWall({ vapourRetarder: false }), startMonth: 7 });
    expect(r.startMonthRule).toBe('input');
    expect(r.months[0]!.month).toBe(7);
  });

  it('a slightly ventilated cavity is taken as unventilated and says so (stated simplification, the cautious side)', () => {
    const wall = metalPanelMoistureWall();
    const layers = wall.layers.map((l) =>
      l.kind === 'air' ? { ...l, ventilation: 'slightly' as const, ventArea: 1000 } : l,
    );
    const slight = calculateMoisture({ ...wall, layers });
    const closed = calculateMoisture({
      ...wall,
      layers: layers.map((l) =>
        l.kind === 'air' ? { ...l, ventilation: 'unventilated' as const, ventArea: undefined } : l,
      ),
    });
    expect(slight.layers[1]!.resistance).toBe(closed.layers[1]!.resistance);
    expect(
      slight.warnings.some((w) => /slightly ventilated air layer is taken as unventilated/.test(said(w))),
    ).toBe(true);
    expect(closed.warnings.some((w) => w.code === 'slightly_ventilated_unventilated')).toBe(false);
  });

  it('traces the steps with stable ids', () => {
    const r = calculateMoisture(metalPanelMoistureWall({ vapourRetarder: false }));
    const ids = r.trace.map((t) => t.id);
    for (const id of [
      'moisture.R_T',
      'moisture.sd_T',
      'moisture.fRsi',
      'moisture.startMonth',
      'moisture.maxAccumulation',
    ])
      expect(ids).toContain(id);
    expect(ids).toContain('moisture.month.2.Ma');
  });
});

describe('calculateMoisture — accumulation cases', () => {
  it('condensing every month: starts in January, never dries, and says it fails', () => {
    const r = calculateMoisture(membraneRoofWall(sameMonths(-5, 0.85)));
    expect(r.startMonthRule).toBe('condensationEveryMonth');
    expect(r.startMonth).toBe(1);
    expect(r.interstitial.driesOut).toBe(false);
    expect(r.interstitial.finalAccumulation).toBeGreaterThan(0);
    expect(r.interstitial.finalAccumulation).toBeCloseTo(r.interstitial.maxAccumulation, 12);
    expect(said(r.verdict)).toMatch(/builds up/);
    expect(r.warnings.map((w) => said(w)).join(' ')).toMatch(/every month/);
  });

  it('moves water between planes: one evaporates while another condenses (constructed sandwich, derived)', () => {
    const r = calculateMoisture({
      heatFlow: 'horizontal',
      interior: { kind: 'humidityClass', temperature: 20, humidityClass: 4 },
      months: coldClimateYear(),
      layers: [
        {
          kind: 'homogeneous',
          name: 'Metal skin',
          thickness: 0.0007,
          conductivity: 50,
          vapour: { kind: 'sd', sd: 50 },
        },
        {
          kind: 'homogeneous',
          name: 'PIR',
          thickness: 0.06,
          conductivity: 0.023,
          vapour: { kind: 'mu', mu: 60 },
        },
        {
          kind: 'homogeneous',
          name: 'Foil',
          thickness: 0.0001,
          conductivity: 0.2,
          vapour: { kind: 'sd', sd: 5 },
        },
        {
          kind: 'homogeneous',
          name: 'Mineral wool',
          thickness: 0.1,
          conductivity: 0.035,
          vapour: { kind: 'mu', mu: 1 },
        },
        {
          kind: 'homogeneous',
          name: 'Gypsum',
          thickness: 0.0125,
          conductivity: 0.25,
          vapour: { kind: 'mu', mu: 10 },
        },
      ],
    });
    expect(r.interstitial.planes.map((p) => p.label)).toEqual(['Metal skin | PIR', 'Foil | Mineral wool']);
    const both = r.months.filter((m) => m.condensationNodes.length > 0 && m.evaporationNodes.length > 0);
    expect(both.length).toBeGreaterThan(0);
    for (const m of both) expect(m.condensationNodes).not.toEqual(m.evaporationNodes);
    const i = r.interstitial;
    expect(i.totalCondensed - i.totalEvaporated).toBeCloseTo(i.finalAccumulation, 12);
  });

  it('caps a humidity-class vapour pressure above saturation and warns', () => {
    const r = calculateMoisture(membraneRoofWall(sameMonths(25, 0.9)));
    expect(r.months[0]!.interiorVapourPressure).toBeCloseTo(2336.95, 1);
    expect(r.warnings).toContainEqual({
      code: 'interior_capped',
      path: 'interior',
      values: { months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12] },
    });
    expect(said(r.warnings.find((w) => w.code === 'interior_capped'))).toMatch(
      /^January, February, .*capped/,
    );
  });
});

describe('interior conditions (ISO 13788:2012 Annex A [memory]; classes 1–4 also third-party)', () => {
  it('humidity class excess: full at θ_e ≤ 0 °C, linear to 0 at 20 °C', () => {
    expect(HUMIDITY_CLASS_EXCESS).toEqual([270, 540, 810, 1080, 1350]);
    expect(humidityClassExcess(3, -5)).toBe(810);
    expect(humidityClassExcess(3, 10)).toBe(405);
    expect(humidityClassExcess(5, 25)).toBe(0);
    expect(() => humidityClassExcess(6, 0)).toThrow(CalcInputError);
  });
  it('the factor applies to a positive Δp only (derived)', () => {
    expect(designInteriorPressure(300, 1000, 1.1)).toBeCloseTo(1070, 9);
    expect(designInteriorPressure(1200, 1000, 1.1)).toBe(1000);
  });
});

describe('vapour data → s_d', () => {
  it('μ·d, s_d as given, δ₀/W for SI permeance and for US perms (NIST SP 811 perm sizes)', () => {
    expect(layerSd({ kind: 'mu', mu: 50 }, 0.02, 'v')).toBeCloseTo(1, 12);
    expect(layerSd({ kind: 'sd', sd: 3 }, undefined, 'v')).toBe(3);
    expect(layerSd({ kind: 'permeance', permeance: 57.2135 }, undefined, 'v')).toBeCloseTo(3.4957, 4);
    expect(layerSd({ kind: 'usPerm', perm: 1, reference: '0C' }, undefined, 'v')).toBeCloseTo(
      DELTA_0 / PERM_0C_TO_SI,
      12,
    );
    expect(layerSd({ kind: 'usPerm', perm: 1, reference: '23C' }, undefined, 'v')).toBeCloseTo(3.4811, 4);
  });
  it('refuses μ on a layer without thickness, and μ or s_d of 0 or less', () => {
    expect(errorOf(() => layerSd({ kind: 'mu', mu: 10 }, undefined, 'layers.2.vapour')).field).toBe(
      'layers.2.vapour.mu',
    );
    expect(errorOf(() => layerSd({ kind: 'mu', mu: -1 }, 0.1, 'layers.1.vapour')).field).toBe(
      'layers.1.vapour.mu',
    );
    expect(errorOf(() => layerSd({ kind: 'sd', sd: 0 }, 0.1, 'layers.0.vapour')).field).toBe(
      'layers.0.vapour.sd',
    );
  });
});

describe('surface check helpers (ISO 13788:2012 §5)', () => {
  it('f_Rsi, θ_si, θ_si,min and f_Rsi,min (derived)', () => {
    expect(temperatureFactor(2.5)).toBeCloseTo(0.9, 12);
    expect(surfaceTemperature(0.9, 20, -10)).toBeCloseTo(17, 12);
    expect(minSurfaceTemperature(1000)).toBeCloseTo(dewPoint(1250), 12);
    expect(minTemperatureFactor(12, 20, -10)).toBeCloseTo(22 / 30, 12);
    expect(minTemperatureFactor(12, 20, 25)).toBeNull();
    // Cooling climate: outside 22 °C, inside 24 °C, θ_si,min 15 °C — the formula gives −3.5; not applicable.
    expect(minTemperatureFactor(15, 24, 22)).toBeNull();
    // Found by fuzzing: θ_i 0 °C and θ_e −5e−324 °C differ by less than a double can divide by.
    expect(minTemperatureFactor(-3, 0, -5e-324)).toBeNull();
  });

  it('a cooling climate says "not applicable" and never prints a negative f_Rsi,max', () => {
    const input = metalPanelMoistureWall({ vapourRetarder: false });
    const hot = {
      ...input,
      interior: { kind: 'fixed' as const, temperature: 24, relativeHumidity: 0.5 },
      // Outside 23–29 °C at 70 % RH: warmer than the coldest safe surface (about 16 °C) every month.
      months: input.months.map((m, i) => ({
        ...m,
        exteriorTemperature: 23 + (i % 3) * 3,
        exteriorRelativeHumidity: 0.7,
      })),
    };
    const r = calculateMoisture(hot);
    expect(r.surface.fRsiMax).toBeNull();
    for (const m of r.months) expect(m.surface.fRsiMin === null || m.surface.fRsiMin > 0).toBe(true);
    expect(said(r.verdict)).toContain('Surface humidity check not applicable');
    expect(said(r.verdict)).not.toMatch(/−|-\d/);
  });
});

describe('calculateMoisture — impossible input throws CalcInputError with the field path', () => {
  const base = (): MoistureInput => metalPanelMoistureWall({ vapourRetarder: false });
  const cases: [string, (i: MoistureInput) => MoistureInput, string][] = [
    ['11 months', (i) => ({ ...i, months: i.months.slice(0, 11) }), 'months'],
    [
      'exterior RH above 1',
      (i) => ({
        ...i,
        months: i.months.map((m, k) => (k === 3 ? { ...m, exteriorRelativeHumidity: 1.2 } : m)),
      }),
      'months.3.exteriorRelativeHumidity',
    ],
    [
      'negative μ',
      (i) => ({
        ...i,
        layers: i.layers.map((l, k) =>
          k === 3 ? ({ ...l, vapour: { kind: 'mu', mu: -5 } } as MoistureLayer) : l,
        ),
      }),
      'layers.3.vapour.mu',
    ],
    [
      'μ on a declared-resistance layer',
      (i) => ({
        ...i,
        layers: i.layers.map((l, k) =>
          k === 2 ? ({ ...l, vapour: { kind: 'mu', mu: 5 } } as MoistureLayer) : l,
        ),
      }),
      'layers.2.vapour.mu',
    ],
    [
      'interior RH that the 1.10 factor pushes above saturation',
      (i) => ({ ...i, interior: { kind: 'fixed', temperature: 20, relativeHumidity: 0.99 } }),
      'interior.relativeHumidity',
    ],
    ['safety factor below 1', (i) => ({ ...i, safetyFactor: 0.5 }), 'safetyFactor'],
    ['start month 13', (i) => ({ ...i, startMonth: 13 }), 'startMonth'],
    [
      'negative thickness',
      (i) => ({
        ...i,
        layers: i.layers.map((l, k) => (k === 3 ? { ...l, thickness: -0.1 } : l)) as MoistureLayer[],
      }),
      'layers.3.thickness',
    ],
    ['nothing inside the ventilated cavity', (i) => ({ ...i, layers: i.layers.slice(0, 2) }), 'layers.1'],
    [
      'a layer of R = 2000 m²·K/W (more sub-layers than the profile allows)',
      (i) => ({
        ...i,
        layers: i.layers.map((l, k) =>
          k === 3 ? { ...l, thickness: 2, conductivity: 0.001 } : l,
        ) as MoistureLayer[],
      }),
      'layers.3',
    ],
  ];
  it.each(cases)('%s → %s', (_label, mutate, field) => {
    expect(errorOf(() => calculateMoisture(mutate(base()))).field).toBe(field);
  });
});

describe('moistureInputSchema', () => {
  it('parses the demo input and keeps each layer’s vapour data', () => {
    const parsed = moistureInputSchema.parse(metalPanelMoistureWall());
    expect(parsed.layers[3]!.vapour).toEqual({ kind: 'mu', mu: 1 });
    expect(parsed.layers[3]!.kind).toBe('homogeneous');
  });
  it('rejects 11 months, a layer without vapour data and an unknown perm reference', () => {
    const input = metalPanelMoistureWall();
    expect(moistureInputSchema.safeParse({ ...input, months: coldClimateYear().slice(1) }).success).toBe(
      false,
    );
    const { vapour: _drop, ...bare } = input.layers[3]!;
    expect(moistureInputSchema.safeParse({ ...input, layers: [bare] }).success).toBe(false);
    const badPerm = { ...input.layers[2]!, vapour: { kind: 'usPerm', perm: 1, reference: '20C' } };
    expect(moistureInputSchema.safeParse({ ...input, layers: [badPerm] }).success).toBe(false);
  });
  it('refuses absurd λ, thickness and vapour data (μ below still air, s_d beyond 100 000 m)', () => {
    const input = metalPanelMoistureWall({ vapourRetarder: false });
    const withLayer3 = (patch: object) => ({
      ...input,
      layers: input.layers.map((l, k) => (k === 3 ? { ...l, ...patch } : l)),
    });
    const ok = (patch: object) => moistureInputSchema.safeParse(withLayer3(patch)).success;
    expect(ok({})).toBe(true);
    expect(ok({ conductivity: 1e-300 })).toBe(false);
    expect(ok({ thickness: 5e-324 })).toBe(false);
    expect(ok({ vapour: { kind: 'mu', mu: 0.5 } })).toBe(false);
    expect(ok({ vapour: { kind: 'mu', mu: 1 } })).toBe(true);
    expect(ok({ vapour: { kind: 'sd', sd: 1e-300 } })).toBe(false);
    expect(ok({ vapour: { kind: 'permeance', permeance: 0.001 } })).toBe(false);
    expect(ok({ vapour: { kind: 'permeance', permeance: 0.002 } })).toBe(true);
    expect(ok({ vapour: { kind: 'usPerm', perm: 1e-6, reference: '23C' } })).toBe(false);
    // The permeance bounds keep s_d = δ₀/W within the s_d bound of 100 000 m.
    expect(layerSd({ kind: 'permeance', permeance: 0.002 }, undefined, 'v')).toBeCloseTo(1e5, 6);
    expect(layerSd({ kind: 'usPerm', perm: 0.00004, reference: '0C' }, undefined, 'v')).toBeLessThan(1e5);
  });
  it('knows the month lengths of a 365-day year', () => {
    expect(MONTH_DAYS.reduce((a, b) => a + b, 0)).toBe(365);
  });
});
