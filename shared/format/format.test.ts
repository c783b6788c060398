import { describe, expect, it } from 'vitest';
import { uFactorCheck as check } from '../checks/fixtures';
import {
  checkFigures,
  checkResultText,
  engineMessage,
  engineMessageSchema,
  formatSiValue,
  messageText,
  missingText,
  quantityFormatter,
  sentence,
  storedMessageText,
} from './index';

describe('figures in the person’s units (screens and sheet alike)', () => {
  const si = quantityFormatter('SI');
  const ip = quantityFormatter('IP');

  it('prints wind pressures in kPa or psf, converted by the units registry', () => {
    // 1 psf = 47.880 26 Pa (NIST SP 811 B.8, pound-force per square foot) [memory].
    expect(si.pressure(1389.4)).toBe('1.389\u202fkPa');
    expect(ip.pressure(47.88026 * 29)).toBe('29\u202fpsf');
    expect(formatSiValue(-1389.4, 'Pa', 'SI')).toBe('\u22121.389\u202fkPa');
  });

  it('converts every unit a check or trace step carries, in both systems', () => {
    expect(formatSiValue(-19, '°C', 'IP')).toBe('\u22122.2\u202f°F');
    expect(formatSiValue(2300, 'N', 'SI')).toBe('2300\u202fN');
    // 1 lbf = 4.448 221 615 260 5 N exactly (NIST SP 811 B.8) — derived.
    expect(formatSiValue(2300, 'N', 'IP')).toBe('517.1\u202flbf');
    expect(formatSiValue(0.0137, 'm', 'SI')).toBe('13.7\u202fmm');
    expect(formatSiValue(0.0137, 'm', 'IP')).toBe('0.54\u202fin');
    expect(formatSiValue(0.773, 'fraction', 'IP')).toBe('77.3\u202f%');
    expect(formatSiValue(180, 'L/x', 'SI')).toBe('L/180');
    expect(formatSiValue(false, '', 'SI')).toBe('no');
    expect(formatSiValue(Number.NaN, 'm', 'SI')).toBe('—');
  });

  it('keeps three significant figures for a small R', () => {
    expect(si.rValue(0.0005)).toBe('0.0005\u202fm²·K/W');
    expect(ip.rValue(0.01)).toBe('0.0568\u202fh·ft²·°F/Btu');
    expect(si.rValue(3.333)).toBe('3.33\u202fm²·K/W');
  });
});

describe('pass and fail in words', () => {
  it('gives the required value with its direction, the provided value and the result', () => {
    expect(checkFigures(check({}), 'SI')).toEqual({
      required: '≤ 0.35\u202fW/(m²·K)',
      provided: '0.307\u202fW/(m²·K)',
      result: 'meets — margin 12\u00a0%',
      reason: '',
    });
    expect(
      checkResultText(check({ status: 'fail', margin: -0.0212, marginRatio: null, unit: 'm' }), 'SI'),
    ).toBe('fails — short by 21.2\u202fmm');
    // A yes/no row the table does not require prints "no", not "yes".
    expect(
      checkFigures(check({ direction: 'required', required: false, provided: true, unit: '' }), 'SI'),
    ).toMatchObject({ required: 'no', provided: 'yes' });
  });
});

describe('engine messages as data', () => {
  it('words each message once, and keeps where it is put right beside the words', () => {
    const vapour = engineMessage('vapour_missing', 'vapour.3', { layer: 3, name: 'Mineral wool board' });
    expect(messageText(vapour)).toBe('vapour data of layer 4 (Mineral wool board)');
    expect(engineMessageSchema.parse(JSON.parse(JSON.stringify(vapour)))).toEqual(vapour);
    const climate = engineMessage('climate_missing', 'project.climate', {});
    expect(missingText([climate])).toBe('the project’s monthly climate is missing');
    expect(missingText([vapour, climate])).toBe(
      'vapour data of layer 4 (Mineral wool board) and the project’s monthly climate are missing',
    );
  });

  it('reads the plain words a run stored before messages became data', () => {
    expect(storedMessageText('the joint schedule')).toBe('the joint schedule');
    expect(
      storedMessageText(
        engineMessage('calc_refused', 'layers.6.vapour.mu', { reason: 'got 0.5027093596059113' }),
      ),
    ).toBe('layers.6.vapour.mu: got 0.502709');
  });

  it('makes a sentence of a reason', () => {
    expect(sentence('must be at least 1 mm')).toBe('Must be at least 1 mm.');
    expect(sentence('Already one!')).toBe('Already one!');
  });
});
