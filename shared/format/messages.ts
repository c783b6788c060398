import { MONTH_NAMES } from '../calc/moisture/monthly';
import { WALL_CATEGORY_LABELS } from '../schemas/assembly';
import type { UnitSystem } from '../units';
import type { EngineMessage, StoredMessage } from './message-schema';
import { formatterFor } from './quantities';

export * from './message-schema';

/*
 * The engine's and the runner's messages are data — `{ path, code, values }` — and are worded here, once, for
 * the screens and the compliance sheet alike. `path` says where the thing is put right (an assembly or project
 * field, or the calculation's own field path); no code reads a field back out of the words.
 */

/** Engine reasons may carry raw floats ("got 0.5027093596059113"); six significant figures are plenty to read. */
export const readableNumbers = (t: string): string =>
  t.replace(/\d+\.\d{7,}/g, (x) => String(Number(Number(x).toPrecision(6))));

/** "outward (utilisation 1.042)" for each design check that fails at the design spacing. */
const notMet = (failed: readonly { check: string; utilisation: number }[]): string =>
  failed.length > 0
    ? ` Not met at the design spacing: ${failed.map((c) => `${c.check} (utilisation ${c.utilisation.toFixed(3)})`).join(', ')}.`
    : '';

const fixed3 = (x: number) => x.toFixed(3);

/** The moisture result in words: condensation first, then the clear-field surface, then the solved bridges. */
function moistureVerdict(
  v: Extract<EngineMessage, { code: 'moisture_verdict' }>['values'],
  system: UnitSystem,
) {
  const f = formatterFor(system);
  const month = MONTH_NAMES[(v.month ?? 1) - 1];
  const inside =
    v.condensation === 'none'
      ? 'No interstitial condensation is predicted in any month.'
      : v.condensation === 'dries'
        ? `Interstitial condensation is predicted (at most ${f.accumulation(v.maxAccumulation)} in ${month}, mostly at ${v.plane}) but it all evaporates within the year; check that amount against what the materials there tolerate.`
        : `Interstitial condensation builds up: it peaks at ${f.accumulation(v.maxAccumulation)} in ${month} and ${f.accumulation(v.finalAccumulation)} remain after the 12 months, so water accumulates year on year — the wall fails the ISO 13788 balance.`;
  const cold = v.bridges.filter((b) => !b.pass);
  const atBridges =
    cold.length === 0
      ? v.bridges.length > 0 && v.fRsiMax !== null
        ? ` At the thermal bridges solved (${v.bridges.map((b) => b.name).join(', ')}) it stays at or below 80 % RH too.`
        : ''
      : ` Mould risk at ${cold.map((b) => `${b.name} (f_Rsi ${fixed3(b.fRsi)})`).join(', ')}: below f_Rsi,max ${v.fRsiMax === null ? '—' : fixed3(v.fRsiMax)}.`;
  const onSurface =
    v.failingMonths.length === 0
      ? v.fRsiMax === null
        ? 'Surface humidity check not applicable: in no month is the outside cold enough for the interior surface to reach 80 % RH.'
        : `The clear-field interior surface stays at or below 80 % RH in every month (f_Rsi ${fixed3(v.fRsi)} ≥ f_Rsi,max ${fixed3(v.fRsiMax)}).`
      : `Mould risk: the clear-field interior surface exceeds 80 % RH in ${v.failingMonths.map((m) => MONTH_NAMES[m - 1]).join(', ')} (f_Rsi ${fixed3(v.fRsi)}).`;
  return `${inside} ${onSurface}${atBridges}`;
}

/**
 * A message in plain words, its quantities in `system` (the values stay SI). The messages of what is missing
 * or refused are lower case without a full stop (they are put into sentences); notes and the modules' reasons
 * are sentences.
 */
export function messageText(m: EngineMessage, system: UnitSystem = 'SI'): string {
  const f = formatterFor(system);
  switch (m.code) {
    case 'vapour_missing':
      return `vapour data of layer ${m.values.layer + 1} (${m.values.name})`;
    case 'climate_missing':
      return 'the project’s monthly climate';
    case 'wind_missing':
      return 'the project’s wind data';
    case 'panel_missing':
      return 'the panel’s load–span table and clip capacity';
    case 'joints_missing':
      return 'the joint schedule';
    case 'takeoff_missing':
      return 'the elevation for the takeoff';
    case 'calc_refused':
      return `${m.path}: ${readableNumbers(m.values.reason)}`;
    case 'ci_counted': {
      const lambda = `λ ≤ ${f.lambda(m.values.maxLambda)}`;
      const { counted, declared } = m.values;
      return [
        counted.length > 0 ? `Counted: ${counted.join(', ')}.` : `No homogeneous layer has ${lambda}.`,
        `Convention: homogeneous layers with ${lambda} outside the framing, R = d/λ.`,
        declared.length > 0 ? `Declared-resistance layers not counted: ${declared.join(', ')}.` : '',
      ]
        .filter(Boolean)
        .join(' ');
    }
    case 'cavity_counted':
      return m.values.counted.length > 0
        ? `Counted: ${m.values.counted.map((c) => `${c.fill} in ${c.layer}`).join(', ')}. Convention: d/λ of the lowest-λ section of each framed layer.`
        : `No framed layer is filled with insulation (λ ≤ ${f.lambda(m.values.maxLambda)}).`;
    case 'surface_rh_highest':
      return `Highest in ${MONTH_NAMES[m.values.month - 1]!.slice(0, 3)}: φ_si = p_i/p_sat(θ_si) at the clear-field interior surface (Rsi = ${f.rValue(m.values.rsi)}).`;
    case 'sealant_lowest':
      return `Lowest: ${m.values.joint} (class ${m.values.movementClass}).`;
    case 'deflection_column':
      return `The girt spacing is limited by the table’s ${m.values.limit} deflection column.`;
    case 'nothing_to_dry':
      return 'No interstitial condensation is predicted, so there is nothing to dry.';
    case 'module_missing':
      return missingText(m.values.items, system);
    case 'module_refused':
      return `the ${m.values.module.toLowerCase()} refused the input (${m.path}: ${readableNumbers(m.values.reason)})`;
    case 'metric_not_reported':
      return `the ${m.values.module.toLowerCase()} did not report it`;
    case 'no_module_measures':
      return `no check module measures ${m.values.criterion.toLowerCase()} yet`;
    case 'not_both_yes_no':
      return 'the criterion and the metric are not both yes/no';
    case 'not_both_numbers':
      return 'the criterion and the metric are not both numbers';
    case 'no_matching_rows': {
      const category =
        WALL_CATEGORY_LABELS[m.values.wallCategory as keyof typeof WALL_CATEGORY_LABELS] ??
        m.values.wallCategory;
      return `the code table has no row for climate zone ${m.values.climateZone} (or all zones) and ${category.toLowerCase()}s, so nothing was checked against it`;
    }
    case 'not_required':
      return `The table does not require it. ${m.values.note ? messageText(m.values.note, system) : ''}`.trim();
    case 'joints_empty':
      return 'the joint schedule is empty';
    case 'no_deflection_column':
      return 'the panel’s load–span table has no deflection column, so no deflection limit is checked';
    case 'surface_not_applicable':
      return 'Not applicable: in no month is the outside cold enough for the interior surface to reach 80 % RH (f_Rsi,max would be 0 or negative).';
    case 'surface_at_bridge':
      return `ISO 13788 §5 at the thermal bridge: f_Rsi from its ISO 10211 solve with Rsi = ${f.rValue(m.values.rsi)}; critical month ${m.values.month ?? '—'}.`;
    case 'surface_clear_field':
      return `ISO 13788 §5: the surface stays at or below 80 % RH when f_Rsi ≥ f_Rsi,max; critical month ${m.values.month ?? '—'}. Clear field${m.values.bridgesSolved ? '; the solved bridges are checked below' : ' only — girts, clips and studs need their own f_Rsi (solve them on the build-up page)'}.`;
    case 'table_outside':
      return 'Even the shortest span of the table does not carry this zone’s pressure: choose a stronger panel or add support.';
    case 'table_end':
      return 'The longest span of the table still carries the pressure; spans beyond the table are not extrapolated.';
    case 'table_inside':
      return 'Found inside the table.';
    case 'girt_spacing_missing':
      return 'the design girt spacing is not entered on the assembly';
    case 'clip_spacing_missing':
      return 'the design clip spacing is not entered on the assembly';
    case 'clip_needs_girt_spacing':
      return 'the design girt spacing is not entered on the assembly, and the clip spacing is checked at it';
    case 'girt_outside_table':
      return `the table cannot say — ${m.values.detail ?? 'the design span is outside the table'} (tables are never extrapolated)`;
    case 'clip_outside_table':
      return 'the clip cannot be checked at a design girt spacing outside the table';
    case 'no_girt_spacing_works':
      return 'no girt spacing works: the panel table does not carry this zone’s pressure';
    case 'no_clip_spacing_works':
      return 'no clip spacing works at this girt spacing';
    case 'girt_governed':
      return `${m.values.governing ? `The maximum is governed by the ${m.values.governing} check.` : ''}${notMet(m.values.failed)}`.trim();
    case 'clip_at_design_girt':
      return `The maximum clip spacing is found at the design girt spacing.${notMet(m.values.failed)}`;
    case 'joint_minimum_governs':
      return 'The smallest practical joint width governs.';
    case 'joint_governs':
      return `The joint’s ${m.values.governing} governs the width it needs.`;
    case 'moisture_verdict':
      return moistureVerdict(m.values, system);
  }
}

/** Text as a sentence: capital first, a full stop at the end, raw floats to six significant figures. */
export function sentence(text: string): string {
  const t = readableNumbers(text);
  const s = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
}

/** "a", "a and b", "a, b and c". */
export const listWords = (items: readonly string[]): string =>
  items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

/**
 * A stored message in words: data (runs since messages became data) worded in `system`, the words a run stored
 * before as they are, '' for none.
 */
export const storedMessageText = (m: StoredMessage | null | undefined, system: UnitSystem = 'SI'): string =>
  m == null ? '' : typeof m === 'string' ? m : messageText(m, system);

/** "the project’s wind data is missing", "a and b are missing". */
export const missingText = (items: readonly StoredMessage[], system: UnitSystem = 'SI'): string =>
  `${listWords(items.map((m) => storedMessageText(m, system)))} ${items.length > 1 ? 'are' : 'is'} missing`;
