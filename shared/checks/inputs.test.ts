import { describe, expect, it } from 'vitest';
import demo from '../../data/seed/demo-assembly.json' with { type: 'json' };
import { calculateJointSchedule } from '../calc/joints/joints';
import { calculateMoisture } from '../calc/moisture/monthly';
import { calculateTakeoff } from '../calc/takeoff/takeoff';
import { calculateThermal } from '../calc/thermal/thermal';
import { calculateWindSchedule } from '../calc/wind/attachment';
import { type EngineMessage, messageText } from '../format/messages';
import { assemblyInputSchema } from '../schemas/assembly';
import { projectClimateSchema, projectWindSchema } from '../schemas/project';
import {
  jointsInputFor,
  moistureInputFor,
  type ProjectForChecks,
  takeoffInputFor,
  thermalInputFor,
  windDesignInputFor,
  windInputFor,
} from './inputs';

const assembly = assemblyInputSchema.parse(demo.assembly);
const project: ProjectForChecks = {
  climateZone: '5A',
  elevationM: 185,
  buildingHeightM: 11.5,
  planLengthM: 96,
  planWidthM: 54,
  indoorTempC: 18,
  indoorRh: 0.45,
  winterDesignTempC: -19,
  summerDesignTempC: 31,
  wind: projectWindSchema.parse(demo.wind),
  climate: projectClimateSchema.parse(demo.climate),
};

describe('check inputs from an assembly and its project', () => {
  it('builds every module’s input from the demo assembly, and each module computes it', () => {
    const ready = <T>(c: { status: string; input?: T }) => {
      expect(c.status).toBe('ready');
      return c.input as T;
    };
    expect(calculateThermal(ready(thermalInputFor(assembly))).Ueff).toBeGreaterThan(0);
    expect(calculateMoisture(ready(moistureInputFor(assembly, project))).months).toHaveLength(12);
    expect(calculateWindSchedule(ready(windInputFor(assembly, project))).zones.length).toBeGreaterThan(0);
    expect(calculateJointSchedule(ready(jointsInputFor(assembly))).joints.length).toBeGreaterThan(0);
    expect(calculateTakeoff(ready(takeoffInputFor(assembly))).lines.length).toBeGreaterThan(0);
  });

  it('adds the assembly’s design spacings to the wind input, leaving out the ones not entered', () => {
    const ready = (c: ReturnType<typeof windDesignInputFor>) => {
      if (c.status !== 'ready') throw new Error('expected a ready input');
      return c.input;
    };
    const schedule = windInputFor(assembly, project);
    expect(ready(windDesignInputFor(assembly, project))).toEqual({
      ...(schedule.status === 'ready' ? schedule.input : {}),
      design: { girtSpacing: assembly.attachment.girtSpacing, clipSpacing: assembly.attachment.clipSpacing },
    });
    const noClip = { ...assembly, attachment: { ...assembly.attachment, clipSpacing: undefined } };
    expect(ready(windDesignInputFor(noClip, project)).design).toEqual({
      girtSpacing: assembly.attachment.girtSpacing,
    });
  });

  it('names what is missing instead of guessing', () => {
    const bare = { ...assembly, vapour: undefined, windPanel: undefined, joints: [], takeoff: undefined };
    const noData = { ...project, wind: null, climate: null };
    const words = (c: { status: string; missing?: EngineMessage[] }) =>
      (c.missing ?? []).map((m) => messageText(m));
    const moisture = moistureInputFor(bare, noData);
    expect(moisture.status).toBe('missing');
    expect(words(moisture)).toEqual([
      ...assembly.thermal.layers.map((l, i) => `vapour data of layer ${i + 1} (${l.name})`),
      'the project’s monthly climate',
    ]);
    // Where each is put right travels as data beside the words.
    expect(moisture.status === 'missing' && moisture.missing.map((m) => m.path)).toEqual([
      ...assembly.thermal.layers.map((_l, i) => `vapour.${i}`),
      'project.climate',
    ]);
    expect(words(windInputFor(bare, noData))).toEqual([
      'the project’s wind data',
      'the panel’s load–span table and clip capacity',
    ]);
    expect(windDesignInputFor(bare, noData)).toEqual(windInputFor(bare, noData));
    expect(words(jointsInputFor(bare))).toEqual(['the joint schedule']);
    expect(words(takeoffInputFor(bare))).toEqual(['the elevation for the takeoff']);
  });
});
