import { describe, expect, it } from 'vitest';
import { demoWall } from '../calc/bridge/examples';
import { detailDrawing, scaleFor } from './bridge-drawing';

describe('a computed bridge drawn to scale', () => {
  it('girt: every box of the model, steel as metal, wool as batt; the extent is the spacing × the wall (derived)', () => {
    const d = detailDrawing({ template: 'girt', input: demoWall.girt });
    expect(d.min).toEqual([0, 0]);
    expect(d.max[0]).toBeCloseTo(0.6, 12);
    expect(d.max[1]).toBeCloseTo(0.1012, 12);
    expect(d.boxes.filter((b) => b.name.startsWith('girt')).every((b) => b.cls === 'metal')).toBe(true);
    expect(d.boxes.find((b) => b.name === 'mineral wool')?.cls).toBe('batt');
    expect(d.yDown).toBe(true);
  });

  it('clip: the mid-plane cut keeps the clip plate, and the layers around it', () => {
    const d = detailDrawing({ template: 'clip', input: demoWall.clip });
    expect(d.boxes.some((b) => b.name === 'clip' && b.cls === 'metal')).toBe(true);
    expect(d.max[0]).toBeCloseTo(0.6, 12);
  });

  it('a slab edge is drawn with y up; scales are the wall section’s 1:1 … 1:50', () => {
    const layers = demoWall.clip.layers;
    const d = detailDrawing({
      template: 'edge',
      input: { kind: 'slab', layers, slab: { from: 2, thickness: 0.2, lambda: 2.3 } },
    });
    expect(d.yDown).toBe(false);
    expect(d.boxes.find((b) => b.name === 'floor slab')?.cls).toBe('masonry');
    expect(scaleFor(0.1, 60)).toBe(2);
    expect(scaleFor(2.2, 60)).toBe(50);
  });
});
