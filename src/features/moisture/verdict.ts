import type { MoistureNode, MoistureResult, MonthResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import { formatFactor, formatWater, monthName } from './units';

/*
 * The moisture result in plain words with a glyph, so it reads without colour: no condensation; condensation
 * that dries out within the year (a warning: the amount must suit the materials there); or water that builds
 * up year on year. The surface (mould) check is worded the same way, month by month.
 */

export type Tone = 'meets' | 'warning' | 'fails';

export const TONE: Record<Tone, { glyph: string; word: string; cls: string }> = {
  meets: { glyph: '✓', word: 'meets', cls: 'text-meets border-meets' },
  warning: { glyph: '▲', word: 'conditional', cls: 'text-warning border-warning' },
  fails: { glyph: '✕', word: 'fails', cls: 'text-caution border-caution' },
};

export interface Statement {
  tone: Tone;
  text: string;
}

/** Where a node is, in words: "between A and B", "within A", "on the outer face of A". */
export function nodePlace(node: MoistureNode, layerNames: readonly string[]): string {
  const outer = node.outerLayer === null ? undefined : layerNames[node.outerLayer];
  const inner = node.innerLayer === null ? undefined : layerNames[node.innerLayer];
  switch (node.kind) {
    case 'interface':
      return `between ${outer} and ${inner}`;
    case 'withinLayer':
      return `within ${outer}`;
    case 'exteriorSurface':
      return `on the outer face of ${inner}`;
    case 'interiorSurface':
      return `on the inner face of ${outer}`;
  }
}

const list = (items: readonly string[]) =>
  items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

/** The month the chart and tables open on: the peak of accumulation, else the critical surface month. */
export function criticalMonth(result: MoistureResult): number {
  return (
    result.interstitial.maxAccumulationMonth ?? result.surface.criticalMonth ?? result.months[0]?.month ?? 1
  );
}

/** Interstitial condensation in words: where, from when, how much at most, and whether it dries out. */
export function interstitialStatement(
  result: MoistureResult,
  layerNames: readonly string[],
  system: UnitSystem,
): Statement {
  const { interstitial, months } = result;
  if (!interstitial.condensationOccurs)
    return { tone: 'meets', text: 'No interstitial condensation in any month.' };

  const places = list(interstitial.planes.map((p) => nodePlace(result.nodes[p.node]!, layerNames)));
  const first = months.find((m) => m.condensationNodes.length > 0);
  const peak = `peaks at ${formatWater(interstitial.maxAccumulation, system)} in ${monthName(interstitial.maxAccumulationMonth ?? 1)}`;
  const from = first ? ` from ${monthName(first.month)}` : '';

  if (result.startMonthRule === 'condensationEveryMonth')
    return {
      tone: 'fails',
      text: `Condenses ${places} in every month and never dries out: ${formatWater(interstitial.finalAccumulation, system)} remain after 12 months, and more each year.`,
    };
  if (!interstitial.driesOut)
    return {
      tone: 'fails',
      text: `Condenses ${places}${from}, ${peak}, and does not dry out within the year: ${formatWater(interstitial.finalAccumulation, system)} remain after 12 months, so water builds up year on year.`,
    };
  const peakIndex = months.findIndex((m) => m.month === interstitial.maxAccumulationMonth);
  const dry = months.slice(Math.max(peakIndex, 0)).find((m: MonthResult) => m.totalAccumulation === 0);
  return {
    tone: 'warning',
    text: `Condenses ${places}${from}, ${peak}, and dries out by the end of ${dry ? monthName(dry.month) : 'the year'}. Check that this amount suits the materials there.`,
  };
}

/** The surface (mould) check over the year in words. */
export function surfaceStatement(result: MoistureResult): Statement {
  const { surface, months } = result;
  if (surface.pass)
    return {
      tone: 'meets',
      text:
        surface.fRsiMax === null
          ? 'Surface humidity check not applicable: in no month is the outside cold enough for the interior surface to reach 80 % RH.'
          : `The interior surface stays at or below 80 % RH in every month: f_Rsi ${formatFactor(surface.fRsi)} ≥ f_Rsi,min ${formatFactor(surface.fRsiMax)} of the critical month, ${monthName(surface.criticalMonth ?? 1)}.`,
    };
  const failing = [...months]
    .sort((a, b) => a.month - b.month)
    .filter((m) => !m.surface.pass)
    .map((m) => monthName(m.month));
  return {
    tone: 'fails',
    text: `Mould risk: the interior surface exceeds 80 % RH in ${list(failing)} (f_Rsi ${formatFactor(surface.fRsi)}${surface.fRsiMax === null ? '' : ` < f_Rsi,min ${formatFactor(surface.fRsiMax)} in ${monthName(surface.criticalMonth ?? 1)}`}).`,
  };
}

/** The whole verdict: the worse of the two checks decides the tone. */
export function overallTone(a: Statement, b: Statement): Tone {
  if (a.tone === 'fails' || b.tone === 'fails') return 'fails';
  if (a.tone === 'warning' || b.tone === 'warning') return 'warning';
  return 'meets';
}

export const OVERALL_WORDS: Record<Tone, string> = {
  meets: 'Meets the ISO 13788 screening — no condensation inside the wall and no mould risk at the surface',
  warning:
    'Condensation inside the wall that dries out within the year — acceptable only if the materials there tolerate it',
  fails: 'Fails the ISO 13788 screening',
};

/** The surface check of one month: "meets — margin 0.125" / "fails — short by 0.020" / words when θ_e ≥ θ_i. */
export function surfaceMonthText(month: MonthResult, fRsi: number): Statement {
  const s = month.surface;
  if (s.fRsiMin === null)
    return {
      tone: s.pass ? 'meets' : 'fails',
      text: s.pass
        ? 'meets — outside as warm as inside'
        : 'fails — surface above 80 % RH with no heat flow outward',
    };
  const margin = fRsi - s.fRsiMin;
  return s.pass
    ? { tone: 'meets', text: `meets — margin ${margin.toFixed(3)}` }
    : { tone: 'fails', text: `fails — short by ${Math.abs(margin).toFixed(3)}` };
}
