import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ASSEMBLY_TEMPLATES } from '../assemblies/templates';
import { demoAssembly, demoProject } from '../checks/fixtures';
import { CHECK_MODULES, thermalModule } from '../checks/modules';
import { runModule } from '../checks/runner';
import type { AssemblyInput } from '../schemas/assembly';

/*
 * The property the bounded search (search.ts) relies on — derived from the thermal engine, not from a table:
 * adding insulation thickness to any homogeneous or framed layer never raises U_eff (so never lowers R_eff) and
 * never lowers the continuous or cavity insulation R, whichever method decides R₀ (ISO 6946, the lowest R, or
 * the energy-code path of a steel-framed wall, D-012).
 */

const walls: AssemblyInput[] = [demoAssembly(), ...ASSEMBLY_TEMPLATES.map((t) => t.input)];

/** The thermal metrics of `a` with layer `layer` at thickness `d`, or null when the engine refuses it. */
function metricsAt(a: AssemblyInput, layer: number, d: number) {
  const layers = a.thermal.layers.map((l, i) => (i === layer ? { ...l, thickness: d } : l));
  const run = runModule(thermalModule, { ...a, thermal: { ...a.thermal, layers } }, demoProject());
  if (run.outcome.status !== 'ran') return null;
  const value = (k: 'Ueff' | 'continuousInsulationR' | 'cavityInsulationR') => run.metrics.get(k)?.value;
  return { U: value('Ueff'), ci: value('continuousInsulationR'), cavity: value('cavityInsulationR') };
}

const caseArb = fc.constantFrom(...walls.keys()).chain((w) => {
  const a = walls[w]!;
  const thick = a.thermal.layers.flatMap((l, i) =>
    l.kind === 'homogeneous' || l.kind === 'framed' ? [i] : [],
  );
  return fc.record({
    wall: fc.constant(w),
    layer: fc.constantFrom(...thick),
    d1: fc.double({ min: 0.0005, max: 0.4, noNaN: true }),
    d2: fc.double({ min: 0.0005, max: 0.4, noNaN: true }),
  });
});

describe('more insulation never raises U (the property the bounded search relies on)', () => {
  it('U_eff(d₂) ≤ U_eff(d₁) and the insulation R metrics never fall, for d₂ ≥ d₁ on any thick layer of the demo wall and the templates', () => {
    expect(CHECK_MODULES[0]).toBe(thermalModule);
    fc.assert(
      fc.property(caseArb, ({ wall, layer, d1, d2 }) => {
        const [thin, thick] = d1 <= d2 ? [d1, d2] : [d2, d1];
        const a = metricsAt(walls[wall]!, layer, thin);
        const b = metricsAt(walls[wall]!, layer, thick);
        if (!a || !b) return;
        const tol = 1e-12;
        expect(b.U as number).toBeLessThanOrEqual((a.U as number) * (1 + tol));
        if (typeof a.ci === 'number' && typeof b.ci === 'number')
          expect(b.ci).toBeGreaterThanOrEqual(a.ci * (1 - tol));
        if (typeof a.cavity === 'number' && typeof b.cavity === 'number')
          expect(b.cavity).toBeGreaterThanOrEqual(a.cavity * (1 - tol));
      }),
      { numRuns: 300 },
    );
  });
});
