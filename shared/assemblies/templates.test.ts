import { describe, expect, it } from 'vitest';
import demoPanel from '../../data/seed/demo-panel-assembly.json' with { type: 'json' };
import { calculateJointSchedule } from '../calc/joints/joints';
import { calculateThermal } from '../calc/thermal/thermal';
import { assemblyInputSchema } from '../schemas/assembly';
import { ASSEMBLY_TEMPLATES, findTemplate } from './templates';

describe('assembly templates', () => {
  it.each(ASSEMBLY_TEMPLATES.map((t) => [t.title, t] as const))('%s parses and calculates', (_title, t) => {
    const input = assemblyInputSchema.parse(t.input);
    expect(input).toEqual(t.input);
    const result = calculateThermal(input.thermal);
    expect(Number.isFinite(result.Ueff)).toBe(true);
    expect(result.Ueff).toBeGreaterThan(0);
    // A starting joint schedule is sized for its own movement (ASTM C1472 approach, shared/calc/joints).
    for (const j of input.joints ? calculateJointSchedule(input.joints).joints : [])
      expect(j.verdict).toBe('pass');
  });

  it('has unique ids and titles', () => {
    expect(new Set(ASSEMBLY_TEMPLATES.map((t) => t.id)).size).toBe(ASSEMBLY_TEMPLATES.length);
    expect(new Set(ASSEMBLY_TEMPLATES.map((t) => t.title)).size).toBe(ASSEMBLY_TEMPLATES.length);
    expect(findTemplate('nope')).toBeUndefined();
  });

  it('insulated panel: U = 1/ΣR + Σχ·n + Σψ/s (ISO 6946:2017 §6.7 and Annex F, Rsi 0.13, Rse 0.04) — derived', () => {
    const t = findTemplate('insulated-panel')!;
    const R = 0.13 + 0.0005 / 50 + 0.1 / 0.023 + 0.0004 / 50 + 0.04;
    const dU = 0.004 / (0.333 * 1.8) + 0.02 / 1;
    expect(calculateThermal(t.input.thermal).Ueff).toBeCloseTo(1 / R + dU, 4);
  });

  it('the demo insulated panel wall (invented values) parses, calculates and its joints are wide enough — derived', () => {
    const input = assemblyInputSchema.parse(demoPanel.assembly);
    const R = 0.13 + 0.0005 / 50 + 0.1 / 0.023 + 0.0005 / 50 + 0.04;
    const dU = 0.004 / (0.333 * 1.8) + 0.015 / 1;
    expect(calculateThermal(input.thermal).Ueff).toBeCloseTo(1 / R + dU, 4);
    expect(calculateJointSchedule(input.joints!).joints.map((j) => j.verdict)).toEqual([
      'pass',
      'pass',
      'pass',
    ]);
  });
});
