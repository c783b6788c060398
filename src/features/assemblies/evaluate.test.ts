import { describe, expect, it } from 'vitest';
import { evaluateThermal, toFormPath } from './evaluate';
import { startingInput } from './form';

describe('evaluateThermal', () => {
  it('words a range error in the person’s units and never as a rounded 0', () => {
    const thermal = startingInput('sample').thermal;
    const layer = thermal.layers[3];
    if (layer?.kind === 'homogeneous') layer.thickness = 0;
    const si = evaluateThermal(thermal, 'SI');
    expect(si.result).toBeNull();
    const message = si.errors['thermal.layers.3.thickness'] ?? '';
    expect(message).toMatch(/^Must be (at least|more than) /);
    expect(message).not.toMatch(/ 0\u202fmm\.$/);
    expect(evaluateThermal(thermal, 'IP').errors['thermal.layers.3.thickness']).toMatch(/in\.$/);
  });

  it('asks for a number where a box holds nothing readable', () => {
    const thermal = startingInput('sample').thermal;
    const clips = thermal.bridges[0];
    if (clips?.kind === 'point' && 'spacingHorizontal' in clips) clips.spacingHorizontal = Number.NaN;
    expect(evaluateThermal(thermal, 'SI').errors['thermal.bridges.0.spacingHorizontal']).toBe(
      'Enter a number.',
    );
  });

  it('maps server paths onto form paths', () => {
    expect(toFormPath('layers.2.sections')).toBe('thermal.layers.2.sections');
    expect(toFormPath('thermal.layers.2.sections')).toBe('thermal.layers.2.sections');
    expect(toFormPath('input.thermal.bridges.0.chi')).toBe('thermal.bridges.0.chi');
    expect(toFormPath('input.name')).toBe('name');
  });
});
