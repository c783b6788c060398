import { describe, expect, it } from 'vitest';
import { deriveFactors } from './derive';
import { DERIVED } from './derived';
import {
  CHI_IP_TO_SI,
  celsiusToFahrenheit,
  deltaFahrenheitToKelvin,
  FAHRENHEIT_DEGREE_K,
  FOOT,
  fahrenheitToCelsius,
  INCH,
  K_IP_TO_SI,
  LB_PER_FT2_TO_KG_PER_M2,
  LB_PER_FT3_TO_KG_PER_M3,
  LBF_TO_N,
  MPH_TO_MS,
  PERM_0C_TO_SI,
  PERM_23C_TO_SI,
  PSF_TO_PA,
  PSI_IP_TO_SI,
  QUANTITIES,
  type Quantity,
  R_IP_TO_SI,
  toShown,
  toStored,
  U_IP_TO_SI,
  US_GALLON,
  unitsOf,
} from './index';

/*
 * Every factor of the registry against NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units", Appendix B.8 (factors in alphabetical order) and B.9 (by kind of quantity) — the row named beside each
 * value. The tabulated values are seven significant figures (fewer where exact); a derived factor must agree with
 * every digit printed, i.e. to half a unit in the last place. Values recalled from memory are tagged [memory].
 */

/** `tabulated` as NIST prints it ("5.678 263 E+00"): the value and half a unit in its last printed digit. */
function nist(tabulated: string): { value: number; halfUnit: number } {
  const [mantissa = '', exponent = '0'] = tabulated.replace(/\s/g, '').replace('−', '-').split('E');
  const decimals = mantissa.split('.')[1]?.length ?? 0;
  return { value: Number(`${mantissa}e${exponent}`), halfUnit: 0.5 * 10 ** (Number(exponent) - decimals) };
}

function expectNist(derived: number, tabulated: string) {
  const { value, halfUnit } = nist(tabulated);
  expect(Math.abs(derived - value)).toBeLessThanOrEqual(halfUnit * (1 + 1e-9));
}

describe('registry factors against NIST SP 811 (2008) Appendix B', () => {
  const rows: [string, number, string][] = [
    // B.9 "Length": foot → metre, 3.048 E−01 exact; inch → metre, 2.54 E−02 exact [memory]
    ['foot → m (B.9 Length)', FOOT, '3.048 E−01'],
    ['inch → m (B.9 Length)', INCH, '2.54 E−02'],
    // B.9 "Area": square foot → square metre, 9.290 304 E−02 exact [memory]
    ['ft² → m² (B.9 Area)', QUANTITIES.area.IP.scale, '9.290 304 E−02'],
    // B.9 "Volume": gallon [U.S.] → cubic metre, 3.785 412 E−03 [memory]
    ['gallon (U.S.) → m³ (B.9 Volume)', US_GALLON, '3.785 412 E−03'],
    // B.9 "Thermal insulance": °F·h·ft²/Btu_IT → m²·K/W, 1.761 102 E−01 [memory]
    ['°F·h·ft²/Btu_IT → m²·K/W (B.9 Thermal insulance)', R_IP_TO_SI, '1.761 102 E−01'],
    // B.9 "Coefficient of heat transfer": Btu_IT/(h·ft²·°F) → W/(m²·K), 5.678 263 E+00 [memory]
    ['Btu_IT/(h·ft²·°F) → W/(m²·K) (B.9 Coefficient of heat transfer)', U_IP_TO_SI, '5.678 263 E+00'],
    // B.9 "Thermal conductivity": Btu_IT·in/(h·ft²·°F) → W/(m·K), 1.442 279 E−01 [memory]
    ['Btu_IT·in/(h·ft²·°F) → W/(m·K) (B.9 Thermal conductivity)', K_IP_TO_SI, '1.442 279 E−01'],
    // B.9 "Thermal conductivity": Btu_IT/(h·ft·°F) → W/(m·K), 1.730 735 E+00 [memory]
    ['Btu_IT/(h·ft·°F) → W/(m·K) (B.9 Thermal conductivity)', PSI_IP_TO_SI, '1.730 735 E+00'],
    // B.9 "Force": pound-force → newton, 4.448 222 E+00 [memory]
    ['lbf → N (B.9 Force)', LBF_TO_N, '4.448 222 E+00'],
    // B.9 "Force divided by length": pound-force per foot → N/m, 1.459 390 E+01 [memory]
    ['lbf/ft → N/m (B.9 Force divided by length)', QUANTITIES.forcePerLength.IP.scale, '1.459 390 E+01'],
    // B.9 "Pressure or stress": pound-force per square foot → pascal, 4.788 026 E+01 [memory]
    ['lbf/ft² → Pa (B.9 Pressure or stress)', PSF_TO_PA, '4.788 026 E+01'],
    // B.9 "Pressure or stress": pound-force per square inch (psi) → pascal, 6.894 757 E+03 [memory]
    [
      'psi → Pa (B.9 Pressure or stress)',
      QUANTITIES.pressure.also.psi?.scale ?? Number.NaN,
      '6.894 757 E+03',
    ],
    // B.9 "Mass divided by area": pound per square foot → kg/m², 4.882 428 E+00 [memory]
    ['lb/ft² → kg/m² (B.9 Mass divided by area)', LB_PER_FT2_TO_KG_PER_M2, '4.882 428 E+00'],
    // B.9 "Mass divided by area": ounce (avoirdupois) per square foot → kg/m², 3.051 517 E−01 [memory]
    [
      'oz/ft² → kg/m² (B.9 Mass divided by area)',
      QUANTITIES.massPerArea.also.ozPerFt2?.scale ?? Number.NaN,
      '3.051 517 E−01',
    ],
    // B.9 "Density": pound per cubic foot → kg/m³, 1.601 846 E+01 [memory]
    ['lb/ft³ → kg/m³ (B.9 Density)', LB_PER_FT3_TO_KG_PER_M3, '1.601 846 E+01'],
    // B.9 "Velocity (includes speed)": mile per hour → m/s, 4.4704 E−01 exact [memory]
    ['mi/h → m/s (B.9 Velocity)', MPH_TO_MS, '4.4704 E−01'],
    // B.9 "Permeance": perm (0 °C) → kg/(Pa·s·m²), 5.721 35 E−11 [memory]
    ['perm (0 °C) → kg/(Pa·s·m²) (B.9 Permeance)', PERM_0C_TO_SI, '5.721 35 E−11'],
    // B.9 "Permeance": perm (23 °C) → kg/(Pa·s·m²), 5.745 25 E−11 [memory]
    ['perm (23 °C) → kg/(Pa·s·m²) (B.9 Permeance)', PERM_23C_TO_SI, '5.745 25 E−11'],
    // B.9 "Temperature interval": degree Fahrenheit → kelvin, 5.555 556 E−01 [memory]
    ['°F interval → K (B.9 Temperature interval)', FAHRENHEIT_DEGREE_K, '5.555 556 E−01'],
  ];
  it.each(rows)('%s', (_name, derived, tabulated) => expectNist(derived, tabulated));

  it('exact definitions come out exact: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 mph = 0.447 04 m/s (NIST SP 811 B.9)', () => {
    expect(FOOT).toBe(0.3048);
    expect(INCH).toBe(0.0254);
    expect(MPH_TO_MS).toBe(0.44704);
    // 1 lbf = 0.453 592 37 kg × 9.806 65 m/s², both exact by definition (NIST SP 811 B.8 footnote) — derived
    expect(LBF_TO_N).toBeCloseTo(0.45359237 * 9.80665, 14);
    // 1 US gallon = 231 in³ exactly (NIST Handbook 44, Appendix C) [memory]
    expect(US_GALLON).toBeCloseTo(231 * INCH ** 3, 17);
  });

  it('Btu is the International Table Btu: 1 Btu_IT/h = 2.930 711 E−01 W (NIST SP 811 B.9 Power) [memory]', () => {
    // χ in IP is Btu_IT/(h·°F); NIST tabulates Btu_IT/h → W, and 1 °F interval = 5/9 K (B.9) — derived
    expectNist(CHI_IP_TO_SI * FAHRENHEIT_DEGREE_K, '2.930 711 E−01');
    // The thermochemical Btu (1.054 350 E+03 J, NIST SP 811 B.8) would give 0.292 875 W — far outside.
    expect(Math.abs(CHI_IP_TO_SI * FAHRENHEIT_DEGREE_K - 0.292875)).toBeGreaterThan(1e-4);
  });

  it('vent area: 1 in²/ft = 645.16 mm² / 0.3048 m — derived from the exact inch and foot', () => {
    expect(QUANTITIES.ventArea.IP.scale).toBeCloseTo(645.16 / 0.3048, 10);
  });

  it('α: 1/°F = 1.8/K (the reciprocal of the °F interval, NIST SP 811 B.9) — derived', () => {
    expect(QUANTITIES.expansion.IP.scale).toBeCloseTo(1.8, 14);
  });
});

describe('temperatures', () => {
  it('t/°C = (t/°F − 32)/1.8 (NIST SP 811 (2008) B.8, degree Fahrenheit) [memory]', () => {
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(50)).toBeCloseTo(10, 12);
  });

  it('a difference of 9 °F is 5 K (B.9 Temperature interval) [memory]', () => {
    expect(deltaFahrenheitToKelvin(9)).toBeCloseTo(5, 12);
    expect(toShown(5, 'temperatureDifference', 'IP')).toBeCloseTo(9, 12);
  });
});

describe('the registry', () => {
  const quantities = Object.keys(QUANTITIES) as Quantity[];

  it('holds every quantity the product shows, each with SI and IP symbols and precision', () => {
    for (const q of [
      'resistance',
      'transmittance',
      'conductivity',
      'length',
      'shortLength',
      'area',
      'pressure',
      'temperature',
      'temperatureDifference',
      'vapourPermeance',
      'psi',
      'chi',
      'force',
      'forcePerLength',
      'massPerArea',
      'speed',
      'density',
      'volume',
    ] as const) {
      const spec = QUANTITIES[q];
      expect(spec.si, q).not.toBe('');
      for (const s of ['SI', 'IP'] as const) {
        expect(spec[s].symbol, `${q} ${s}`).not.toBe('');
        expect(Number.isInteger(spec[s].decimals), `${q} ${s}`).toBe(true);
        expect(spec[s].scale, `${q} ${s}`).toBeGreaterThan(0);
      }
    }
  });

  it('converts there and back to the same value (every quantity, both systems)', () => {
    for (const q of quantities) {
      for (const s of ['SI', 'IP'] as const) {
        for (const v of [-12.5, 0, 0.037, 1, 250]) {
          expect(toStored(toShown(v, q, s), q, s), `${q} ${s} ${v}`).toBeCloseTo(v, 9);
        }
      }
    }
  });

  it('hands a display table its symbols and factors, with a further SI unit where asked', () => {
    expect(unitsOf('pressure', 'kPa')).toEqual({
      unit: { SI: 'kPa', IP: 'psf' },
      factor: { SI: 1000, IP: PSF_TO_PA },
    });
    expect(unitsOf('shortLength')).toEqual({ unit: { SI: 'mm', IP: 'in' }, factor: { SI: 0.001, IP: INCH } });
  });

  it('the SI shown unit of a quantity stored in SI is 1 or a power of ten of it', () => {
    for (const q of quantities) {
      const scale = QUANTITIES[q].SI.scale;
      const power = Math.log10(scale);
      expect(Math.abs(power - Math.round(power)), q).toBeLessThan(1e-9);
    }
  });
});

describe('derived.ts holds what mathjs derives', () => {
  it('every stored factor and origin equals mathjs’s derivation now, to the last bit (else run npm run units:derive)', () => {
    expect(DERIVED).toEqual(deriveFactors());
  });
});
