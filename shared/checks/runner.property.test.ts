import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { storedMessageText as said } from '../format/messages';
import type { AssemblyInput } from '../schemas/assembly';
import { canonicalJson } from './canonical';
import {
  applicableRows,
  CRITERION_TYPE_KEYS,
  CRITERION_TYPES,
  type CriteriaRowInput,
  type CriterionType,
} from './criteria';
import { criteriaRow, demoAssembly, demoProject } from './fixtures';
import type { ProjectForChecks } from './inputs';
import { CHECK_MODULES } from './modules';
import { runChecks } from './runner';

const NUMERIC = CRITERION_TYPE_KEYS.filter((t) => CRITERION_TYPES[t].kind === 'number');

/** A criterion value inside the type's sane range (SI). */
const valueFor = (type: CriterionType): fc.Arbitrary<number | boolean> => {
  const spec = CRITERION_TYPES[type];
  if (spec.kind === 'boolean') return fc.boolean();
  return fc.double({ min: Math.max(spec.range.min, 1e-3), max: spec.range.max, noNaN: true });
};

/** The demo assembly with its continuous insulation between 10 and 200 mm, so the metrics move. */
const assemblyArb = fc.double({ min: 0.01, max: 0.2, noNaN: true }).map((d): AssemblyInput => {
  const a = demoAssembly();
  const layers = a.thermal.layers.map((l, i) =>
    i === 3 && l.kind === 'homogeneous' ? { ...l, thickness: d } : l,
  );
  return { ...a, thermal: { ...a.thermal, layers } };
});

const statusOf = (a: AssemblyInput, rows: CriteriaRowInput[]) =>
  runChecks(a, demoProject(), rows).checks.find((c) => c.source === 'criteria')!;

describe('runner properties', () => {
  it('tightening a criterion never turns a fail into a pass, and never raises its margin', () => {
    fc.assert(
      fc.property(
        assemblyArb,
        fc.constantFrom(...NUMERIC).chain((type) => fc.tuple(fc.constant(type), valueFor(type))),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        (assembly, [type, value], k) => {
          const v = value as number;
          const tighter = CRITERION_TYPES[type].direction === 'max' ? v * k : v / k;
          const loose = statusOf(assembly, [criteriaRow(type, v)]);
          const tight = statusOf(assembly, [criteriaRow(type, tighter)]);
          if (loose.status === 'fail') expect(tight.status).toBe('fail');
          if (tight.status === 'pass') expect(loose.status).toBe('pass');
          if (loose.margin !== null && tight.margin !== null)
            expect(tight.margin).toBeLessThanOrEqual(loose.margin + 1e-12 * Math.abs(loose.margin));
        },
      ),
      { numRuns: 60 },
    );
  });

  it('reports a criterion it cannot evaluate, and never passes the run while anything is unevaluated', () => {
    const rowArb = fc
      .record({
        type: fc.constantFrom(...CRITERION_TYPE_KEYS),
        zone: fc.constantFrom('5A', '*', '7'),
        category: fc.constantFrom('steel_framed', 'metal_building'),
      })
      .chain(({ type, zone, category }) =>
        valueFor(type).map((v) =>
          criteriaRow(
            type,
            v,
            zone as CriteriaRowInput['climateZone'],
            category as CriteriaRowInput['wallCategory'],
          ),
        ),
      );
    const drops = fc.record({
      climate: fc.boolean(),
      wind: fc.boolean(),
      vapour: fc.boolean(),
      windPanel: fc.boolean(),
      joints: fc.boolean(),
      girtSpacing: fc.boolean(),
    });
    fc.assert(
      fc.property(drops, fc.array(rowArb, { maxLength: 12 }), (drop, rawRows) => {
        const seen = new Set<string>();
        const rows = rawRows.filter((r) => {
          const key = `${r.climateZone}|${r.wallCategory}|${r.criterion}`;
          if (seen.has(key)) return false;
          seen.add(key);
          return true;
        });
        const a = demoAssembly();
        const assembly: AssemblyInput = {
          ...a,
          vapour: drop.vapour ? undefined : a.vapour,
          windPanel: drop.windPanel ? undefined : a.windPanel,
          joints: drop.joints ? [] : a.joints,
          attachment: {
            ...a.attachment,
            girtSpacing: drop.girtSpacing ? undefined : a.attachment.girtSpacing,
          },
        };
        const project: ProjectForChecks = {
          ...demoProject(),
          climate: drop.climate ? null : demoProject().climate,
          wind: drop.wind ? null : demoProject().wind,
        };
        const report = runChecks(assembly, project, rows);
        const applicable = applicableRows(rows, project.climateZone, assembly.wallCategory);
        const criteria = report.checks.filter((c) => c.source === 'criteria');
        // Every applicable row is reported exactly once; none is dropped silently.
        expect(criteria.map((c) => c.criterion)).toEqual(
          applicable.length > 0 ? applicable.map((r) => r.criterion) : ['rows'],
        );
        const ran = new Map(report.modules.map((m) => [m.id, m.status === 'ran']));
        for (const c of criteria) {
          if (c.status !== 'not_evaluated') expect(c.provided).not.toBeNull();
          else expect(said(c.reason).length).toBeGreaterThan(0);
          const module = CHECK_MODULES.find((m) =>
            m.provides.includes(CRITERION_TYPES[c.criterion as CriterionType]?.metric),
          );
          if (module && !ran.get(module.id)) expect(c.status).toBe('not_evaluated');
        }
        const anyUnevaluated = report.checks.some((c) => c.status === 'not_evaluated');
        if (anyUnevaluated || [...ran.values()].some((r) => !r)) expect(report.verdict).not.toBe('pass');
        if (report.checks.some((c) => c.status === 'fail')) expect(report.verdict).toBe('fail');
      }),
      { numRuns: 80 },
    );
  });

  it('is deterministic: the same inputs give the same report, byte for byte', () => {
    fc.assert(
      fc.property(
        assemblyArb,
        fc.array(
          fc.constantFrom(...CRITERION_TYPE_KEYS).chain((t) => valueFor(t).map((v) => criteriaRow(t, v))),
          { maxLength: 9 },
        ),
        (assembly, rows) => {
          const unique = [...new Map(rows.map((r) => [r.criterion, r])).values()];
          const copy = JSON.parse(JSON.stringify(assembly)) as AssemblyInput;
          expect(canonicalJson(runChecks(assembly, demoProject(), unique))).toBe(
            canonicalJson(runChecks(copy, demoProject(), unique)),
          );
        },
      ),
      { numRuns: 25 },
    );
  });
});
