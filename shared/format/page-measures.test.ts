import { INCH } from '@shared/units';
import { describe, expect, it } from 'vitest';
import { inchFraction, parseInches } from './inches';
import {
  formatJointDimension,
  formatPageMeasure,
  formatPageRange,
  nextSixteenth,
  pageInputText,
  parsePageInput,
} from './page-measures';
import { formatterFor } from './quantities';

describe('inch fractions', () => {
  it('reads the ways the trade writes inches', () => {
    expect(parseInches('3/4')).toBe(0.75);
    expect(parseInches('1 1/4')).toBe(1.25);
    expect(parseInches('1-1/4')).toBe(1.25);
    expect(parseInches('1¼')).toBe(1.25);
    expect(parseInches('¾"')).toBe(0.75);
    expect(parseInches('.5 in')).toBe(0.5);
    expect(parseInches('13/16″')).toBe(13 / 16);
    expect(parseInches('1/0')).toBeNull();
    expect(parseInches('3/4/5')).toBeNull();
    expect(parseInches('abc')).toBeNull();
  });

  it('writes fractions, reduced, nearest or next up', () => {
    expect(inchFraction(0.75)).toBe('3/4');
    expect(inchFraction(1.25)).toBe('1 1/4');
    expect(inchFraction(2)).toBe('2');
    expect(inchFraction(0.682, 16, 'up')).toBe('11/16');
    expect(inchFraction(0.787)).toBe('13/16');
  });

  it('a joint box takes fractions in IP and stores metres; SI stays in mm', () => {
    const ip = parsePageInput('3/4', 'joint', 'IP');
    expect(ip.kind).toBe('ok');
    expect(ip.kind === 'ok' && ip.si).toBeCloseTo(0.75 * INCH, 12);
    expect(parsePageInput('3/4', 'joint', 'SI').kind).toBe('invalid');
    expect(parsePageInput('', 'joint', 'SI').kind).toBe('empty');
    const mm = parsePageInput('12.5', 'joint', 'SI');
    expect(mm.kind === 'ok' && mm.si).toBeCloseTo(0.0125, 12);
    expect(pageInputText(0.75 * INCH, 'joint', 'IP')).toBe('3/4');
    expect(pageInputText(0.02, 'joint', 'IP')).toBe('0.7874');
    expect(pageInputText(0.02, 'joint', 'SI')).toBe('20');
  });
});

describe('figures', () => {
  it('never prints NaN, and uses the typographic minus', () => {
    expect(formatPageMeasure(Number.NaN, 'joint', 'SI')).toBe('—');
    expect(formatPageMeasure(-25, 'temperature', 'SI')).toBe('\u221225\u202f°C');
    expect(formatPageMeasure(-25, 'temperature', 'IP')).toBe('\u221213\u202f°F');
    expect(formatPageRange(-25, 80, 'temperature', 'SI')).toBe('\u221225 to 80\u202f°C');
  });

  it('joint dimensions: the length formatter with inch fractions — mm; an exact fraction of an inch or decimals', () => {
    expect(formatJointDimension(0.02, 'SI')).toBe('20\u202fmm');
    expect(formatJointDimension(0.0125, 'SI')).toBe('12.5\u202fmm');
    expect(formatJointDimension(0.75 * INCH, 'IP')).toBe('3/4\u202fin');
    expect(formatJointDimension(1.25 * INCH, 'IP')).toBe('1 1/4\u202fin');
    expect(formatJointDimension(0.02, 'IP')).toBe('0.79\u202fin');
    // The same words as the sheet's length (one rule): fractions only where asked for.
    expect(formatterFor('IP').length(0.75 * INCH, { inchFractions: true })).toBe(
      formatJointDimension(0.75 * INCH, 'IP'),
    );
    expect(formatterFor('IP').length(0.75 * INCH)).toBe('0.75\u202fin');
    expect(formatterFor('SI').length(0.02, { inchFractions: true })).toBe(formatJointDimension(0.02, 'SI'));
    expect(nextSixteenth(0.0137, 'IP')).toBe('9/16\u202fin');
    expect(nextSixteenth(0.0137, 'SI')).toBeNull();
  });

  it('α per kelvin ⇄ per degree Fahrenheit', () => {
    expect(formatPageMeasure(23.76e-6, 'alpha', 'SI')).toBe('23.76 × 10⁻⁶/K');
    expect(formatPageMeasure(23.76e-6, 'alpha', 'IP')).toBe('13.2 × 10⁻⁶/°F');
  });
});
