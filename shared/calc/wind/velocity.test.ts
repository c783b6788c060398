import { FOOT } from '@shared/units';
import { describe, expect, it } from 'vitest';
import {
  aboveGradientHeight,
  EXPOSURE_CONSTANTS,
  groundElevationFactor,
  KZ_COEFFICIENT,
  KZ_FLOOR_HEIGHT,
  pressureDirectionality,
  Q_COEFFICIENT_SI,
  velocityPressure,
  velocityPressureExposureCoefficient,
} from './velocity';

const editions = ['ASCE 7-16', 'ASCE 7-22'] as const;
const exposures = ['B', 'C', 'D'] as const;

describe('velocity pressure exposure coefficient K_z', () => {
  it('is constant below 15 ft (the value at 15 ft)', () => {
    for (const e of editions)
      for (const x of exposures)
        expect(velocityPressureExposureCoefficient(e, x, 1)).toBe(
          velocityPressureExposureCoefficient(e, x, KZ_FLOOR_HEIGHT),
        );
  });

  it('reaches the leading coefficient at z_g and stays there (derived from note 1)', () => {
    for (const e of editions)
      for (const x of exposures) {
        const zg = EXPOSURE_CONSTANTS[e][x].zgFt * FOOT;
        expect(velocityPressureExposureCoefficient(e, x, zg)).toBeCloseTo(KZ_COEFFICIENT[e], 12);
        expect(velocityPressureExposureCoefficient(e, x, zg * 1.5)).toBeCloseTo(KZ_COEFFICIENT[e], 12);
        expect(aboveGradientHeight(e, x, zg * 1.01)).toBe(true);
        expect(aboveGradientHeight(e, x, zg * 0.99)).toBe(false);
      }
  });

  it('grows with height and with open terrain: B < C < D', () => {
    for (const e of editions) {
      let previous = 0;
      for (const z of [5, 10, 20, 40, 80, 150]) {
        const kb = velocityPressureExposureCoefficient(e, 'B', z);
        const kc = velocityPressureExposureCoefficient(e, 'C', z);
        const kd = velocityPressureExposureCoefficient(e, 'D', z);
        expect(kb).toBeLessThan(kc);
        expect(kc).toBeLessThan(kd);
        expect(kc).toBeGreaterThan(previous);
        previous = kc;
      }
    }
  });

  it('evaluates the power law in feet (derived: 7-16, C, 30 ft → 2.01·(30/900)^(2/9.5))', () => {
    expect(velocityPressureExposureCoefficient('ASCE 7-16', 'C', 30 * FOOT)).toBeCloseTo(
      2.01 * (30 / 900) ** (2 / 9.5),
      12,
    );
  });
});

describe('ground elevation factor K_e', () => {
  it('is 1 at and below sea level and falls with elevation', () => {
    expect(groundElevationFactor(0)).toBe(1);
    expect(groundElevationFactor(-100)).toBe(1);
    expect(groundElevationFactor(1000)).toBeLessThan(groundElevationFactor(500));
  });

  it('uses the elevation in feet (derived: 1000 ft → e^(−0.0362))', () => {
    expect(groundElevationFactor(1000 * FOOT)).toBeCloseTo(Math.exp(-0.0362), 12);
  });
});

describe('velocity pressure q', () => {
  it('converts 0.00256 psf/mph² to SI exactly — within 0.06 % of the standard’s rounded 0.613', () => {
    expect(Q_COEFFICIENT_SI).toBeCloseTo(0.61334, 5);
    expect(Math.abs(Q_COEFFICIENT_SI / 0.613 - 1)).toBeLessThan(6e-4);
  });

  it('holds K_d in q for 7-16 and leaves it to the pressure equation for 7-22', () => {
    const q16 = velocityPressure('ASCE 7-16', 1, 1, 0.85, 1, 50);
    const q22 = velocityPressure('ASCE 7-22', 1, 1, 0.85, 1, 50);
    expect(q16 / q22).toBeCloseTo(0.85, 12);
    expect(q22).toBeCloseTo(Q_COEFFICIENT_SI * 2500, 9);
    expect(pressureDirectionality('ASCE 7-16', 0.85)).toBe(1);
    expect(pressureDirectionality('ASCE 7-22', 0.85)).toBe(0.85);
  });

  it('is proportional to V², K_z, K_zt and K_e (derived)', () => {
    const base = velocityPressure('ASCE 7-16', 0.9, 1.1, 0.85, 0.97, 40);
    expect(velocityPressure('ASCE 7-16', 0.9, 1.1, 0.85, 0.97, 80)).toBeCloseTo(4 * base, 9);
    expect(velocityPressure('ASCE 7-16', 1.8, 1.1, 0.85, 0.97, 40)).toBeCloseTo(2 * base, 9);
    expect(velocityPressure('ASCE 7-16', 0.9, 2.2, 0.85, 0.97, 40)).toBeCloseTo(2 * base, 9);
  });
});
