import { describe, expect, it } from 'vitest';
import { FOOT, LBF_TO_N, POINT_MM, PSF_TO_PA } from './index';

describe('force conversion', () => {
  it('1 lbf = 0.453 592 37 kg × 9.806 65 m/s² exactly (NIST SP 811 (2008) Appendix B.8/B.9)', () => {
    // Avoirdupois pound 0.453 592 37 kg and standard gravity g_n = 9.806 65 m/s², both exact by definition.
    expect(LBF_TO_N).toBeCloseTo(0.45359237 * 9.80665, 15);
    // NIST SP 811 Table B.8 prints it to seven figures: 4.448 222 E+00 N.
    expect(LBF_TO_N).toBeCloseTo(4.448222, 6);
  });

  it('agrees with the pressure factor: 1 lbf/ft² = LBF_TO_N / FOOT² (NIST SP 811 B.9 gives 47.880 26 Pa)', () => {
    expect(Math.abs(LBF_TO_N / (FOOT * FOOT) / PSF_TO_PA - 1)).toBeLessThan(1e-7);
  });
});

describe('type size', () => {
  it('1 point (computer) = 1/72 in = 3.527 778 E−04 m (NIST SP 811 (2008) Appendix B.8)', () => {
    expect(POINT_MM / 1000).toBeCloseTo(3.527778e-4, 10);
  });
});
