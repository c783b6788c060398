import type { DesignCheck, ZoneDesign, ZoneResult } from '@shared/calc/wind/schema';
import { storedMessageText } from '@shared/format';
import type { UnitSystem } from '@shared/units';
import { CHECK_LABELS } from './labels';
import { formatWind } from './units';

/** A verdict as it is read: a glyph, a word and the reason — never colour alone. */
export interface StatusText {
  glyph: '✓' | '✕' | '?';
  word: string;
  detail: string;
  tone: 'meets' | 'fails' | 'open';
}

const pct = (x: number) => `${Math.round(x * 100)}\u202f%`;

/** "meets — margin 31 %" / "fails — over by 0.130 kPa (14 %)" / "outside the table — …" / "not checked — …". */
export function checkStatusText(c: DesignCheck, system: UnitSystem): StatusText {
  switch (c.status) {
    case 'meets':
      return { glyph: '✓', word: 'meets', detail: `margin ${pct(1 - c.utilisation!)}`, tone: 'meets' };
    case 'fails': {
      const over = c.required! - c.allowable!;
      const amount = formatWind(over, c.unit === 'N' ? 'force' : 'pressure', system);
      return {
        glyph: '✕',
        word: 'fails',
        detail: `over by ${amount} (${pct(c.utilisation! - 1)})`,
        tone: 'fails',
      };
    }
    case 'outside-table':
      return {
        glyph: '✕',
        word: 'outside the table',
        detail: storedMessageText(c.reason, system),
        tone: 'fails',
      };
    case 'missing':
      return { glyph: '?', word: 'not checked', detail: storedMessageText(c.reason, system), tone: 'open' };
  }
}

/** The verdict of one zone row of the schedule: the engine's maximum spacings and the designer's spacings together. */
export function zoneStatusText(
  zone: ZoneResult,
  design: ZoneDesign | undefined,
  system: UnitSystem,
): StatusText {
  if (zone.status === 'outside-table') {
    const which = zone.spanChecks
      .filter((c) => c.status === 'outside-table')
      .map((c) => CHECK_LABELS[c.check].toLowerCase());
    return {
      glyph: '✕',
      word: 'outside the table',
      detail: `even the table’s shortest span does not carry the ${which.join(' and ')} pressure — no spacing can be given`,
      tone: 'fails',
    };
  }
  const tableEnd = zone.status === 'table-end' ? ' (at the table’s longest span)' : '';
  if (!design || design.status === 'missing') {
    return {
      glyph: '?',
      word: 'no design spacing',
      detail: `enter the design girt and clip spacing to check them; the maximums are shown${tableEnd}`,
      tone: 'open',
    };
  }
  if (design.status === 'outside-table')
    return {
      glyph: '✕',
      word: 'outside the table',
      detail: `the design girt spacing ${formatWind(design.girtSpacing, 'span', system)} lies outside the table’s spans`,
      tone: 'fails',
    };
  if (design.status === 'fails') {
    const reasons: string[] = [];
    if (design.girt === 'fails' && design.girtSpacing !== undefined && design.maxGirtSpacing !== null)
      reasons.push(
        `girt spacing ${formatWind(design.girtSpacing, 'span', system)} is more than the ${formatWind(design.maxGirtSpacing, 'span', system, { rounding: 'down' })} allowed`,
      );
    if (design.clip === 'fails' && design.clipSpacing !== undefined)
      reasons.push(
        design.maxClipAtDesignGirt !== null
          ? `clip spacing ${formatWind(design.clipSpacing, 'spacing', system)} is more than the ${formatWind(design.maxClipAtDesignGirt, 'spacing', system, { rounding: 'down' })} allowed at this girt spacing`
          : `clip spacing ${formatWind(design.clipSpacing, 'spacing', system)} overloads the clip`,
      );
    const detail = reasons.length > 0 ? reasons.join('; ') : 'a check at the design spacing is not met';
    return { glyph: '✕', word: 'exceeds', detail, tone: 'fails' };
  }
  const parts: string[] = [];
  if (design.girtSpacing !== undefined && design.maxGirtSpacing !== null)
    parts.push(
      `girts ${formatWind(design.girtSpacing, 'span', system)} ≤ ${formatWind(design.maxGirtSpacing, 'span', system, { rounding: 'down' })}`,
    );
  if (design.clipSpacing !== undefined && design.maxClipAtDesignGirt !== null)
    parts.push(
      `clips ${formatWind(design.clipSpacing, 'spacing', system)} ≤ ${formatWind(design.maxClipAtDesignGirt, 'spacing', system, { rounding: 'down' })}`,
    );
  return { glyph: '✓', word: 'meets', detail: `${parts.join('; ')}${tableEnd}`, tone: 'meets' };
}
