import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { CalcInputError } from '../calc/errors';
import { demoJointSchedule } from '../calc/joints/examples';
import { calculateJointSchedule } from '../calc/joints/joints';
import { jointScheduleInputSchema, jointScheduleResultSchema } from '../calc/joints/schema';
import { metalPanelMoistureWall } from '../calc/moisture/examples';
import { calculateMoisture } from '../calc/moisture/monthly';
import { moistureInputSchema, moistureResultSchema } from '../calc/moisture/schema';
import { demoElevation } from '../calc/takeoff/examples';
import { takeoffInputSchema, takeoffResultSchema } from '../calc/takeoff/schema';
import { calculateTakeoff } from '../calc/takeoff/takeoff';
import { metalPanelWall } from '../calc/thermal/examples';
import { thermalInputSchema, thermalResultSchema } from '../calc/thermal/schema';
import { calculateThermal } from '../calc/thermal/thermal';
import { calculateWindSchedule } from '../calc/wind/attachment';
import { demoWindSchedule } from '../calc/wind/examples';
import { windScheduleInputSchema, windScheduleResultSchema } from '../calc/wind/schema';

/**
 * Fuzzing the pure calculations: every numeric leaf of a module's demo input may be replaced by an arbitrary
 * double (tiny, huge, negative, zero). Whatever survives the module's zod schema must either be refused
 * with a CalcInputError naming a field, or produce a result that matches the result schema with every
 * number finite. Nothing else may escape.
 */
const RUNS = Number(process.env.FUZZ_PURE_RUNS ?? 2000);
let cases = 0;

function numericPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (typeof value === 'number') return [prefix];
  if (Array.isArray(value)) return value.flatMap((v, i) => numericPaths(v, [...prefix, i]));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => numericPaths(v, [...prefix, k]));
  return [];
}
function setAt(value: unknown, path: (string | number)[], n: number): unknown {
  if (path.length === 0) return n;
  const [head, ...rest] = path;
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<
    string | number,
    unknown
  >;
  copy[head!] = setAt(copy[head!], rest, n);
  return copy;
}
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

const modules: [string, unknown, z.ZodType, (input: never) => unknown, z.ZodType][] = [
  ['thermal', metalPanelWall(), thermalInputSchema, calculateThermal as never, thermalResultSchema],
  [
    'moisture',
    metalPanelMoistureWall({ vapourRetarder: false }),
    moistureInputSchema,
    calculateMoisture as never,
    moistureResultSchema,
  ],
  [
    'wind',
    demoWindSchedule(),
    windScheduleInputSchema,
    calculateWindSchedule as never,
    windScheduleResultSchema,
  ],
  [
    'joints',
    { joints: demoJointSchedule() },
    jointScheduleInputSchema,
    ((i: { joints: never }) => calculateJointSchedule(i.joints)) as never,
    jointScheduleResultSchema,
  ],
  ['takeoff', demoElevation(), takeoffInputSchema, calculateTakeoff as never, takeoffResultSchema],
];

describe('pure calculations under fuzzed numbers', () => {
  afterAll(() => console.log(`fuzz: ${cases} pure calculation cases run`));
  it.each(modules)(
    '%s never lets anything but a CalcInputError or a finite result out',
    (_name, fixture, inputSchema, calculate, resultSchema) => {
      const paths = numericPaths(fixture);
      const mutation = fc.array(
        fc.tuple(
          fc.nat({ max: paths.length - 1 }),
          fc.oneof(
            fc.double({ noNaN: true, noDefaultInfinity: true }),
            fc.double({ min: -10, max: 10, noNaN: true }),
          ),
        ),
        { minLength: 1, maxLength: 3 },
      );
      fc.assert(
        fc.property(mutation, (changes) => {
          cases++;
          const mutated = changes.reduce<unknown>((acc, [i, n]) => setAt(acc, paths[i]!, n), fixture);
          const parsed = inputSchema.safeParse(mutated);
          if (!parsed.success) return;
          let result: unknown;
          try {
            result = calculate(parsed.data as never);
          } catch (err) {
            expect(err).toBeInstanceOf(CalcInputError);
            expect((err as CalcInputError).field.length).toBeGreaterThan(0);
            return;
          }
          expect(allFinite(result), 'every number in the result is finite').toBe(true);
          expect(resultSchema.safeParse(result).success).toBe(true);
        }),
        { numRuns: RUNS },
      );
    },
  );
});
