import type { WindScheduleResult, ZoneDesign } from '@shared/calc/wind/schema';
import type { UnitSystem } from '@shared/units';
import {
  notYet,
  ResultSummary,
  type SummaryFigure,
  type SummaryVerdict,
} from '../../../components/ui/ResultSummary';
import { zoneStatusText } from '../status';
import { formatWind } from '../units';

const ZONE_WORD = { 4: 'zone 4', 5: 'zone 5' } as const;

/**
 * The attachment page's result first: the zones' verdicts at the design spacing (the worst one leads), the
 * largest girt spacing each zone allows and the highest utilisation at the design spacing.
 */
export function AttachmentSummary({
  result,
  zones,
  stale,
  system,
}: {
  result: WindScheduleResult | null;
  zones: readonly ZoneDesign[];
  stale: boolean;
  system: UnitSystem;
}) {
  if (!result)
    return (
      <ResultSummary
        verdict={notYet('no schedule yet', 'data is missing (listed under Result)')}
        figures={[]}
        stale={stale}
        resultId="wind-result-heading"
      />
    );
  const statuses = result.zones.map((z) => ({
    zone: z.zone,
    status: zoneStatusText(
      z,
      zones.find((d) => d.zone === z.zone),
      system,
    ),
  }));
  const lead =
    statuses.find((s) => s.status.tone === 'fails') ??
    statuses.find((s) => s.status.tone === 'open') ??
    statuses[0]!;
  const verdict: SummaryVerdict = {
    glyph: lead.status.glyph,
    word: lead.status.word,
    detail: statuses.map((s) => `${ZONE_WORD[s.zone]}: ${s.status.word}`).join(' · '),
    tone: lead.status.tone,
  };
  const utilisations = zones.flatMap((d) => (d.worst?.utilisation != null ? [d.worst.utilisation] : []));
  const figures: SummaryFigure[] = [
    ...result.zones.map((z) => ({
      label: `Largest girt spacing, ${ZONE_WORD[z.zone]}`,
      value:
        z.girtSpacing === null
          ? 'outside the table'
          : formatWind(z.girtSpacing, 'span', system, { rounding: 'down' }),
      testId: `summary-max-girt-${z.zone}`,
    })),
    {
      label: 'Design girt spacing',
      value:
        zones[0]?.girtSpacing !== undefined
          ? formatWind(zones[0].girtSpacing, 'span', system)
          : 'not entered',
    },
    {
      label: 'Highest utilisation',
      value: utilisations.length > 0 ? `${Math.round(Math.max(...utilisations) * 100)}\u202f%` : '—',
      testId: 'summary-utilisation',
    },
  ];
  return <ResultSummary verdict={verdict} figures={figures} stale={stale} resultId="wind-result-heading" />;
}
