import type { JointInput } from '@shared/calc/joints/schema';
import type { TakeoffResult } from '@shared/calc/takeoff/schema';
import {
  notYet,
  ResultSummary,
  type SummaryFigure,
  type SummaryVerdict,
} from '../../../components/ui/ResultSummary';
import { useUnitSystem } from '../../../lib/unit-system';
import type { JointsEvaluation } from '../evaluate';
import { jointVerdict } from '../verdict';

/**
 * The joints page's result first: whether every joint is wide enough for its movement, the tightest joint, and
 * the sealant the takeoff counts.
 */
export function JointsSummary({
  joints,
  evaluation,
  takeoff,
  problems,
  stale,
}: {
  joints: readonly JointInput[];
  evaluation: JointsEvaluation;
  takeoff: TakeoffResult | null;
  /** How many values cannot be used yet. */
  problems: number;
  stale: boolean;
}) {
  const system = useUnitSystem();
  const n = joints.length;
  const { passCount, failCount } = evaluation;
  const verdict: SummaryVerdict =
    n === 0
      ? notYet('no joints', 'enter the joint schedule below')
      : failCount > 0
        ? {
            glyph: '✕',
            word: 'short',
            detail: `${failCount} of ${n} joints too narrow for their movement`,
            tone: 'fails',
          }
        : problems > 0
          ? notYet(
              'not all sized',
              `${problems === 1 ? 'one value needs' : `${problems} values need`} attention`,
            )
          : {
              glyph: '✓',
              word: 'meets',
              detail: `every joint is wide enough for its movement`,
              tone: 'meets',
            };
  // The tightest joint: the smallest design width against the width its movement needs.
  const tightest = evaluation.results
    .map((r, i) => (r ? { r, name: joints[i]?.name ?? `joint ${i + 1}` } : null))
    .filter((x) => x !== null)
    .sort((a, b) => a.r.designWidth / a.r.requiredWidth - b.r.designWidth / b.r.requiredWidth)[0];
  const figures: SummaryFigure[] = [
    { label: 'Joints that meet', value: `${passCount} of ${n}`, testId: 'summary-joints' },
    {
      label: tightest ? `Tightest joint: ${tightest.name}` : 'Tightest joint',
      value: tightest ? jointVerdict(tightest.r, system).text : '—',
    },
    {
      label: 'Sealant cartridges (10.1 US fl oz)',
      value: takeoff ? String(takeoff.sealant.cartridges.usFlOz10_1) : '—',
    },
  ];
  return (
    <ResultSummary verdict={verdict} figures={figures} stale={stale} resultId="joint-schedule-heading" />
  );
}
