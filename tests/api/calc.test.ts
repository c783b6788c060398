import { demoJointSchedule } from '@shared/calc/joints/examples';
import { calculateJointSchedule } from '@shared/calc/joints/joints';
import { metalPanelMoistureWall } from '@shared/calc/moisture/examples';
import { calculateMoisture } from '@shared/calc/moisture/monthly';
import { demoElevation } from '@shared/calc/takeoff/examples';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { metalPanelWall } from '@shared/calc/thermal/examples';
import { calculateThermal } from '@shared/calc/thermal/thermal';
import { withoutTrace } from '@shared/calc/trace';
import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { checkDesignSpacing } from '@shared/calc/wind/design';
import { demoWindSchedule } from '@shared/calc/wind/examples';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../setup/app';

/** The public calculation API is stateless: one database is enough here. */
describe('public calculation API', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp('pglite');
  });
  afterAll(async () => {
    await t?.close();
  });

  // D-029: the answer leaves the trace steps out unless `?trace=true` asks for them; with it, every step is
  // the engine's own, at every depth (per joint, the wind design check).
  it.each([
    ['thermal', metalPanelWall(), calculateThermal],
    ['moisture', metalPanelMoistureWall({ vapourRetarder: false }), calculateMoisture],
    [
      'wind',
      demoWindSchedule(),
      (b: ReturnType<typeof demoWindSchedule>) => ({ ...calculateWindSchedule(b), design: null }),
    ],
    [
      'joints',
      { joints: demoJointSchedule() },
      (b: { joints: ReturnType<typeof demoJointSchedule> }) => calculateJointSchedule(b.joints),
    ],
    ['takeoff', demoElevation(), calculateTakeoff],
  ] as const)(
    '%s: the trace only with ?trace=true, then the engine’s every step',
    async (name, body, engine) => {
      const expected = JSON.parse(JSON.stringify((engine as (b: unknown) => unknown)(body)));
      const lean = await t.anonymous().post(`/api/v1/calc/${name}`).send(body);
      const full = await t.anonymous().post(`/api/v1/calc/${name}?trace=true`).send(body);
      expect([lean.status, full.status]).toEqual([200, 200]);
      expect(full.body).toEqual(expected);
      expect(lean.body).toEqual(withoutTrace(expected));
      expect(JSON.stringify(lean.body)).not.toContain('"trace"');
      const off = await t.anonymous().post(`/api/v1/calc/${name}?trace=false`).send(body);
      expect(off.body).toEqual(lean.body);
    },
  );

  it('computes the monthly moisture balance and refuses 11 months with the field', async () => {
    const ok = await t
      .anonymous()
      .post('/api/v1/calc/moisture')
      .send(metalPanelMoistureWall({ vapourRetarder: false }));
    expect(ok.status).toBe(200);
    expect(ok.body.interstitial.condensationOccurs).toBe(true);
    const input = metalPanelMoistureWall();
    input.months = input.months.slice(0, 11);
    const bad = await t.anonymous().post('/api/v1/calc/moisture').send(input);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.months).toBeDefined();
  });

  it('computes the wind schedule per zone and refuses a negative speed with the field', async () => {
    const ok = await t.anonymous().post('/api/v1/calc/wind').send(demoWindSchedule());
    expect(ok.status).toBe(200);
    expect(ok.body.zones.map((z: { zone: string }) => z.zone)).toEqual(expect.arrayContaining([4, 5]));
    const bad = demoWindSchedule();
    bad.site.basicWindSpeed = -40;
    const res = await t.anonymous().post('/api/v1/calc/wind').send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['site.basicWindSpeed']).toBeDefined();
  });

  it('checks design spacings per zone when given, with the same verdict as the engine', async () => {
    const input = { ...demoWindSchedule(), design: { girtSpacing: 1.2, clipSpacing: 0.6 } };
    const res = await t.anonymous().post('/api/v1/calc/wind?trace=true').send(input);
    expect(res.status).toBe(200);
    expect(res.body.design).toEqual(JSON.parse(JSON.stringify(checkDesignSpacing(input))));
    expect(res.body.design.zones.map((z: { zone: number }) => z.zone)).toEqual([4, 5]);
    const none = await t.anonymous().post('/api/v1/calc/wind').send(demoWindSchedule());
    expect(none.body.design).toBeNull();
    const bad = await t
      .anonymous()
      .post('/api/v1/calc/wind')
      .send({ ...demoWindSchedule(), design: { girtSpacing: -1 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['design.girtSpacing']).toBeDefined();
  });

  it('sizes sealant joints and refuses a minimum temperature above the maximum with 4xx naming the field', async () => {
    const ok = await t.anonymous().post('/api/v1/calc/joints').send({ joints: demoJointSchedule() });
    expect(ok.status).toBe(200);
    expect(ok.body.joints[0].requiredWidth).toBeGreaterThan(0);
    const joints = demoJointSchedule();
    joints[0]!.surfaceTemperatureRange = { min: 60, max: -20 };
    const res = await t.anonymous().post('/api/v1/calc/joints').send({ joints });
    expect([400, 422]).toContain(res.status);
    expect(Object.keys(res.body.error.fields)[0]).toMatch(/^joints\.0\.surfaceTemperatureRange/);
  });

  it('returns the takeoff as JSON or as CSV', async () => {
    const json = await t.anonymous().post('/api/v1/calc/takeoff').send(demoElevation());
    expect(json.status).toBe(200);
    expect(json.body.lines.length).toBeGreaterThan(0);
    const csv = await t.anonymous().post('/api/v1/calc/takeoff.csv').send(demoElevation());
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text.split('\r\n').length).toBeGreaterThan(3);
  });

  it('never answers NaN or a 5xx for absurd numbers', async () => {
    for (const n of [1e308, -1e308, 0, -0]) {
      const input = demoWindSchedule();
      input.site.meanRoofHeight = n;
      const res = await t.anonymous().post('/api/v1/calc/wind').send(input);
      expect(res.status).toBeLessThan(500);
      expect(res.text).not.toMatch(/NaN|Infinity/);
    }
  });
});
