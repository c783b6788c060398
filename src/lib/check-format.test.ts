import { uFactorCheck as check } from '@shared/checks/fixtures';
import { describe, expect, it } from 'vitest';
import { checkResultText, formatSiValue } from './check-format';

describe('check results in words', () => {
  it('says how much a check meets or fails by, in the person’s units', () => {
    expect(checkResultText(check({}), 'SI')).toBe('meets — margin 12\u00a0%');
    expect(checkResultText(check({ status: 'fail', margin: -0.008, marginRatio: -0.008 / 0.3 }), 'SI')).toBe(
      'fails — short by 0.008\u202fW/(m²·K)',
    );
    expect(checkResultText(check({ status: 'fail', margin: -0.008 }), 'IP')).toBe(
      'fails — short by 0.001\u202fBtu/(h·ft²·°F)',
    );
    expect(
      checkResultText(
        check({ status: 'not_evaluated', reason: 'the project’s monthly climate is missing' }),
        'SI',
      ),
    ).toBe('not evaluated — the project’s monthly climate is missing');
  });

  it('formats each kind of value', () => {
    expect(formatSiValue(0.773, 'fraction', 'SI')).toBe('77.3\u202f%');
    expect(formatSiValue(180, 'L/x', 'IP')).toBe('L/180');
    expect(formatSiValue(0.0137, 'm', 'SI')).toBe('13.7\u202fmm');
    expect(formatSiValue(1.2, 'm', 'IP')).toBe('3.94\u202fft');
    expect(formatSiValue(true, '', 'SI')).toBe('yes');
    expect(formatSiValue(null, 'm', 'SI')).toBe('—');
  });
});
