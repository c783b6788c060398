import { describe, expect, it } from 'vitest';
import { SWEEP_POINTS_MAX } from '../schemas/sweeps';
import { demoSweep } from './examples';
import { rankVariants } from './rank';
import { searchSweep } from './search';
import { compareSweeps, SUMMARY_TOP, summarizeSweep } from './summary';

const s = demoSweep();
const run = (rows = s.rows, costs = s.costs!) => {
  const r = searchSweep(s.assembly, s.project, rows, s.parameters, 1000);
  const ranking = rankVariants(r.plan, s.assembly, r.variants, costs);
  return summarizeSweep(r.count, r.parameters, r.variants, r.exploration, ranking);
};

describe('what a saved sweep keeps', () => {
  it('counts the verdicts, keeps the cheapest passing variants and one point per variant', () => {
    const summary = run();
    const { pass, fail, incomplete } = summary.verdicts;
    expect(pass + fail + incomplete).toBe(24);
    expect(summary.points).toHaveLength(24);
    expect(summary.ranking!.top.length).toBe(Math.min(pass, SUMMARY_TOP));
    const costs = summary.ranking!.top.map((v) => v.cost);
    expect(costs).toEqual([...costs].sort((a, b) => a - b));
    for (const p of summary.points) if (p.governing) expect(summary.labels[p.governing]).toBeTruthy();
    expect(SWEEP_POINTS_MAX).toBeGreaterThan(24);
  });

  it('compares two sweeps: the same parameters, a tighter table — what changed, in words', () => {
    const before = run();
    const tighter = run(s.rows.map((r) => (r.criterion === 'max_u_factor' ? { ...r, value: 0.3 } : r)));
    const head = {
      parameters: s.parameters,
      assemblyRevision: 3,
      criteriaSetName: 'Demo',
      criteriaSetVersion: 1,
    };
    const c = compareSweeps(
      { ...head, summary: before },
      { ...head, criteriaSetVersion: 2, summary: tighter },
    );
    expect(c.sameParameters).toBe(true);
    expect(c.changes[0]).toBe('code table Demo v1 → Demo v2');
    expect(tighter.verdicts.pass).toBeLessThanOrEqual(before.verdicts.pass);
    expect(c.verdictChanges.every((v) => v.from === 'pass' && v.to !== 'pass')).toBe(true);
    expect(c.verdictChanges).toHaveLength(before.verdicts.pass - tighter.verdicts.pass);
    expect(compareSweeps({ ...head, summary: before }, { ...head, summary: before }).changes).toEqual([
      'no difference in what was kept',
    ]);
  });
});
