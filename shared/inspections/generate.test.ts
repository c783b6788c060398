import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculateJointSchedule } from '../calc/joints/joints';
import { demoAssembly, demoProject } from '../checks/fixtures';
import { windDesignInputFor } from '../checks/inputs';
import { runWind } from '../checks/modules';
import { type ChecklistSource, generateChecklist, windZonesOf } from './generate';
import { generatedItemSchema, type InspectionScope } from './schema';

const scope = (over: Partial<InspectionScope> = {}): InspectionScope => ({
  assemblyId: '00000000-0000-4000-8000-000000000001',
  revision: 3,
  elevation: 'North elevation',
  area: { kind: 'zone', zone: 'field' },
  ...over,
});
const source = (over: Partial<ChecklistSource> = {}): ChecklistSource => ({
  assembly: { id: scope().assemblyId, revision: 3, input: demoAssembly() },
  project: demoProject(),
  scope: scope(),
  checkRun: { id: '11111111-2222-4333-8444-555555555555', sheetCode: 'ABCDEFGHIJ' },
  ...over,
});

describe('generateChecklist on the demo assembly (invented demo data; values from the engines)', () => {
  const items = generateChecklist(source());
  const kinds = new Set(items.map((i) => i.kind));

  it('covers every kind the issue lists and each item parses', () => {
    for (const k of [
      'girt_spacing',
      'clip_spacing',
      'clip_type',
      'fastener_type',
      'fasteners_per_clip',
      'insulation_type',
      'insulation_thickness',
      'joint_width',
      'sealant_depth',
      'backer_rod',
      'base_trim',
      'sill_flashing',
      'barrier_laps',
      'barrier_tape',
      'barrier_corners',
      'opening_head',
      'opening_jamb',
      'opening_sill',
      'panel_module',
      'joint_alignment',
    ] as const)
      expect(kinds, k).toContain(k);
    for (const i of items) expect(generatedItemSchema.parse(i)).toEqual(i);
  });

  it('cites revision, page, field, check run and sheet code on every generated item', () => {
    for (const i of items) {
      expect(i.source.revision).toBe(3);
      expect(i.source.checkRunId).toBe('11111111-2222-4333-8444-555555555555');
      expect(i.source.text).toContain('ABCDE-FGHIJ');
    }
  });

  it('takes the spacings and their limits from the wind design check, zone 4 for the field', () => {
    const built = windDesignInputFor(demoAssembly(), demoProject());
    if (built.status !== 'ready') throw new Error('demo wind input missing');
    const zone4 = runWind(built.input).design.zones.find((z) => z.zone === 4)!;
    const girt = items.find((i) => i.kind === 'girt_spacing')!;
    const clip = items.find((i) => i.kind === 'clip_spacing')!;
    expect(items.filter((i) => i.kind === 'girt_spacing')).toHaveLength(1);
    expect(girt.designValue).toBe(1.2); // attachment.girtSpacing of the demo
    expect(girt.tolerance!.max).toBe(Math.min(1.2, zone4.maxGirtSpacing!));
    expect(clip.designValue).toBe(0.8);
    expect(clip.tolerance!.max).toBe(zone4.maxClipAtDesignGirt);
  });

  it('takes the joint widths and rods from the joint schedule', () => {
    const schedule = calculateJointSchedule(demoAssembly().joints!);
    const widths = items.filter((i) => i.kind === 'joint_width');
    expect(widths).toHaveLength(schedule.joints.length);
    const vj = schedule.joints[0]!;
    const rod = items.find((i) => i.kind === 'backer_rod')!;
    if (vj.backer.kind === 'rod')
      expect(rod.tolerance).toMatchObject({ min: vj.backer.minDiameter, max: vj.backer.maxDiameter });
    expect(widths[0]!.tolerance!.max).toBeCloseTo(0.02 + 0.003, 12); // design width + construction tolerance
  });

  it('covers both wind zones over a range of grid lines, zone 5 for an edge or corner', () => {
    expect(windZonesOf(scope({ area: { kind: 'grid', from: 'A', to: 'D' } }))).toEqual([4, 5]);
    expect(windZonesOf(scope({ area: { kind: 'zone', zone: 'corner' } }))).toEqual([5]);
    const grid = generateChecklist(source({ scope: scope({ area: { kind: 'grid', from: 'A', to: 'D' } }) }));
    expect(grid.filter((i) => i.kind === 'girt_spacing')).toHaveLength(2);
  });

  it('adds the firm template items after the generated ones, citing the template version', () => {
    const withFirm = generateChecklist(
      source({ template: { version: 4, items: [{ group: 'firm', label: 'Site clean', designText: '' }] } }),
    );
    const last = withFirm.at(-1)!;
    expect(last).toMatchObject({ kind: 'firm', label: 'Site clean', quantity: null });
    expect(last.source.text).toContain('version 4');
  });

  it('still lists the attachment without project wind data (not proved, design values kept)', () => {
    const list = generateChecklist(source({ project: { ...demoProject(), wind: null }, checkRun: null }));
    const girt = list.find((i) => i.kind === 'girt_spacing')!;
    expect(girt.designText).toContain('not proved');
    expect(girt.tolerance!.max).toBe(1.2);
    expect(girt.source.checkRunId).toBeNull();
  });

  it('property: every generated item parses and every limit pair is ordered, whatever the spacings', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 2, noNaN: true }),
        fc.constantFrom<InspectionScope['area']>(
          { kind: 'zone', zone: 'field' },
          { kind: 'zone', zone: 'edge' },
          { kind: 'grid', from: '1', to: '4' },
        ),
        (girtSpacing, clipSpacing, area) => {
          const input = demoAssembly();
          input.attachment = { ...input.attachment, girtSpacing, clipSpacing };
          const list = generateChecklist(
            source({ assembly: { id: scope().assemblyId, revision: 1, input }, scope: scope({ area }) }),
          );
          for (const i of list) {
            generatedItemSchema.parse(i);
            if (i.tolerance?.min != null && i.tolerance.max != null)
              expect(i.tolerance.min).toBeLessThanOrEqual(i.tolerance.max);
          }
        },
      ),
      { numRuns: 30 },
    );
  });
});
