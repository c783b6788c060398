/**
 * Takeoff arithmetic vs published definitions. Each check names its source and a tolerance. Tags: [seen]
 * read in the named source; [third-party] seen only in a public reproduction (named); [memory] recalled;
 * "derived" = computed here from exact definitions or plane geometry, which tests arithmetic, not a source.
 */

import {
  beadCrossSection,
  calculateTakeoff,
  PACKAGES,
  trimPieces,
  US_FLUID_OUNCE,
} from '@shared/calc/takeoff/takeoff';
import { INCH } from '@shared/units';
import { describe, expect, it } from 'vitest';

const CUBIC_INCH = INCH ** 3;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('NIST Handbook 44, Appendix C — the US fluid ounce behind the cartridge counts', () => {
  // Source: NIST Handbook 44, Appendix C "General Tables of Units of Measurement": 1 gallon (U.S.) = 231
  // cubic inches (exactly); 1 cup = 8 fluid ounces (exactly) = 1/2 liquid pint (exactly) [third-party: the
  // appendix as reproduced on yumpu.com]; 1 in = 2.54 cm exactly. With 8 pints to the gallon [memory] that is
  // 128 fl oz per gallon, 1 fl oz = 231/128 in³ = 1.8046875 in³. The exact metric value 29.573 529 562 5 ml is
  // tabulated in a master chart citing NIST Weights and Measures (angelfire.com/whittenwords) [third-party].
  it('1 US fl oz = 231/128 in³ = 1.8046875 in³ (exact)', () => {
    expect(US_FLUID_OUNCE / CUBIC_INCH).toBeCloseTo(1.8046875, 12);
  });
  it('1 US fl oz = 29.573 529 562 5 ml (relative 1e-12)', () => {
    expect(rel(US_FLUID_OUNCE * 1e6, 29.5735295625)).toBeLessThan(1e-12);
  });
  it('1 in³ = 16.387 064 ml (exact definition of the inch)', () => {
    expect(rel(CUBIC_INCH * 1e6, 16.387064)).toBeLessThan(1e-12);
  });
  // Derived from the definitions above: the package sizes the counts divide by.
  it('derived: a 10.1 fl oz cartridge holds 18.227 in³ = 298.69 ml; a 20 fl oz sausage 36.094 in³ = 591.47 ml', () => {
    expect(PACKAGES.cartridgeUsFlOz10_1 / CUBIC_INCH).toBeCloseTo(10.1 * 1.8046875, 10);
    expect(PACKAGES.cartridgeUsFlOz10_1 * 1e6).toBeCloseTo(298.6926486, 6);
    expect(PACKAGES.sausageUsFlOz20 / CUBIC_INCH).toBeCloseTo(36.09375, 10);
    expect(PACKAGES.sausageUsFlOz20 * 1e6).toBeCloseTo(591.47059125, 6);
  });
});

describe('Bead cross-sections — plane-geometry identities (derived)', () => {
  // Circle: the area of a regular n-gon inscribed in a circle of diameter d, (n/8)·d²·sin(2π/n), tends to
  // πd²/4; at n = 10⁶ the difference is below 1e-11 relative.
  it('round bead πd²/4 = limit of the inscribed polygon', () => {
    const d = 0.0127;
    const n = 1e6;
    const polygon = (n / 8) * d * d * Math.sin((2 * Math.PI) / n);
    expect(rel(beadCrossSection({ shape: 'round', diameter: d }), polygon)).toBeLessThan(1e-11);
  });
  // Right isosceles triangle with legs a on the two substrates: shoelace area of (0,0), (a,0), (0,a).
  it('triangular fillet leg²/2 = shoelace area of the right triangle', () => {
    const a = 0.009525;
    const shoelace = Math.abs(0 * 0 - a * 0 + (a * a - 0 * 0) + (0 * 0 - 0 * a)) / 2;
    expect(beadCrossSection({ shape: 'fillet', leg: a })).toBeCloseTo(shoelace, 18);
  });
  it('rectangular joint W·D', () => {
    expect(beadCrossSection({ shape: 'rectangular', width: 0.5 * INCH, depth: 0.25 * INCH })).toBeCloseTo(
      (0.125 * CUBIC_INCH) / INCH,
      18,
    );
  });
  // Classic yield arithmetic, derived: a ½ × ¼ in joint needs 0.125 in² × 12 in = 1.5 in³ per foot, so one
  // US gallon (231 in³) fills 154 ft and one 10.1 fl oz cartridge 12.15 ft.
  it('derived: ½ × ¼ in joint — 154 ft per US gallon, 12.15 ft per 10.1 fl oz cartridge', () => {
    const area = beadCrossSection({ shape: 'rectangular', width: 0.5 * INCH, depth: 0.25 * INCH });
    const perFoot = area * 12 * INCH;
    expect((231 * CUBIC_INCH) / perFoot).toBeCloseTo(154, 9);
    expect(PACKAGES.cartridgeUsFlOz10_1 / perFoot).toBeCloseTo(12.1512, 3);
  });
});

describe('Lapped trim pieces (derived)', () => {
  // n pieces of stock S lapped l cover n·S − (n − 1)·l: the count is the least n that reaches the run.
  it.each([
    [3.05, 3.05, 0.05, 1],
    [6.05, 3.05, 0.05, 2],
    [6.06, 3.05, 0.05, 3],
    [9.05, 3.05, 0.05, 3],
  ])('run %s m, stock %s m, lap %s m → %s pieces', (run, stock, lap, n) => {
    expect(trimPieces(run, stock, lap)).toBe(n);
    expect(n * stock - (n - 1) * lap).toBeGreaterThanOrEqual(run - 1e-12);
    expect((n - 1) * stock - Math.max(0, n - 2) * lap).toBeLessThan(run);
  });
});

describe('A small elevation worked by hand (derived)', () => {
  // 12 m × 6 m wall, 1 m vertical panels up to 4 m: 11 vertical joints × 6 m = 66 m; 2 tiers → one
  // horizontal joint 12 m; two 1.5 × 1.2 m windows → 2 × 2 × (1.5 + 1.2) = 10.8 m; ½ × ¼ in beads on the
  // 78 m of panel joints: 0.125 in² = 80.645 mm² exactly → 6290.31 ml.
  const r = calculateTakeoff({
    walls: [{ name: 'Hand check', length: 12, height: 6, openings: [{ width: 1.5, height: 1.2, count: 2 }] }],
    module: { width: 1, length: 4, orientation: 'vertical' },
    beads: {
      panel_vertical: { shape: 'rectangular', width: 0.5 * INCH, depth: 0.25 * INCH },
      panel_horizontal: { shape: 'rectangular', width: 0.5 * INCH, depth: 0.25 * INCH },
    },
    wasteFactor: 0,
    trims: [],
  });
  it('joint lengths', () => {
    expect(r.lengths.panel_vertical).toBe(66);
    expect(r.lengths.panel_horizontal).toBe(12);
    expect(r.lengths.opening).toBeCloseTo(10.8, 12);
  });
  it('sealant 6290.31 ml → 21 × 300 ml cartridges, 11 × 600 ml sausages', () => {
    expect(r.sealant.volume * 1e6).toBeCloseTo(6290.31, 6);
    expect(r.sealant.cartridges.ml300).toBe(21);
    expect(r.sealant.sausages.ml600).toBe(11);
  });
});
