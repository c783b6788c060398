import type { SavedSweep, SweepComparison, SweepSummary } from '../schemas/sweeps';
import { SWEEP_POINTS_MAX } from '../schemas/sweeps';
import type { SweepExploration, SweepRanking, SweepVariantResult } from './schema';

/*
 * What a saved sweep keeps of its results — counts, what was explored, the cheapest passing variants and the
 * points of its chart — and how two saved sweeps of one assembly compare. Pure.
 */

/** Cheapest passing variants a summary keeps. */
export const SUMMARY_TOP = 10;

/** The summary of a sweep's results (the variants in enumeration order; points thinned evenly). */
export function summarizeSweep(
  count: number,
  parameters: SweepSummary['parameters'],
  variants: readonly SweepVariantResult[],
  exploration: SweepExploration,
  ranking: SweepRanking | null,
): SweepSummary {
  const verdicts = { pass: 0, fail: 0, incomplete: 0 };
  const labels: Record<string, string> = {};
  for (const v of variants) {
    verdicts[v.verdict]++;
    if (v.governing) labels[v.governing.id] = v.governing.label;
  }
  const stride = Math.max(1, Math.ceil(variants.length / SWEEP_POINTS_MAX));
  const points = variants
    .filter((_, i) => i % stride === 0)
    .map((v) => ({
      values: v.values,
      verdict: v.verdict,
      governing: v.governing?.id ?? null,
      marginRatio: v.governing?.marginRatio ?? null,
    }));
  return {
    count,
    parameters,
    verdicts,
    exploration,
    ranking: ranking && {
      top: ranking.ranked.slice(0, SUMMARY_TOP),
      runnerUp: ranking.runnerUp,
      notPassing: ranking.notPassing,
    },
    labels,
    points,
  };
}

type Compared = Pick<
  SavedSweep,
  'parameters' | 'assemblyRevision' | 'criteriaSetVersion' | 'criteriaSetName'
> & {
  summary: SweepSummary;
};

const fmt = (x: number) => Number(x.toPrecision(4));

/** What differs between two saved sweeps of one assembly, in words, and the verdicts that changed. */
export function compareSweeps(from: Compared, to: Compared): Omit<SweepComparison, 'from' | 'to'> {
  const changes: string[] = [];
  if (from.assemblyRevision !== to.assemblyRevision)
    changes.push(`assembly revision ${from.assemblyRevision} → ${to.assemblyRevision}`);
  if (from.criteriaSetName !== to.criteriaSetName || from.criteriaSetVersion !== to.criteriaSetVersion)
    changes.push(
      `code table ${from.criteriaSetName} v${from.criteriaSetVersion} → ${to.criteriaSetName} v${to.criteriaSetVersion}`,
    );
  const sameParameters = JSON.stringify(from.summary.parameters) === JSON.stringify(to.summary.parameters);
  if (!sameParameters) changes.push('the parameters or their values differ');
  const a = from.summary.verdicts;
  const b = to.summary.verdicts;
  if (a.pass !== b.pass) changes.push(`passing variants ${a.pass} → ${b.pass}`);
  const cheapest = (s: SweepSummary) => s.ranking?.top[0] ?? null;
  const ca = cheapest(from.summary);
  const cb = cheapest(to.summary);
  const cheapestCostDifference = ca && cb ? cb.cost - ca.cost : null;
  if (ca && cb && (ca.cost !== cb.cost || JSON.stringify(ca.values) !== JSON.stringify(cb.values)))
    changes.push(
      `cheapest passing variant ${ca.values.join(' × ')} at ${fmt(ca.cost)} → ${cb.values.join(' × ')} at ${fmt(cb.cost)} per m²`,
    );
  const verdictChanges: SweepComparison['verdictChanges'] = [];
  if (sameParameters) {
    const before = new Map(from.summary.points.map((p) => [JSON.stringify(p.values), p.verdict]));
    for (const p of to.summary.points) {
      const was = before.get(JSON.stringify(p.values));
      if (was && was !== p.verdict && verdictChanges.length < 200)
        verdictChanges.push({ values: p.values, from: was, to: p.verdict });
    }
    if (verdictChanges.length > 0) changes.push(`${verdictChanges.length} variants changed verdict`);
  }
  if (changes.length === 0) changes.push('no difference in what was kept');
  return { sameParameters, changes, cheapestCostDifference, verdictChanges };
}
