import { describe, expect, expectTypeOf, it } from 'vitest';
import { type JointInput, type JointInputSI, jointInputSchema } from '../calc/joints/schema';
import type { MoistureInputSI } from '../calc/moisture/schema';
import { type ThermalInput, type ThermalInputSI, thermalInputSchema } from '../calc/thermal/schema';
import type { WindScheduleInputSI } from '../calc/wind/schema';
import type { AssemblyInput, AssemblyInputSI } from '../schemas/assembly';
import {
  type Celsius,
  type IP,
  ipValue,
  type Metre,
  type Pascal,
  type SI,
  type SquareMetreKelvinPerWatt,
  toIP,
  toSI,
  type WattPerMetreKelvin,
} from '.';

/*
 * The brands at the zod boundary (D-028): what the engines' schemas parse carries SI brands on its lengths,
 * λ, R, temperatures and pressures; an IP number or a bare number does not fit there. Most checks here are
 * types — `tsc --noEmit` fails on a `@ts-expect-error` line that stops being an error, and `expectTypeOf`
 * fails type-checking when a relation changes.
 */

type HomogeneousSI = Extract<ThermalInputSI['layers'][number], { kind: 'homogeneous' }>;
type ResistanceSI = Extract<ThermalInputSI['layers'][number], { kind: 'resistance' }>;
type MonthSI = MoistureInputSI['months'][number];
type RowSI = WindScheduleInputSI['panel']['loadSpanTable']['rows'][number];

describe('SI brands on the engines’ inputs', () => {
  it('parsed inputs are SI by type, quantity by quantity', () => {
    expectTypeOf<HomogeneousSI['thickness']>().toEqualTypeOf<Metre>();
    expectTypeOf<HomogeneousSI['conductivity']>().toEqualTypeOf<WattPerMetreKelvin>();
    expectTypeOf<ResistanceSI['resistance']>().toEqualTypeOf<SquareMetreKelvinPerWatt>();
    expectTypeOf<JointInputSI['designWidth']>().toEqualTypeOf<Metre>();
    expectTypeOf<JointInputSI['surfaceTemperatureRange']['min']>().toEqualTypeOf<Celsius>();
    expectTypeOf<MonthSI['exteriorTemperature']>().toEqualTypeOf<Celsius>();
    expectTypeOf<WindScheduleInputSI['site']['meanRoofHeight']>().toEqualTypeOf<Metre>();
    expectTypeOf<RowSI['allowableOutward']>().toEqualTypeOf<Pascal>();
    expectTypeOf<RowSI['span']>().toEqualTypeOf<Metre>();
    expectTypeOf<AssemblyInputSI['thermal']>().toEqualTypeOf<ThermalInputSI>();
  });

  it('an IP number or a bare number cannot stand where an SI brand is required', () => {
    expectTypeOf<number>().not.toExtend<Metre>();
    expectTypeOf<IP<'shortLength'>>().not.toExtend<HomogeneousSI['thickness']>();
    expectTypeOf<IP<'length'>>().not.toExtend<WindScheduleInputSI['site']['meanRoofHeight']>();
    expectTypeOf<IP<'conductivity'>>().not.toExtend<HomogeneousSI['conductivity']>();
    expectTypeOf<IP<'resistance'>>().not.toExtend<ResistanceSI['resistance']>();
    expectTypeOf<IP<'temperature'>>().not.toExtend<MonthSI['exteriorTemperature']>();
    expectTypeOf<IP<'pressure'>>().not.toExtend<RowSI['allowableInward']>();
    // One SI quantity is not another: a λ is not a length, an R is not a λ.
    expectTypeOf<WattPerMetreKelvin>().not.toExtend<Metre>();
    expectTypeOf<SquareMetreKelvinPerWatt>().not.toExtend<WattPerMetreKelvin>();

    const inches = ipValue('shortLength', 3.5);
    // @ts-expect-error an IP length is not a metre
    const a: Metre = inches;
    // @ts-expect-error a bare number is not a metre
    const b: JointInputSI['designWidth'] = 0.02;
    // @ts-expect-error a temperature in °F is not one in °C
    const c: Celsius = ipValue('temperature', 50);
    // @ts-expect-error toSI takes the IP value of its own quantity only (inches are not feet)
    const d = toSI('length', inches);
    // @ts-expect-error nor a bare number
    const e = toSI('pressure', 20);
    expect([a, b, c, d, e]).toHaveLength(5);
  });

  it('the one way from IP to an SI brand converts by the registry', () => {
    // NIST SP 811 (2008) B.9: 1 in = 0.0254 m, 1 ft = 0.3048 m (exact); t/°C = (t/°F − 32)/1.8.
    const width: Metre = toSI('shortLength', ipValue('shortLength', 0.75));
    expect(width).toBeCloseTo(0.01905, 12);
    const height: SI<'length'> = toSI('length', ipValue('length', 30));
    expect(height).toBeCloseTo(9.144, 12);
    const t: Celsius = toSI('temperature', ipValue('temperature', 50));
    expect(t).toBeCloseTo(10, 12);
    // NIST SP 811 B.9: 1 lbf/ft² = 47.880 26 Pa (to the digits printed).
    expect(toSI('pressure', ipValue('pressure', 20))).toBeCloseTo(957.6052, 3);
    expect(toIP('temperature', t)).toBeCloseTo(50, 12);
  });

  it('the engines keep plain numbers: a parsed input fits the engine type, and so does a literal', () => {
    expectTypeOf<ThermalInputSI>().toExtend<ThermalInput>();
    expectTypeOf<JointInputSI>().toExtend<JointInput>();
    expectTypeOf<AssemblyInputSI>().toExtend<AssemblyInput>();
    expectTypeOf<ThermalInput['layers'][number]>().not.toExtend<ThermalInputSI['layers'][number]>();
    const parsed = thermalInputSchema.parse({
      layers: [{ kind: 'homogeneous', name: 'Mineral wool', thickness: 0.1, conductivity: 0.035 }],
      heatFlow: 'horizontal',
      bridges: [],
    });
    const engine: ThermalInput = parsed;
    expect(engine.layers[0]).toMatchObject({ thickness: 0.1 });
    expect(jointInputSchema.shape.designWidth.parse(0.02)).toBe(0.02);
  });
});
