import type { SavedSweepSummary } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';
import { formatNumber } from '../../../lib/quantities';
import { costToShown, costUnit } from '../costs';
import { staleText } from '../saved';

/** "Stale — the assembly changed since (revision 3 → 5)" with its glyph; nothing when current. */
export function StaleMark({ sweep }: { sweep: SavedSweepSummary }) {
  const text = staleText(sweep);
  return text ? (
    <span className="font-semibold text-caution">
      <span aria-hidden="true">⚠ </span>
      {text}
    </span>
  ) : null;
}

/** "15 variants, 6 pass · cheapest 17.67 per m² of wall" */
export const resultText = (
  s: Pick<SavedSweepSummary, 'count' | 'verdicts' | 'cheapest'>,
  system: UnitSystem,
) =>
  `${s.count.toLocaleString('en-GB')} variants, ${s.verdicts.pass} pass${
    s.cheapest
      ? ` · cheapest ${formatNumber(costToShown(s.cheapest.cost, 'wall', system), 2)} ${costUnit('wall', system)}`
      : ''
  }`;
