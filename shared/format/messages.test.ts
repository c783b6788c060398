import { describe, expect, it } from 'vitest';
import { demoAssembly, demoProject, criteriaRow as row, storedBefore } from '../checks/fixtures';
import { checkReportSchema } from '../checks/report';
import { runChecks } from '../checks/runner';
import {
  type EngineMessage,
  engineMessageSchema,
  engineMessage as m,
  messageText,
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
];

describe('every engine message code in words', () => {
  it('has an example for every code', () => {
    const codes = engineMessageSchema.options.map((o) => o.shape.code.value);
    expect(new Set(WORDS.map(([msg]) => msg.code))).toEqual(new Set(codes));
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

  it('stores messages, not words, in a run made now', () => {
    const [, missing] = reports;
    const rh = missing!.checks.find((c) => c.id === 'criterion.max_surface_rh')!;
    expect(rh.reason).toEqual(m('module_missing', '', { items: [climate] }));
    expect(storedMessageText(rh.reason)).toBe('the project’s monthly climate is missing');
  });
});
