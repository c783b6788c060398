import { describe, expect, it } from 'vitest';
import { demoAssembly, demoProject, criteriaRow as row, storedBefore } from '../checks/fixtures';
import { checkReportSchema } from '../checks/report';
import { runChecks } from '../checks/runner';
import {
  type EngineMessage,
  engineMessageSchema,
  engineMessage as m,
  messageText,
  type StoredMessage,
  storedMessageText,
} from './index';
import { checkFigures } from './verdicts';

/*
 * Every message code worded once for the screens and the sheet. The SI words are the sentences the engine
 * built before its messages became data (the same words, so no printed meaning changed); quantities inside
 * them are worded in the person's units. Conversions: 1 Btu·in/(h·ft²·°F) = 0.144 228 W/(m·K),
 * 1 h·ft²·°F/Btu = 0.176 110 m²·K/W, 1 lb/ft² = 4.882 43 kg/m² (NIST SP 811 B.8) [memory].
 */

const vapour = m('vapour_missing', 'vapour.3', { layer: 3, name: 'Mineral wool board' });
const climate = m('climate_missing', 'project.climate', {});
const failed = [{ check: 'outward', utilisation: 1.0421 }];
const verdict = (over: Partial<Extract<EngineMessage, { code: 'moisture_verdict' }>['values']> = {}) =>
  m('moisture_verdict', '', {
    condensation: 'none',
    maxAccumulation: 0,
    finalAccumulation: 0,
    month: null,
    plane: null,
    fRsi: 0.9,
    fRsiMax: 0.5,
    failingMonths: [],
    bridges: [],
    ...over,
  });

/** One example of every code with its SI words. */
const WORDS: [EngineMessage, string][] = [
  [vapour, 'vapour data of layer 4 (Mineral wool board)'],
  [climate, 'the project’s monthly climate'],
  [m('wind_missing', 'project.wind', {}), 'the project’s wind data'],
  [m('panel_missing', 'windPanel', {}), 'the panel’s load–span table and clip capacity'],
  [m('joints_missing', 'joints', {}), 'the joint schedule'],
  [m('takeoff_missing', 'takeoff', {}), 'the elevation for the takeoff'],
  [
    m('calc_refused', 'layers.2.thickness', { reason: 'got 0.5027093596059113' }),
    'layers.2.thickness: got 0.502709',
  ],
  [
    m('ci_counted', '', { counted: ['EPS', 'XPS'], declared: ['Panel'], maxLambda: 0.065 }),
    'Counted: EPS, XPS. Convention: homogeneous layers with λ ≤ 0.065\u202fW/(m·K) outside the framing, R = d/λ. Declared-resistance layers not counted: Panel.',
  ],
  [
    m('ci_counted', '', { counted: [], declared: [], maxLambda: 0.065 }),
    'No homogeneous layer has λ ≤ 0.065\u202fW/(m·K). Convention: homogeneous layers with λ ≤ 0.065\u202fW/(m·K) outside the framing, R = d/λ.',
  ],
  [
    m('cavity_counted', '', { counted: [{ fill: 'Batt', layer: 'Studs' }], maxLambda: 0.065 }),
    'Counted: Batt in Studs. Convention: d/λ of the lowest-λ section of each framed layer.',
  ],
  [
    m('cavity_counted', '', { counted: [], maxLambda: 0.065 }),
    'No framed layer is filled with insulation (λ ≤ 0.065\u202fW/(m·K)).',
  ],
  [
    m('surface_rh_highest', '', { month: 1, rsi: 0.25 }),
    'Highest in Jan: φ_si = p_i/p_sat(θ_si) at the clear-field interior surface (Rsi = 0.25\u202fm²·K/W).',
  ],
  [m('sealant_lowest', '', { joint: 'Panel joint', movementClass: '25' }), 'Lowest: Panel joint (class 25).'],
  [
    m('deflection_column', '', { limit: 'L/180' }),
    'The girt spacing is limited by the table’s L/180 deflection column.',
  ],
  [m('nothing_to_dry', '', {}), 'No interstitial condensation is predicted, so there is nothing to dry.'],
  [
    m('module_missing', '', { items: [vapour, climate] }),
    'vapour data of layer 4 (Mineral wool board) and the project’s monthly climate are missing',
  ],
  [
    m('module_refused', 'bridges.0.layerIndex', { module: 'Thermal calculation', reason: 'no layer 41' }),
    'the thermal calculation refused the input (bridges.0.layerIndex: no layer 41)',
  ],
  [
    m('metric_not_reported', '', { module: 'Thermal calculation' }),
    'the thermal calculation did not report it',
  ],
  [
    m('no_module_measures', '', { criterion: 'Maximum U-factor' }),
    'no check module measures maximum u-factor yet',
  ],
  [m('not_both_yes_no', '', {}), 'the criterion and the metric are not both yes/no'],
  [m('not_both_numbers', '', {}), 'the criterion and the metric are not both numbers'],
  [
    m('no_matching_rows', '', { climateZone: '5A', wallCategory: 'steel_framed' }),
    'the code table has no row for climate zone 5A (or all zones) and steel-framed walls, so nothing was checked against it',
  ],
  [
    m('not_required', '', { note: m('nothing_to_dry', '', {}) }),
    'The table does not require it. No interstitial condensation is predicted, so there is nothing to dry.',
  ],
  [m('not_required', '', { note: null }), 'The table does not require it.'],
  [m('joints_empty', 'joints', {}), 'the joint schedule is empty'],
  [
    m('no_deflection_column', 'windPanel.loadSpanTable', {}),
    'the panel’s load–span table has no deflection column, so no deflection limit is checked',
  ],
  [
    m('surface_not_applicable', '', {}),
    'Not applicable: in no month is the outside cold enough for the interior surface to reach 80 % RH (f_Rsi,max would be 0 or negative).',
  ],
  [
    m('surface_at_bridge', '', { month: 1, rsi: 0.25 }),
    'ISO 13788 §5 at the thermal bridge: f_Rsi from its ISO 10211 solve with Rsi = 0.25\u202fm²·K/W; critical month 1.',
  ],
  [
    m('surface_clear_field', '', { month: 12, bridgesSolved: true }),
    'ISO 13788 §5: the surface stays at or below 80 % RH when f_Rsi ≥ f_Rsi,max; critical month 12. Clear field; the solved bridges are checked below.',
  ],
  [
    m('surface_clear_field', '', { month: 1, bridgesSolved: false }),
    'ISO 13788 §5: the surface stays at or below 80 % RH when f_Rsi ≥ f_Rsi,max; critical month 1. Clear field only — girts, clips and studs need their own f_Rsi (solve them on the build-up page).',
  ],
  [
    m('table_outside', '', {}),
    'Even the shortest span of the table does not carry this zone’s pressure: choose a stronger panel or add support.',
  ],
  [
    m('table_end', '', {}),
    'The longest span of the table still carries the pressure; spans beyond the table are not extrapolated.',
  ],
  [m('table_inside', '', {}), 'Found inside the table.'],
  [
    m('girt_spacing_missing', 'attachment.girtSpacing', {}),
    'the design girt spacing is not entered on the assembly',
  ],
  [
    m('clip_spacing_missing', 'attachment.clipSpacing', {}),
    'the design clip spacing is not entered on the assembly',
  ],
  [
    m('clip_needs_girt_spacing', 'attachment.girtSpacing', {}),
    'the design girt spacing is not entered on the assembly, and the clip spacing is checked at it',
  ],
  [
    m('girt_outside_table', 'attachment.girtSpacing', { detail: null }),
    'the table cannot say — the design span is outside the table (tables are never extrapolated)',
  ],
  [m('clip_outside_table', '', {}), 'the clip cannot be checked at a design girt spacing outside the table'],
  [
    m('no_girt_spacing_works', '', {}),
    'no girt spacing works: the panel table does not carry this zone’s pressure',
  ],
  [m('no_clip_spacing_works', '', {}), 'no clip spacing works at this girt spacing'],
  [
    m('girt_governed', '', { governing: 'deflection', failed }),
    'The maximum is governed by the deflection check. Not met at the design spacing: outward (utilisation 1.042).',
  ],
  [m('girt_governed', '', { governing: null, failed: [] }), ''],
  [
    m('clip_at_design_girt', '', { failed: [] }),
    'The maximum clip spacing is found at the design girt spacing.',
  ],
  [m('joint_minimum_governs', 'joints.0', {}), 'The smallest practical joint width governs.'],
  [
    m('joint_governs', 'joints.1', { governing: 'thermal movement' }),
    'The joint’s thermal movement governs the width it needs.',
  ],
  [
    verdict(),
    'No interstitial condensation is predicted in any month. The clear-field interior surface stays at or below 80 % RH in every month (f_Rsi 0.900 ≥ f_Rsi,max 0.500).',
  ],
  [
    verdict({
      condensation: 'dries',
      maxAccumulation: 0.12,
      month: 2,
      plane: 'the sheathing',
      fRsiMax: null,
    }),
    'Interstitial condensation is predicted (at most 0.12\u202fkg/m² in February, mostly at the sheathing) but it all evaporates within the year; check that amount against what the materials there tolerate. Surface humidity check not applicable: in no month is the outside cold enough for the interior surface to reach 80 % RH.',
  ],
  [
    verdict({
      condensation: 'builds',
      maxAccumulation: 0.5,
      finalAccumulation: 0.2,
      month: 3,
      failingMonths: [1, 2],
      fRsi: 0.7,
      fRsiMax: 0.75,
      bridges: [{ name: 'clip', fRsi: 0.6, pass: false }],
    }),
    'Interstitial condensation builds up: it peaks at 0.5\u202fkg/m² in March and 0.2\u202fkg/m² remain after the 12 months, so water accumulates year on year — the wall fails the ISO 13788 balance. Mould risk: the clear-field interior surface exceeds 80 % RH in January, February (f_Rsi 0.700). Mould risk at clip (f_Rsi 0.600): below f_Rsi,max 0.750.',
  ],
  // The takeoff's notes: the words the engine wrote before they became codes (D-035).
  [
    m('joints_gross_through_openings', '', {}),
    'Panel joints are measured gross through openings (opening positions are not part of the input).',
  ],
  [
    m('waste_on_sealant_and_tape', '', {}),
    'Waste applies to sealant and tape; trim pieces and fasteners are net geometric counts.',
  ],
  [
    m('base_net_of_doors', 'walls', {}),
    'The base is taken as one run net of door widths; each door splits it on site.',
  ],
  [
    m('fasteners_counted_on_girt_lines', 'fasteners', {}),
    'Fasteners: girt lines from the base to the top at the girt spacing, fasteners end to end; only points certainly inside an opening are deducted.',
  ],
];

/*
 * The wind design check's reasons and the engines' warnings (D-035), each in SI and IP. The SI words are the
 * engine's sentences of before, lengths now through the formatter. Conversions (NIST SP 811 B.8) [memory]:
 * 1 ft = 0.3048 m, 1 in = 25.4 mm; the rest derived.
 */
const wide = m('joint_over_wide', 'joints.0.designWidth', { width: 0.06, limit: 0.0508 });
const WARNINGS: [EngineMessage, string, string][] = [
  [
    m('design_girt_missing', 'design.girtSpacing', {}),
    'no design girt spacing entered',
    'no design girt spacing entered',
  ],
  [
    m('design_clip_missing', 'design.clipSpacing', {}),
    'no design clip spacing entered',
    'no design clip spacing entered',
  ],
  [
    // 3.5 m / 0.3048 = 11.48 ft, 3 m = 9.84 ft — derived.
    m('span_beyond_table', 'design.girtSpacing', { span: 3.5, longest: 3 }),
    'the design span (3.5\u202fm) is longer than the table’s longest span (3\u202fm)',
    'the design span (11.48\u202fft) is longer than the table’s longest span (9.84\u202fft)',
  ],
  [
    // 0.5 m = 1.640 ft, 0.9 m = 2.953 ft — derived.
    m('span_below_table', 'design.girtSpacing', { span: 0.5, shortest: 0.9 }),
    'the design span (0.5\u202fm) is shorter than the table’s shortest span (0.9\u202fm)',
    'the design span (1.64\u202fft) is shorter than the table’s shortest span (2.95\u202fft)',
  ],
  [
    m('combined_method_limit', '', { ratio: 1.6234, limit: 1.5 }),
    'R′T/R″T = 1.62 exceeds 1.5, the ISO 6946:2017 limit for the combined method; use a numerical calculation (ISO 10211)',
    'R′T/R″T = 1.62 exceeds 1.5, the ISO 6946:2017 limit for the combined method; use a numerical calculation (ISO 10211)',
  ],
  [
    m('interior_capped', 'interior', { months: [1, 2] }),
    'January, February: the humidity-class vapour pressure would exceed saturation at the interior temperature; p_i is capped at p_sat(θ_i)',
    'January, February: the humidity-class vapour pressure would exceed saturation at the interior temperature; p_i is capped at p_sat(θ_i)',
  ],
  [
    m('condensation_every_month', '', {}),
    'Condensation is predicted in every month: the balance starts in January and the element never dries',
    'Condensation is predicted in every month: the balance starts in January and the element never dries',
  ],
  [
    m('slightly_ventilated_unventilated', 'layers.1', { layer: 1, name: 'Cavity' }),
    'Cavity: a slightly ventilated air layer is taken as unventilated here (its unventilated R, no vapour exchange with the outside) — the cautious side for interstitial condensation; the thermal check blends R_T by its vent area (ISO 6946:2017 §6.9.3)',
    'Cavity: a slightly ventilated air layer is taken as unventilated here (its unventilated R, no vapour exchange with the outside) — the cautious side for interstitial condensation; the thermal check blends R_T by its vent area (ISO 6946:2017 §6.9.3)',
  ],
  [
    m('framed_layer_between_members', 'layers.2', { layer: 2, name: 'Studs' }),
    'Studs: the one-dimensional condensation calculation runs through the cavity between the members; the members themselves are thermal bridges — check their surface temperature and condensation risk with ISO 10211 or published ψ/χ and f_Rsi values',
    'Studs: the one-dimensional condensation calculation runs through the cavity between the members; the members themselves are thermal bridges — check their surface temperature and condensation risk with ISO 10211 or published ψ/χ and f_Rsi values',
  ],
  [
    m('outside_ventilated_layer', 'layers.1', { count: 2 }),
    'Layers 1–2 lie outside a well-ventilated air layer and are disregarded; the exterior climate is taken to reach the cavity',
    'Layers 1–2 lie outside a well-ventilated air layer and are disregarded; the exterior climate is taken to reach the cavity',
  ],
  [
    m('expansion_generic', 'joints.0.sides.0', { side: 'Aluminium' }),
    'α of Aluminium: generic value — use the maker’s declared coefficient where it differs',
    'α of Aluminium: generic value — use the maker’s declared coefficient where it differs',
  ],
  [
    // 15 mm = 0.591 in, 10 mm = 0.394 in — derived.
    m('depth_over_rule', 'joints.0.designDepth', { designDepth: 0.015, requiredDepth: 0.01 }),
    'Design depth 15\u202fmm is deeper than the depth rule (10\u202fmm); excess depth reduces the sealant’s movement capability',
    'Design depth 0.59\u202fin is deeper than the depth rule (0.39\u202fin); excess depth reduces the sealant’s movement capability',
  ],
  [
    // ¼ in = 6.35 mm exactly.
    m('depth_below_bond', 'joints.0.designDepth', { designDepth: 0.004, minimum: 0.00635 }),
    'Design depth 4\u202fmm is below the 6.4\u202fmm needed for the bond to the substrate',
    'Design depth 0.16\u202fin is below the 1/4\u202fin needed for the bond to the substrate',
  ],
  [
    // 2 in = 50.8 mm exactly; 60 mm = 2.36 in — derived.
    wide,
    'Joint 60\u202fmm wide, wider than 50.8\u202fmm: have the sealant manufacturer review it',
    'Joint 2.36\u202fin wide, wider than 2\u202fin: have the sealant manufacturer review it',
  ],
  [
    m('opening_shallow', 'joints.0.openingDepth', { openingDepth: 0.005, requiredDepth: 0.00635 }),
    'The opening (5\u202fmm deep) is shallower than the sealant depth (6.4\u202fmm)',
    'The opening (0.2\u202fin deep) is shallower than the sealant depth (1/4\u202fin)',
  ],
  [
    m('joint_warning', 'joints.0', { joint: 'J1', warning: wide }),
    'J1: Joint 60\u202fmm wide, wider than 50.8\u202fmm: have the sealant manufacturer review it',
    'J1: Joint 2.36\u202fin wide, wider than 2\u202fin: have the sealant manufacturer review it',
  ],
  [
    // 700 ft = 213.36 m; 220 m = 721.8 ft — derived.
    m('above_gradient_height', 'site.meanRoofHeight', { height: 220, gradientHeight: 213.36 }),
    'The mean roof height (220\u202fm) lies above the gradient height z_g (213.36\u202fm); K_z is held at its value at z_g',
    'The mean roof height (721.8\u202fft) lies above the gradient height z_g (700\u202fft); K_z is held at its value at z_g',
  ],
  [
    m('high_rise_gcp', '', { figure: 'Figure 30.5-1', limit: 18.288 }),
    'h > 18.29\u202fm: confirm the wall GC_p values of Figure 30.5-1 against the adopted edition before issuing the schedule',
    'h > 60\u202fft: confirm the wall GC_p values of Figure 30.5-1 against the adopted edition before issuing the schedule',
  ],
  [
    // 0.70 / 0.57 − 1 = 22.8 % — derived.
    m('exposure_b_floor', '', { edition: 'ASCE 7-16', kz: 0.57, floorKz: 0.7, floorHeight: 9.144 }),
    'Exposure B below 9.14\u202fm: ASCE 7-16 Table 26.10-1 gives K_z = 0.57 here for components and cladding; its 0.70 footnote is for Chapter 28 (main wind-force resisting system, envelope procedure) only. ASCE 7-10 held K_z at 0.70 below 9.14\u202fm for components and cladding (Table 30.3-1), which gives pressures 23 % higher — where the adopted code or the building official keeps that floor, design for it',
    'Exposure B below 30\u202fft: ASCE 7-16 Table 26.10-1 gives K_z = 0.57 here for components and cladding; its 0.70 footnote is for Chapter 28 (main wind-force resisting system, envelope procedure) only. ASCE 7-10 held K_z at 0.70 below 30\u202fft for components and cladding (Table 30.3-1), which gives pressures 23 % higher — where the adopted code or the building official keeps that floor, design for it',
  ],
  [
    m('low_slope_gcp', 'site.roofSlopeDeg', { slopeLimit: 10 }),
    'Roof slope θ ≤ 10°: wall GC_p reduced by 10 % (Figure 30.3-1 note), and h must be the eave height',
    'Roof slope θ ≤ 10°: wall GC_p reduced by 10 % (Figure 30.3-1 note), and h must be the eave height',
  ],
  [
    m('span_outside_table', 'panel.loadSpanTable', { zone: 5, check: 'outward' }),
    'Zone 5: the outward pressure exceeds the table even at its shortest span — outside the table, no spacing given',
    'Zone 5: the outward pressure exceeds the table even at its shortest span — outside the table, no spacing given',
  ],
  [
    m('spacing_not_converged', '', { zone: 4, check: 'clip', iterations: 100 }),
    'Zone 4: the clip spacing did not converge in 100 iterations',
    'Zone 4: the clip spacing did not converge in 100 iterations',
  ],
  [
    m('table_end_governs', 'panel.loadSpanTable', { zone: 4 }),
    'Zone 4: the governing span is the table’s longest span; longer spans are outside the table',
    'Zone 4: the governing span is the table’s longest span; longer spans are outside the table',
  ],
  [
    // 0.6 m = 1.97 ft — derived.
    m('clip_below_module', '', { zone: 5, clipSpacing: 0.6 }),
    'Zone 5: the clip spacing (0.6\u202fm) is less than the panel module width — more than one clip per module per girt is needed',
    'Zone 5: the clip spacing (1.97\u202fft) is less than the panel module width — more than one clip per module per girt is needed',
  ],
  [
    m('module_wider_than_end_zone', 'panel.panelModuleWidth', {}),
    'The panel module is wider than the end zone a: design the corner panels for zone 5',
    'The panel module is wider than the end zone a: design the corner panels for zone 5',
  ],
  [
    m('panels_cross_end_zone', '', {}),
    'Panels spanning from a corner cross the end zone a: use the zone 5 girt spacing there',
    'Panels spanning from a corner cross the end zone a: use the zone 5 girt spacing there',
  ],
  [
    m('girt_outside_table', 'attachment.girtSpacing', {
      detail: m('span_beyond_table', '', { span: 3.5, longest: 3 }),
    }),
    'the table cannot say — the design span (3.5\u202fm) is longer than the table’s longest span (3\u202fm) (tables are never extrapolated)',
    'the table cannot say — the design span (11.48\u202fft) is longer than the table’s longest span (9.84\u202fft) (tables are never extrapolated)',
  ],
];

describe('the design check’s reasons and the engines’ warnings in words (D-035)', () => {
  it.each(WARNINGS)('words %j in SI and IP', (msg, si, ip) => {
    expect(messageText(msg, 'SI')).toBe(si);
    expect(messageText(msg, 'IP')).toBe(ip);
    expect(engineMessageSchema.parse(JSON.parse(JSON.stringify(msg)))).toEqual(msg);
  });

  it('words a design-check reason stored as words (runs between D-030 and D-035) as it was', () => {
    const stored = m('girt_outside_table', 'attachment.girtSpacing', {
      detail: 'the design span is longer than the table’s longest span',
    });
    expect(messageText(engineMessageSchema.parse(stored))).toBe(
      'the table cannot say — the design span is longer than the table’s longest span (tables are never extrapolated)',
    );
  });
});

describe('every engine message code in words', () => {
  it('has an example for every code', () => {
    const codes = engineMessageSchema.options.map((o) => o.shape.code.value);
    expect(new Set([...WORDS, ...WARNINGS].map(([msg]) => msg.code))).toEqual(new Set(codes));
  });

  it.each(WORDS)('words %j as before', (msg, words) => {
    expect(messageText(msg)).toBe(words);
    expect(engineMessageSchema.parse(JSON.parse(JSON.stringify(msg)))).toEqual(msg);
  });

  it('words quantities in the person’s units, the values staying SI', () => {
    const ci = m('ci_counted', '', { counted: [], declared: [], maxLambda: 0.065 });
    // 0.065 / 0.144 228 = 0.4507 Btu·in/(h·ft²·°F) — derived.
    expect(messageText(ci, 'IP')).toContain('λ ≤ 0.451\u202fBtu·in/(h·ft²·°F)');
    // 0.25 / 0.176 110 = 1.4196 h·ft²·°F/Btu, to the IP R's one decimal (D-028) — derived.
    expect(messageText(m('surface_at_bridge', '', { month: 1, rsi: 0.25 }), 'IP')).toContain(
      'Rsi = 1.4\u202fh·ft²·°F/Btu',
    );
    // 0.12 / 4.882 43 = 0.02458 lb/ft² — derived.
    expect(
      messageText(verdict({ condensation: 'dries', maxAccumulation: 0.12, month: 2, plane: 'x' }), 'IP'),
    ).toContain('at most 0.0246\u202flb/ft² in February');
    expect(ci.values.maxLambda).toBe(0.065);
  });

  it('refuses a message whose values do not fit its code', () => {
    expect(engineMessageSchema.safeParse({ code: 'vapour_missing', path: '', values: {} }).success).toBe(
      false,
    );
    expect(engineMessageSchema.safeParse({ code: 'no_such_code', path: '', values: {} }).success).toBe(false);
  });
});

describe('check runs stored before messages became data', () => {
  const a = demoAssembly();
  const reports = [
    runChecks(a, demoProject(), [row('max_u_factor', 0.35), row('must_dry_within_year', false)]),
    runChecks(
      { ...a, attachment: { ...a.attachment, girtSpacing: undefined } },
      { ...demoProject(), climate: null },
      [row('max_surface_rh', 0.8), row('min_cavity_insulation_r', 1)],
    ),
    runChecks(a, demoProject(), [row('max_u_factor', 0.35, '7')]),
  ];

  it('still parse, and print the same words on the page and the sheet as a run stored now', () => {
    for (const report of reports) {
      const old = checkReportSchema.parse(storedBefore(report));
      expect(old.checks.every((c) => typeof c.reason === 'string')).toBe(true);
      const now = checkReportSchema.parse(JSON.parse(JSON.stringify(report)));
      expect(old.checks.map((c) => checkFigures(c, 'SI'))).toEqual(
        now.checks.map((c) => checkFigures(c, 'SI')),
      );
      expect(old.modules.map((o) => o.missing.map((x) => storedMessageText(x)))).toEqual(
        now.modules.map((o) => o.missing.map((x) => storedMessageText(x))),
      );
    }
  });

  it('with the engines’ warnings among the cautions: stored as words, they parse and print the same (D-035)', () => {
    const joints = a.joints!.map((j, i) => (i === 0 ? { ...j, designWidth: 0.06 } : j));
    const now = runChecks(
      { ...a, joints, attachment: { ...a.attachment, girtSpacing: 0.5 } },
      demoProject(),
      [],
    );
    const warning = now.cautions.find(
      (c) =>
        typeof c !== 'string' && c.code === 'joint_warning' && c.values.warning.code === 'joint_over_wide',
    );
    expect(warning).toMatchObject({ path: 'joints.0', values: { warning: { values: { width: 0.06 } } } });
    const outside = now.checks.find(
      (c) => c.reason !== null && typeof c.reason !== 'string' && c.reason.code === 'girt_outside_table',
    )!;
    expect(outside.reason).toMatchObject({
      values: { detail: { code: 'span_below_table', values: { span: 0.5 } } },
    });

    const words = (r: typeof now) => [
      r.cautions.map((c) => storedMessageText(c)),
      r.checks.map((c) => checkFigures(c, 'SI')),
    ];
    // Before messages became data (D-030): every message, the cautions too, in its SI words.
    const old = checkReportSchema.parse(storedBefore(now));
    expect(old.cautions.every((c) => typeof c === 'string')).toBe(true);
    expect(words(old)).toEqual(words(now));
    // Between D-030 and D-035: the design check's reason in words inside its message, the warnings in words.
    const between = JSON.parse(JSON.stringify(now), (key, v) =>
      key === 'detail' && v !== null
        ? messageText(v)
        : key === 'cautions'
          ? v.map((c: StoredMessage) => storedMessageText(c))
          : v,
    );
    expect(words(checkReportSchema.parse(between))).toEqual(words(now));
  });

  it('stores messages, not words, in a run made now', () => {
    const [, missing] = reports;
    const rh = missing!.checks.find((c) => c.id === 'criterion.max_surface_rh')!;
    expect(rh.reason).toEqual(m('module_missing', '', { items: [climate] }));
    expect(storedMessageText(rh.reason)).toBe('the project’s monthly climate is missing');
  });
});
