import { GENERIC_EXPANSION_NOTE } from '../calc/joints/expansion';
import { MONTH_NAMES } from '../calc/moisture/monthly';
import { WALL_CATEGORY_LABELS } from '../schemas/assembly';
import type { UnitSystem } from '../units';
import type {
  DesignReason,
  EngineMessage,
  JointWarning,
  MoistureWarning,
  StoredMessage,
  ThermalWarning,
  WindWarning,
} from './message-schema';
import { formatterFor, num } from './quantities';

type Warning = DesignReason | ThermalWarning | MoistureWarning | JointWarning | WindWarning;

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
const fixed2 = (x: number) => x.toFixed(2);

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
    case 'girt_outside_table': {
      const { detail } = m.values;
      const why =
        detail === null ? 'the design span is outside the table' : storedMessageText(detail, system);
      return `the table cannot say — ${why} (tables are never extrapolated)`;
    }
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
    case 'joint_warning':
      return `${m.values.joint}: ${messageText(m.values.warning, system)}`;
    case 'joints_gross_through_openings':
      return 'Panel joints are measured gross through openings (opening positions are not part of the input).';
    case 'waste_on_sealant_and_tape':
      return 'Waste applies to sealant and tape; trim pieces and fasteners are net geometric counts.';
    case 'base_net_of_doors':
      return 'The base is taken as one run net of door widths; each door splits it on site.';
    case 'fasteners_counted_on_girt_lines':
      return 'Fasteners: girt lines from the base to the top at the girt spacing, fasteners end to end; only points certainly inside an opening are deducted.';
    default:
      return warningText(m, system);
  }
}

/**
 * The wind design check's reasons and the engines' warnings, in words (lower case, no full stop: pages and the
 * sheet make them sentences). Lengths through the quantity formatter; the SI words are those of before.
 */
function warningText(m: Warning, system: UnitSystem): string {
  const f = formatterFor(system);
  const depth = (x: number) => f.length(x, { inchFractions: true });
  switch (m.code) {
    case 'design_girt_missing':
      return 'no design girt spacing entered';
    case 'design_clip_missing':
      return 'no design clip spacing entered';
    case 'span_beyond_table':
      return `the design span (${f.length(m.values.span)}) is longer than the table’s longest span (${f.length(m.values.longest)})`;
    case 'span_below_table':
      return `the design span (${f.length(m.values.span)}) is shorter than the table’s shortest span (${f.length(m.values.shortest)})`;
    case 'combined_method_limit':
      return `R′T/R″T = ${num(m.values.ratio, 2)} exceeds ${num(m.values.limit, 1)}, the ISO 6946:2017 limit for the combined method; use a numerical calculation (ISO 10211)`;
    case 'interior_capped':
      return `${m.values.months.map((k) => MONTH_NAMES[k - 1]).join(', ')}: the humidity-class vapour pressure would exceed saturation at the interior temperature; p_i is capped at p_sat(θ_i)`;
    case 'condensation_every_month':
      return 'Condensation is predicted in every month: the balance starts in January and the element never dries';
    case 'slightly_ventilated_unventilated':
      return `${m.values.name}: a slightly ventilated air layer is taken as unventilated here (its unventilated R, no vapour exchange with the outside) — the cautious side for interstitial condensation; the thermal check blends R_T by its vent area (ISO 6946:2017 §6.9.3)`;
    case 'framed_layer_between_members':
      return `${m.values.name}: the one-dimensional condensation calculation runs through the cavity between the members; the members themselves are thermal bridges — check their surface temperature and condensation risk with ISO 10211 or published ψ/χ and f_Rsi values`;
    case 'outside_ventilated_layer': {
      const n = m.values.count;
      return `${n === 1 ? 'Layer 1 lies' : `Layers 1–${n} lie`} outside a well-ventilated air layer and ${n === 1 ? 'is' : 'are'} disregarded; the exterior climate is taken to reach the cavity`;
    }
    case 'expansion_generic':
      return `α of ${m.values.side}: ${GENERIC_EXPANSION_NOTE.toLowerCase()}`;
    case 'depth_over_rule':
      return `Design depth ${depth(m.values.designDepth)} is deeper than the depth rule (${depth(m.values.requiredDepth)}); excess depth reduces the sealant’s movement capability`;
    case 'depth_below_bond':
      return `Design depth ${depth(m.values.designDepth)} is below the ${depth(m.values.minimum)} needed for the bond to the substrate`;
    case 'joint_over_wide':
      return `Joint ${depth(m.values.width)} wide, wider than ${depth(m.values.limit)}: have the sealant manufacturer review it`;
    case 'opening_shallow':
      return `The opening (${depth(m.values.openingDepth)} deep) is shallower than the sealant depth (${depth(m.values.requiredDepth)})`;
    case 'above_gradient_height':
      return `The mean roof height (${f.dimension(m.values.height)}) lies above the gradient height z_g (${f.dimension(m.values.gradientHeight)}); K_z is held at its value at z_g`;
    case 'high_rise_gcp':
      return `h > ${f.dimension(m.values.limit)}: confirm the wall GC_p values of ${m.values.figure} against the adopted edition before issuing the schedule`;
    case 'exposure_b_floor': {
      const { edition, kz, floorKz, floorHeight } = m.values;
      const below = `below ${f.dimension(floorHeight)}`;
      return `Exposure B ${below}: ${edition} Table 26.10-1 gives K_z = ${fixed2(kz)} here for components and cladding; its ${fixed2(floorKz)} footnote is for Chapter 28 (main wind-force resisting system, envelope procedure) only. ASCE 7-10 held K_z at ${fixed2(floorKz)} ${below} for components and cladding (Table 30.3-1), which gives pressures ${Math.round((floorKz / kz - 1) * 100)} % higher — where the adopted code or the building official keeps that floor, design for it`;
    }
    case 'low_slope_gcp':
      return `Roof slope θ ≤ ${m.values.slopeLimit}°: wall GC_p reduced by 10 % (Figure 30.3-1 note), and h must be the eave height`;
    case 'span_outside_table':
      return `Zone ${m.values.zone}: the ${m.values.check} pressure exceeds the table even at its shortest span — outside the table, no spacing given`;
    case 'spacing_not_converged':
      return `Zone ${m.values.zone}: the ${m.values.check} spacing did not converge in ${m.values.iterations} iterations`;
    case 'table_end_governs':
      return `Zone ${m.values.zone}: the governing span is the table’s longest span; longer spans are outside the table`;
    case 'clip_below_module':
      return `Zone ${m.values.zone}: the clip spacing (${f.length(m.values.clipSpacing)}) is less than the panel module width — more than one clip per module per girt is needed`;
    case 'module_wider_than_end_zone':
      return 'The panel module is wider than the end zone a: design the corner panels for zone 5';
    case 'panels_cross_end_zone':
      return 'Panels spanning from a corner cross the end zone a: use the zone 5 girt spacing there';
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
