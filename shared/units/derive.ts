import { create, createUnitDependencies, unitDependencies } from 'mathjs';
import { DEFS, type Quantity, type UnitDef } from './definitions';

/** Scale and origin of a shown unit: stored = (shown − origin) × scale. */
export interface Derivation {
  readonly scale: number;
  readonly origin: number;
}

/*
 * The registry's factors, derived from mathjs's unit system. mathjs's `BTU` is the International Table Btu,
 * 1055.055 852 62 J exactly (NIST SP 811 (2008) B.8 "British thermal unit_IT"), the Btu of ASHRAE's IP units;
 * °F intervals are written `degR` (1 °R = 1 °F = 5/9 K), so no Fahrenheit offset leaks into a compound unit.
 * What mathjs lacks is defined on this private instance (mathjs's shared default instance is left untouched):
 * the conventional inch of mercury, 13 595.1 kg/m³ × g_n (9.806 65 m/s²) × 1 in (NIST SP 811 B.8 "inch of
 * mercury, conventional"; mathjs's mmHg is rounded); the perm (0 °C), 1 grain/(h·ft²·inHg) (ASTM E96 §3); the
 * perm (23 °C), which has no closed definition, at the value NIST SP 811 B.8 tabulates, 5.745 25 × 10⁻¹¹
 * kg/(Pa·s·m²); and the spellings people type (Btu, psf, pcf, mph, perm) for the number boxes (`parse.ts`).
 */
export const unitMath = create({ unitDependencies, createUnitDependencies });
/** Value of one `from` in `to` (both mathjs unit expressions of the same dimension). */
const ratio = (from: string, to: string): number => unitMath.unit(1, from).toNumber(to);

const STANDARD_GRAVITY = 9.80665; // m/s², exact by definition (CGPM 1901; NIST SP 811 B.8)
const MERCURY_CONVENTIONAL_DENSITY = 13595.1; // kg/m³, the conventional mercury of mmHg/inHg (NIST SP 811 B.8)
unitMath.createUnit(
  'inHgConv',
  unitMath.unit(MERCURY_CONVENTIONAL_DENSITY * STANDARD_GRAVITY * ratio('in', 'm'), 'Pa'),
);
unitMath.createUnit('perm0C', unitMath.unit(1, 'grain / (h ft^2 inHgConv)'));
unitMath.createUnit('perm23C', unitMath.unit(5.74525e-11, 'kg / (Pa s m^2)'));
unitMath.createUnit({
  Btu: { definition: '1 BTU', aliases: ['btu'] },
  psf: '1 lbf/ft^2',
  pcf: '1 lb/ft^3',
  mph: '1 mi/h',
  perm: '1 perm23C',
});

/** Scale and origin of a shown unit against the stored one (a temperature's scale from its degree alone). */
function derivation(def: UnitDef, stored: string, storedInterval: string): Derivation {
  const scale = def.interval ? ratio(def.interval, storedInterval) : ratio(def.math, stored);
  const origin = unitMath.unit(0, stored).toNumber(def.math);
  return { scale, origin };
}

export interface Derived {
  icePointK: number;
  quantities: Record<Quantity, { SI: Derivation; IP: Derivation; also: Record<string, Derivation> }>;
}

/** Every quantity's factors as mathjs derives them now (what `derived.ts` must hold). */
export function deriveFactors(): Derived {
  const quantities = {} as Derived['quantities'];
  for (const [q, def] of Object.entries(DEFS) as [Quantity, (typeof DEFS)[Quantity]][]) {
    const storedInterval = def.SI.interval ?? def.stored;
    const of = (u: UnitDef) => derivation(u, def.stored, storedInterval);
    const also: Record<string, Derivation> = {};
    for (const [id, u] of Object.entries(('also' in def ? def.also : {}) as Record<string, UnitDef>))
      also[id] = of(u);
    quantities[q] = { SI: of(def.SI), IP: of(def.IP), also };
  }
  return { icePointK: unitMath.unit(0, 'degC').toNumber('K'), quantities };
}

/** The text of `derived.ts` (JSON numbers print the shortest text that reads back to the same double). */
export const derivedModuleText = (d: Derived = deriveFactors()): string =>
  `// Written by \`npm run units:derive\` from mathjs's unit system (shared/units/derive.ts) — do not edit by hand.
// shared/units/registry.test.ts fails when these differ from what mathjs derives.
import type { Derived } from './derive';

export const DERIVED: Derived = ${JSON.stringify(d, null, 2)};
`;
