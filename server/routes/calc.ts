import { demoGirtModel } from '@shared/calc/bridge/examples';
import { bridgeModelSchema, bridgeResultSchema } from '@shared/calc/bridge/schema';
import { demoJointSchedule } from '@shared/calc/joints/examples';
import { calculateJointSchedule } from '@shared/calc/joints/joints';
import {
  jointResultSchema,
  jointScheduleInputSchema,
  jointScheduleResultSchema,
} from '@shared/calc/joints/schema';
import { metalPanelMoistureWall } from '@shared/calc/moisture/examples';
import { calculateMoisture } from '@shared/calc/moisture/monthly';
import { moistureInputSchema, moistureResultSchema } from '@shared/calc/moisture/schema';
import { takeoffToCsv } from '@shared/calc/takeoff/csv';
import { demoElevation } from '@shared/calc/takeoff/examples';
import { takeoffInputSchema, takeoffResultSchema } from '@shared/calc/takeoff/schema';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import { materialSchema, materials } from '@shared/calc/thermal/materials';
import { thermalInputSchema, thermalResultSchema } from '@shared/calc/thermal/schema';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { withoutTrace } from '@shared/calc/trace';
import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { checkDesignSpacing } from '@shared/calc/wind/design';
import { demoWindSchedule } from '@shared/calc/wind/examples';
import {
  designSpacingResultSchema,
  designSpacingsSchema,
  windScheduleInputSchema,
  windScheduleResultSchema,
} from '@shared/calc/wind/schema';
import { unitSystemSchema } from '@shared/schemas/common';
import { demoSweep } from '@shared/sweep/examples';
import { sweepRequestSchema, sweepResultSchema } from '@shared/sweep/schema';
import { z } from 'zod';
import { errorResponse } from '../http/responses';
import { FileAnswer, type WorkLimit } from '../http/route';
import { anyone, routeGroup } from '../http/route-group';

const calcErrors = {
  400: errorResponse('The request does not match the schema; `fields` names each field and the reason'),
  422: errorResponse('Physically impossible input; `fields` names the field and the reason'),
  429: errorResponse(
    'Too many calculations from this address in the last minute (`CALC_RATE_LIMIT`); `Retry-After` gives the seconds to wait',
  ),
};

/**
 * `?trace=true`: the answer keeps every trace step (label, formula, source, inputs, value); without it the
 * steps are left out and the answer is the results, their basis and warnings (D-029). Each documented answer
 * below therefore marks its `trace` members optional.
 */
const traceQuery = z.object({
  trace: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true')
    .describe('`true` adds the trace: every step with its formula, inputs and source'),
});
const traced = <T>(asked: { trace: boolean }, result: T): T => (asked.trace ? result : withoutTrace(result));

/** The length of a list in a body not validated yet (anything else counts 0). */
const lengthOf = (value: unknown) => (Array.isArray(value) ? value.length : 0);
const member = (value: unknown, key: string) =>
  value && typeof value === 'object' ? (value as Record<string, unknown>)[key] : undefined;

/**
 * Work limits of the public calculations beyond their schemas' own caps (DEVELOPERS.md "API conventions"
 * lists every cap), each far above a real project and holding one request to a few tens of milliseconds:
 * a schedule of 300 joints costs ≈ 30 ms, mostly validation (500, the schema's cap for the engine, ≈ 50 ms
 * and a 2.5 MB answer); 2000 openings in all walls ≈ 5 ms (the 40 000 the schemas allow, ≈ 16 000 within the
 * body limit, ≈ 50–100 ms).
 */
export const CALC_WORK_LIMITS = {
  joints: { field: 'joints', what: 'joints', max: 300, count: (body) => lengthOf(member(body, 'joints')) },
  openings: {
    field: 'walls',
    what: 'openings in all walls together',
    max: 2000,
    count: (body) => {
      const walls = member(body, 'walls');
      return Array.isArray(walls)
        ? walls.reduce((n: number, w) => n + lengthOf(member(w, 'openings')), 0)
        : 0;
    },
  },
} satisfies Record<string, WorkLimit>;

/** The documented 413 of a route with work limits. */
const overWork = (...limits: WorkLimit[]) => ({
  413: errorResponse(
    `Over a work limit (${limits.map((l) => `at most ${l.max} ${l.what}`).join('; ')}); \`fields\` names the field`,
  ),
});

const route = routeGroup('Calculations', calcErrors);

/** The public, stateless calculation API (versioned). */
export const calcRoutes = [
  route.post('/v1/calc/thermal', anyone, {
    summary:
      'Clear-field and effective R-value / U-factor of a wall with its clip, girt and fastener bridges',
    stateless: true,
    query: traceQuery,
    body: thermalInputSchema,
    example: metalPanelWall(),
    responses: {
      200: {
        description: 'Result; with `?trace=true` a trace of every figure',
        schema: thermalResultSchema.partial({ trace: true }),
      },
    },
    handler: async ({ body, query }) => traced(query, calculateThermal(body)),
  }),
  route.post('/v1/calc/moisture', anyone, {
    summary:
      'Interstitial condensation by month (ISO 13788 Glaser method) and the interior-surface (mould) check',
    stateless: true,
    query: traceQuery,
    body: moistureInputSchema,
    example: metalPanelMoistureWall({ vapourRetarder: false }),
    responses: {
      200: {
        description: 'Month-by-month profile, accumulation and verdict; with `?trace=true` a trace',
        schema: moistureResultSchema.partial({ trace: true }),
      },
    },
    handler: async ({ body, query }) => traced(query, calculateMoisture(body)),
  }),
  route.post('/v1/calc/wind', anyone, {
    summary:
      'Wall components-and-cladding pressures (ASCE 7-16 / 7-22) and the girt and clip spacing per zone',
    stateless: true,
    query: traceQuery,
    body: windScheduleInputSchema.extend({
      design: designSpacingsSchema
        .optional()
        .describe('Design girt and clip spacing to check per zone against the schedule (optional)'),
    }),
    example: { ...demoWindSchedule(), design: { girtSpacing: 1.2, clipSpacing: 0.6 } },
    responses: {
      200: {
        description:
          'Spacing schedule per zone; with `design`, the check of the design spacings per zone; with `?trace=true`, the traces',
        schema: windScheduleResultSchema
          .partial({ trace: true })
          .extend({ design: designSpacingResultSchema.partial({ trace: true }).nullable() }),
      },
    },
    handler: async ({ body, query }) => {
      const schedule = calculateWindSchedule(body);
      const { design } = body;
      return traced(query, {
        ...schedule,
        design: design ? checkDesignSpacing({ ...body, design }, schedule) : null,
      });
    },
  }),
  route.post('/v1/calc/joints', anyone, {
    summary: 'Sealant joint schedule: movement, required width and depth, backer, verdict',
    stateless: true,
    query: traceQuery,
    body: jointScheduleInputSchema,
    workLimits: [CALC_WORK_LIMITS.joints],
    example: { joints: demoJointSchedule() },
    responses: {
      200: {
        description: 'Joint schedule; with `?trace=true` a trace per joint',
        schema: jointScheduleResultSchema.extend({
          joints: z.array(jointResultSchema.partial({ trace: true })),
        }),
      },
      ...overWork(CALC_WORK_LIMITS.joints),
    },
    handler: async ({ body, query }) => traced(query, calculateJointSchedule(body.joints)),
  }),
  route.post('/v1/calc/takeoff', anyone, {
    summary: 'Material takeoff from a simple elevation (joints, sealant packages, tape, trim, fasteners)',
    stateless: true,
    query: traceQuery,
    body: takeoffInputSchema,
    workLimits: [CALC_WORK_LIMITS.openings],
    example: demoElevation(),
    responses: {
      200: {
        description: 'Quantities, each line with its formula; with `?trace=true` every step',
        schema: takeoffResultSchema.partial({ trace: true }),
      },
      ...overWork(CALC_WORK_LIMITS.openings),
    },
    handler: async ({ body, query }) => traced(query, calculateTakeoff(body)),
  }),
  route.post('/v1/calc/takeoff.csv', anyone, {
    summary: 'The same takeoff as a CSV download (`?units=IP`: ft, ft², US gal)',
    stateless: true,
    query: z.object({ units: unitSystemSchema.default('SI') }),
    body: takeoffInputSchema,
    workLimits: [CALC_WORK_LIMITS.openings],
    example: demoElevation(),
    responses: {
      200: { description: 'The takeoff lines as CSV', contentType: 'text/csv' },
      ...overWork(CALC_WORK_LIMITS.openings),
    },
    handler: async ({ body, query }) =>
      new FileAnswer(
        'text/csv; charset=utf-8',
        takeoffToCsv(calculateTakeoff(body), query.units),
        'takeoff.csv',
      ),
  }),
  route.post('/v1/calc/bridge', anyone, {
    summary:
      'Thermal bridge by 2-D/3-D steady conduction (ISO 10211): heat flow, ψ or χ, lowest inside surface temperature and f_Rsi',
    stateless: true,
    body: bridgeModelSchema,
    example: demoGirtModel(),
    responses: {
      200: {
        description:
          'Heat flows per environment, ψ/χ against the reference U values, solver figures (iterations, residual, energy balance)',
        schema: bridgeResultSchema,
      },
      413: errorResponse(
        'The grid would pass `BRIDGE_MAX_CELLS` cells; `fields.mesh` gives the cap and the count',
      ),
    },
    handler: async ({ body, services }) => services.bridge.solve(body),
  }),
  route.post('/v1/calc/sweep', anyone, {
    summary:
      'Sweep: every combination of one to three parameters of an assembly checked by every check module against a code table’s rows; with costs, the passing variants ranked',
    stateless: true,
    body: sweepRequestSchema,
    example: demoSweep(),
    responses: {
      200: {
        description:
          'Each variant’s values, verdict, governing check and the margin of every check; the ranking when costs are given',
        schema: sweepResultSchema,
      },
      413: errorResponse(
        'More variants than `SWEEP_MAX_VARIANTS`; `fields.parameters` gives the cap and the count',
      ),
    },
    handler: async ({ body, services }) => services.sweep.run(body),
  }),
  routeGroup('Calculations').get('/reference/materials', anyone, {
    summary: 'Generic material library (λ, ρ, μ) with the published table each value comes from',
    responses: {
      200: { description: 'Materials', schema: z.object({ materials: z.array(materialSchema) }) },
    },
    handler: async () => ({ materials }),
  }),
];
