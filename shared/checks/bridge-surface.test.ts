import { describe, expect, it } from 'vitest';
import { demoComputedGirt } from '../calc/bridge/examples';
import { calculateMoisture } from '../calc/moisture/monthly';
import { ENGINE_VERSION } from '../calc/trace';
import { storedMessageText as said } from '../format/messages';
import { demoAssembly, demoProject } from './fixtures';
import { moistureInputFor } from './inputs';
import { moistureModule } from './modules';

/*
 * The surface check at a solved bridge (ISO 13788:2012 §5 with an ISO 10211 solve): f_Rsi at the bridge,
 * with Rsi = 0.25 m²·K/W, against the year's f_Rsi,max — the same test as the clear field's (derived: the
 * expectations follow from f_Rsi,max of the same run, not from a published figure).
 */

/** The demo assembly with its girt's ψ computed (the demo girt detail's solve, stored on the bridge). */
function withComputedGirt() {
  const a = demoAssembly();
  const computed = demoComputedGirt(ENGINE_VERSION);
  a.thermal.bridges = a.thermal.bridges.map((b) =>
    b.kind === 'linear'
      ? { ...b, psi: computed.value as typeof b.psi, source: { text: 'computed', computed } }
      : b,
  );
  return { a, computed };
}

const ready = <T>(c: { status: string; input?: T }) => {
  expect(c.status).toBe('ready');
  return c.input as T;
};

describe('moisture surface check at the solved thermal bridges', () => {
  it('the check input carries f_Rsi of each computed bridge (the Rsi 0.25 solve), none for entered values', () => {
    const { a, computed } = withComputedGirt();
    const input = ready(moistureInputFor(a, demoProject()));
    expect(input.bridges).toEqual([{ name: 'Horizontal girts', fRsi: computed.surface.fRsi }]);
    // Rsi 0.25 instead of 0.13 inside: the surface is colder, f_Rsi lower (ISO 13788 asks the higher Rsi).
    expect(computed.surface.fRsi).toBeLessThan(computed.fRsi);
    expect(ready(moistureInputFor(demoAssembly(), demoProject())).bridges).toEqual([]);
  });

  it('a bridge below f_Rsi,max fails the surface check and the result says where; above it passes', () => {
    const input = ready(moistureInputFor(demoAssembly(), demoProject()));
    const clear = calculateMoisture(input);
    const fMax = clear.surface.fRsiMax;
    expect(fMax).not.toBeNull();
    const r = calculateMoisture({
      ...input,
      bridges: [
        { name: 'cold clip', fRsi: fMax! - 0.01 },
        { name: 'warm girt', fRsi: Math.min(1, fMax! + 0.01) },
      ],
    });
    expect(r.surface.bridges.map((b) => b.pass)).toEqual([false, true]);
    expect(r.surface.pass).toBe(false);
    expect(said(r.verdict)).toMatch(/Mould risk at cold clip/);
    expect(r.trace.find((s) => s.id === 'moisture.bridge.0.fRsi')?.value).toBeCloseTo(fMax! - 0.01, 12);
    // The clear field's own figures do not change.
    expect(r.surface.fRsi).toBe(clear.surface.fRsi);
    expect(r.surface.fRsiMax).toBe(fMax);
  });

  it('the checks page and the sheet get one check per solved bridge beside the clear field', () => {
    const { a, computed } = withComputedGirt();
    const built = moistureModule.build(a, demoProject());
    if (built.status !== 'ready') throw new Error('moisture input expected');
    const result = moistureModule.run(built.input);
    const checks = moistureModule.verdicts(result, a);
    const atGirt = checks.find((c) => c.id === 'moisture.surface.bridge.0')!;
    expect(atGirt.label).toMatch(/Horizontal girts/);
    expect(atGirt.provided).toBe(computed.surface.fRsi);
    expect(atGirt.status).toBe(computed.surface.fRsi >= result.surface.fRsiMax! ? 'pass' : 'fail');
    expect(said(checks.find((c) => c.id === 'moisture.surface')?.reason)).toMatch(
      /solved bridges are checked below/,
    );
  });
});
