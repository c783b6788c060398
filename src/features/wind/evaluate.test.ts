import { calculateWindSchedule } from '@shared/calc/wind/attachment';
import { checkDesignSpacing } from '@shared/calc/wind/design';
import { messageText } from '@shared/format';
import { describe, expect, it } from 'vitest';
import { evaluateAttachment } from './evaluate';
import { attachmentFormValues } from './form';
import { demoAssembly, demoProject } from './test-fixtures';

const noNaN = (value: unknown) => expect(JSON.stringify(value)).not.toMatch(/NaN/);

describe('the attachment page computed in the browser', () => {
  it('gives the engine’s schedule and its check of the design spacing, with the design steps in the work', () => {
    const a = demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 });
    const e = evaluateAttachment(attachmentFormValues(a), a, demoProject(), 'SI');
    expect(e.errors).toEqual({});
    expect(e.result?.zones.map((z) => z.zone)).toEqual([4, 5]);
    // The figures of the design check are the shared engine's (shared/calc/wind/design.test.ts tests them).
    const input = { ...e.input!, design: { girtSpacing: 1.2, clipSpacing: 0.6 } };
    const checked = checkDesignSpacing(input, calculateWindSchedule(input));
    expect(e.zones).toEqual(checked.zones);
    expect(e.zones.map((z) => z.status)).toEqual(['meets', 'meets']);
    expect(e.result!.trace.slice(-checked.trace.length)).toEqual(checked.trace);
    noNaN(e.zones);
  });

  it('leaves out only the design check of a spacing that is not accepted', () => {
    const a = demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 });
    const values = { ...attachmentFormValues(a), clipSpacing: -1 };
    const e = evaluateAttachment(values, a, demoProject(), 'SI');
    expect(e.errors.clipSpacing).toMatch(/at least 50\u202fmm/);
    expect(e.result).not.toBeNull();
    expect(e.zones.map((z) => [z.girt, z.clip])).toEqual([
      ['meets', 'missing'],
      ['meets', 'missing'],
    ]);
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
    expect(e.missing.map((m) => messageText(m))).toEqual([
      'the project’s wind data',
      'the panel’s load–span table and clip capacity',
    ]);
    expect(e.missing.map((m) => m.code)).toEqual(['wind_missing', 'panel_missing']);
  });

  it('does not call a panel that is entered but not yet valid "missing"', () => {
    const a = demoAssembly();
    const values = attachmentFormValues(a);
    values.allowableLoad = Number.NaN;
    values.clipKind = 'rating';
    const e = evaluateAttachment(values, a, demoProject(false), 'SI');
    expect(e.missing.map((m) => messageText(m))).toEqual(['the project’s wind data']);
    expect(e.errors.allowableLoad).toBe('Enter a number.');
  });
});
