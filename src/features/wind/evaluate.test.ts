import { describe, expect, it } from 'vitest';
import { evaluateAttachment } from './evaluate';
import { attachmentFormValues } from './form';
import { demoAssembly, demoProject } from './test-fixtures';

const noNaN = (value: unknown) => expect(JSON.stringify(value)).not.toMatch(/NaN/);

describe('the attachment sheet computed in the browser', () => {
  it('gives a schedule for both zones and checks the design spacing', () => {
    const a = demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 });
    const e = evaluateAttachment(attachmentFormValues(a), a, demoProject(), 'SI');
    expect(e.errors).toEqual({});
    expect(e.result?.zones.map((z) => z.zone)).toEqual([4, 5]);
    expect(e.zones.map((z) => z.status)).toEqual(['meets', 'meets']);
    // Every design check at or under the engine's maximum spacing is met.
    for (const z of e.zones) for (const c of z.checks) expect(c.utilisation).toBeLessThanOrEqual(1);
  });

  it('fails a design girt spacing beyond the maximum, with a utilisation over 1', () => {
    const a = demoAssembly({ girtSpacing: 2.4, clipSpacing: 0.6 });
    const e = evaluateAttachment(attachmentFormValues(a), a, demoProject(), 'SI');
    const zone4 = e.zones.find((z) => z.zone === 4)!;
    expect(2.4).toBeGreaterThan(e.result!.zones[0]!.girtSpacing!);
    expect(zone4.girt).toBe('fails');
    expect(zone4.worst!.utilisation!).toBeGreaterThan(1);
  });

  it('says "outside the table" for a design span beyond the longest tabulated span, without a number', () => {
    const a = demoAssembly({ girtSpacing: 3.5, clipSpacing: 0.6 });
    const e = evaluateAttachment(attachmentFormValues(a), a, demoProject(), 'SI');
    const inward = e.zones[0]!.checks.find((c) => c.check === 'inward')!;
    expect(inward.status).toBe('outside-table');
    expect(inward.utilisation).toBeNull();
    expect(inward.required).toBeNull();
  });

  it('puts the engine’s reason beside the field it names (spans not increasing)', () => {
    const a = demoAssembly();
    const values = attachmentFormValues(a);
    values.rows[2] = { ...values.rows[2]!, span: 1.1 };
    const e = evaluateAttachment(values, a, demoProject(), 'SI');
    expect(e.result).toBeNull();
    expect(e.errors['rows.2.span']).toMatch(/spans must increase/i);
    noNaN(e.errors);
  });

  it('asks for a number where a box is empty, and words range limits in the person’s units', () => {
    const a = demoAssembly();
    const values = attachmentFormValues(a);
    values.rows[0] = { ...values.rows[0]!, allowableInward: Number.NaN };
    values.panelModuleWidth = 5;
    values.fastenersPerClip = 2.5;
    const e = evaluateAttachment(values, a, demoProject(), 'IP');
    expect(e.errors['rows.0.allowableInward']).toBe('Enter a number.');
    expect(e.errors.panelModuleWidth).toMatch(/at most 118\.1\d*\u202fin/);
    expect(e.errors.fastenersPerClip).toBe('Enter a whole number.');
    noNaN(e.errors);
  });

  it('lists what the project lacks instead of guessing', () => {
    const a = { ...demoAssembly(), windPanel: undefined };
    const e = evaluateAttachment(attachmentFormValues(a), a, demoProject(false), 'SI');
    expect(e.result).toBeNull();
    expect(e.missing).toEqual(['the project’s wind data', 'the panel’s load–span table and clip capacity']);
  });

  it('does not call a panel that is entered but not yet valid "missing"', () => {
    const a = demoAssembly();
    const values = attachmentFormValues(a);
    values.allowableLoad = Number.NaN;
    values.clipKind = 'rating';
    const e = evaluateAttachment(values, a, demoProject(false), 'SI');
    expect(e.missing).toEqual(['the project’s wind data']);
    expect(e.errors.allowableLoad).toBe('Enter a number.');
  });
});
