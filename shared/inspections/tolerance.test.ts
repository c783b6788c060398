import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { answerProblem, checkMeasured } from './tolerance';

const spacing = { quantity: 'shortLength' as const, tolerance: { min: null, max: 1.2, basis: 'design' } };
const width = { quantity: 'shortLength' as const, tolerance: { min: 0.017, max: 0.023, basis: '±3 mm' } };

describe('checkMeasured', () => {
  it('judges below, within and above; a value equal to a limit meets it', () => {
    expect(checkMeasured(width, 0.016).status).toBe('below');
    expect(checkMeasured(width, 0.017).status).toBe('within');
    expect(checkMeasured(width, 0.023).status).toBe('within');
    expect(checkMeasured(width, 0.0231).status).toBe('above');
    expect(checkMeasured(spacing, 0.2).status).toBe('within');
    expect(checkMeasured(spacing, null).status).toBe('none');
    expect(checkMeasured({ tolerance: null }, 3).status).toBe('none');
  });

  it('a value typed in inches and converted back to m meets the limit it equals (47.244… in = 1.2 m)', () => {
    expect(checkMeasured(spacing, (1.2 / 0.0254) * 0.0254).status).toBe('within');
  });

  it('property: within exactly when min ≤ v ≤ max (away from the slack)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        (lo, span, v) => {
          const t = { tolerance: { min: lo, max: lo + span, basis: '' } };
          const s = checkMeasured(t, v).status;
          if (v < lo - 1e-6) expect(s).toBe('below');
          else if (v > lo + span + 1e-6) expect(s).toBe('above');
          else if (v >= lo && v <= lo + span) expect(s).toBe('within');
        },
      ),
    );
  });
});

describe('answerProblem', () => {
  it('refuses a pass whose measurement is outside, a value on a seen-only item and a fractional count', () => {
    expect(answerProblem(width, { state: 'pass', measured: 0.03 })?.field).toBe('state');
    expect(answerProblem(width, { state: 'fail', measured: 0.03 })).toBeUndefined();
    expect(answerProblem({ quantity: null, tolerance: null }, { state: 'pass', measured: 1 })?.field).toBe(
      'measured',
    );
    expect(
      answerProblem(
        { quantity: 'count', tolerance: { min: 2, max: null, basis: '' } },
        { state: 'pass', measured: 2.5 },
      )?.field,
    ).toBe('measured');
    expect(answerProblem(width, { state: 'pass', measured: null })).toBeUndefined();
  });
});
