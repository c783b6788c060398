import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import { notYet, ResultSummary, type SummaryVerdict } from '../../../components/ui/ResultSummary';
import { formatFactor, formatWater } from '../units';
import {
  interstitialStatement,
  OVERALL_WORDS,
  overallTone,
  surfaceStatement,
  TONE,
  type Tone,
} from '../verdict';

const SUMMARY_TONE: Record<Tone, SummaryVerdict['tone']> = {
  meets: 'meets',
  warning: 'open',
  fails: 'fails',
};

/**
 * The moisture page's result first: the ISO 13788 screening in words and a glyph, the largest water
 * accumulated inside the wall, whether it dries out, and the surface factor against the critical month's need.
 */
export function MoistureSummary({
  result,
  layerNames,
  problems,
  stale,
  system,
}: {
  result: MoistureResult | null;
  layerNames: readonly string[];
  /** How many things keep the page from being computed. */
  problems: number;
  stale: boolean;
  system: UnitSystem;
}) {
  if (!result)
    return (
      <ResultSummary
        verdict={notYet(
          'no result yet',
          `${problems === 1 ? 'one thing is' : `${problems} things are`} missing (listed under Result)`,
        )}
        figures={[]}
        stale={stale}
        resultId="moisture-result-heading"
      />
    );
  const tone = overallTone(interstitialStatement(result, layerNames, system), surfaceStatement(result));
  const { interstitial, surface } = result;
  return (
    <ResultSummary
      verdict={{
        glyph: TONE[tone].glyph as SummaryVerdict['glyph'],
        word: TONE[tone].word,
        detail: OVERALL_WORDS[tone],
        tone: SUMMARY_TONE[tone],
      }}
      figures={[
        {
          label: 'Most water inside the wall',
          value: interstitial.condensationOccurs ? formatWater(interstitial.maxAccumulation, system) : 'none',
          testId: 'summary-accumulation',
        },
        {
          label: 'Dries out within the year',
          value: interstitial.condensationOccurs ? (interstitial.driesOut ? 'yes' : 'no') : '—',
        },
        { label: 'Surface factor f_Rsi', value: formatFactor(surface.fRsi), testId: 'summary-fRsi' },
        { label: 'Needed f_Rsi,min', value: formatFactor(surface.fRsiMax) },
      ]}
      stale={stale}
      resultId="moisture-result-heading"
    />
  );
}
