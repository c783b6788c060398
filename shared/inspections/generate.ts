import { CalcInputError } from '../calc/errors';
import { calculateJointSchedule, MIN_SEALANT_DEPTH } from '../calc/joints/joints';
import type { JointResult } from '../calc/joints/schema';
import type { ZoneDesign } from '../calc/wind/schema';
import { type ProjectForChecks, windDesignInputFor } from '../checks/inputs';
import { INSULATION_MAX_CONDUCTIVITY } from '../checks/metrics';
import { runWind } from '../checks/modules';
import type { AssemblyInput } from '../schemas/assembly';
import type {
  GeneratedItem,
  InspectionScope,
  InspectionZone,
  ItemSource,
  SOURCE_PAGES,
  TemplateItem,
} from './schema';

/**
 * The checklist generator: what an inspector looks at on the wall, read from the assembly revision that was
 * proved and from the same engines that proved it (the wind design check of shared/checks, the joint schedule of
 * shared/calc/joints) — nothing is recomputed another way. Each item cites the revision, the page and field its
 * design value came from and, when given, the check run and its compliance sheet.
 */

export interface ChecklistSource {
  assembly: { id: string; revision: number; input: AssemblyInput };
  /** The project data the checks read (a check run's snapshot when one is cited). */
  project: ProjectForChecks;
  scope: InspectionScope;
  /** The check run of this revision that proved it, with its sheet's verification code. */
  checkRun: { id: string; sheetCode: string } | null;
  /** The firm's own items (its checklist template version), added after the generated ones. */
  template?: { version: number; items: readonly TemplateItem[] } | null;
}

/** ASCE 7 wall zones: zone 4 away from the corners, zone 5 within the end-zone width a of each corner. */
export const WIND_ZONE_OF: Record<InspectionZone, 4 | 5> = { field: 4, edge: 5, corner: 5 };
const ZONE_WORDS: Record<4 | 5, string> = { 4: 'zone 4 (field)', 5: 'zone 5 (end zones at corners)' };

/** The wind zones a scope covers: the zone named, or both over a range of grid lines. */
export const windZonesOf = (scope: InspectionScope): (4 | 5)[] =>
  scope.area.kind === 'zone' ? [WIND_ZONE_OF[scope.area.zone]] : [4, 5];

/** A barrier film: a thin (≤ 2 mm), non-metal layer — the water-resistive, air or vapour barrier. */
const BARRIER_MAX_THICKNESS = 0.002;
/** Anything conducting at least this much is metal (the face panel, not a membrane). */
const METAL_MIN_CONDUCTIVITY = 10;

type Page = (typeof SOURCE_PAGES)[number];

function citation(src: ChecklistSource, page: Page, field: string, proved?: string): ItemSource {
  const run = src.checkRun;
  const parts = [`revision ${src.assembly.revision}, ${page} page (${field})`];
  if (proved) parts.push(proved);
  if (run)
    parts.push(
      `check run ${run.id.slice(0, 8)}, sheet ${run.sheetCode.slice(0, 5)}-${run.sheetCode.slice(5)}`,
    );
  return {
    revision: src.assembly.revision,
    page,
    field,
    checkRunId: run?.id ?? null,
    sheetCode: run?.sheetCode ?? null,
    text: parts.join('; '),
  };
}

const looked = (
  base: Pick<GeneratedItem, 'kind' | 'group' | 'label' | 'designText' | 'source'>,
): GeneratedItem => ({ ...base, quantity: null, designValue: null, tolerance: null });

/** The wind design check per zone, or why it could not run. */
function windDesign(src: ChecklistSource): { zones: ZoneDesign[] } | { reason: string } {
  const built = windDesignInputFor(src.assembly.input, src.project);
  if (built.status === 'missing') return { reason: 'the wind check lacks data (see the attachment page)' };
  try {
    return { zones: runWind(built.input).design.zones };
  } catch (e) {
    if (e instanceof CalcInputError) return { reason: `the wind check refused ${e.field}: ${e.reason}` };
    throw e;
  }
}

/** A girt or clip spacing item of one wind zone: what the site may show and where the limit comes from. */
interface SpacingCheck {
  label: string;
  things: string;
  design: number;
  max: number;
  basis: string;
  path: string;
  verdict: string | undefined;
}

function attachmentItems(src: ChecklistSource): GeneratedItem[] {
  const a = src.assembly.input;
  const { girtSpacing, clipSpacing, clipType, fastenerType } = a.attachment;
  const design = windDesign(src);
  const items: GeneratedItem[] = [];
  for (const zone of windZonesOf(src.scope)) {
    const d = 'zones' in design ? design.zones.find((z) => z.zone === zone) : undefined;
    const unproved = 'reason' in design ? ` — not proved: ${design.reason}` : '';
    /** A spacing on site passes up to `max`; the design spacing is the item's value. */
    const spacingItem = (kind: 'girt_spacing' | 'clip_spacing', o: SpacingCheck) => {
      const source = citation(
        src,
        'attachment',
        o.path,
        d ? `wind design check, ${ZONE_WORDS[zone]}: ${o.verdict}` : undefined,
      );
      items.push({
        kind,
        group: 'attachment',
        label: `${o.label} — ${ZONE_WORDS[zone]}`,
        designText: `${o.things} at the design spacing or closer${unproved}`,
        quantity: 'shortLength',
        designValue: o.design,
        tolerance: { min: null, max: o.max, basis: o.basis },
        source,
      });
    };
    // Girts: a wider spacing than designed is not proved (the clip load grows with it), nor one above the schedule's.
    const girtMax = d?.maxGirtSpacing ?? null;
    const girtDesign = girtSpacing ?? girtMax;
    if (girtDesign !== null)
      spacingItem('girt_spacing', {
        label: 'Girt spacing',
        things: 'Girts',
        design: girtDesign,
        max: girtMax === null ? girtDesign : Math.min(girtDesign, girtMax),
        basis:
          girtMax !== null && girtMax < girtDesign
            ? 'the largest girt spacing the wind check proved for this zone (the design spacing exceeds it)'
            : 'the design girt spacing: a wider one is not proved (the panel span and the clip load grow with it)',
        path: girtSpacing === undefined ? 'windPanel.loadSpanTable' : 'attachment.girtSpacing',
        verdict: d?.girt,
      });
    // Clips: any spacing up to the largest the wind check proved at the design girt spacing.
    const clipMax = d?.maxClipAtDesignGirt ?? null;
    const clipDesign = clipSpacing ?? clipMax;
    if (clipDesign !== null)
      spacingItem('clip_spacing', {
        label: 'Clip spacing along the girt',
        things: 'Clips',
        design: clipDesign,
        max: clipMax ?? clipDesign,
        basis:
          clipMax === null
            ? 'the design clip spacing'
            : 'the largest clip spacing the wind check proved at the design girt spacing for this zone',
        path: clipSpacing === undefined ? 'windPanel.clip' : 'attachment.clipSpacing',
        verdict: d?.clip,
      });
  }
  items.push(
    looked({
      kind: 'clip_type',
      group: 'attachment',
      label: 'Clip type',
      designText: clipType || 'Clip as detailed',
      source: citation(src, 'attachment', 'attachment.clipType'),
    }),
    looked({
      kind: 'fastener_type',
      group: 'attachment',
      label: 'Fastener type',
      designText: fastenerType || 'Fastener as detailed',
      source: citation(src, 'attachment', 'attachment.fastenerType'),
    }),
  );
  const clip = a.windPanel?.clip;
  if (clip && 'fastenersPerClip' in clip)
    items.push({
      kind: 'fasteners_per_clip',
      group: 'attachment',
      label: 'Fasteners per clip',
      designText: 'Every fastener position of the clip filled',
      quantity: 'count',
      designValue: clip.fastenersPerClip,
      tolerance: {
        min: clip.fastenersPerClip,
        max: null,
        basis: 'the clip capacity counts this many fasteners',
      },
      source: citation(src, 'attachment', 'windPanel.clip.fastenersPerClip'),
    });
  return items;
}

function insulationItems(src: ChecklistSource): GeneratedItem[] {
  return src.assembly.input.thermal.layers.flatMap((layer, i): GeneratedItem[] => {
    if (layer.kind === 'homogeneous' && layer.conductivity <= INSULATION_MAX_CONDUCTIVITY)
      return [
        looked({
          kind: 'insulation_type',
          group: 'insulation',
          label: `Insulation type — ${layer.name}`,
          designText: layer.name,
          source: citation(src, 'build-up', `thermal.layers.${i}.name`),
        }),
        {
          kind: 'insulation_thickness',
          group: 'insulation',
          label: `Insulation thickness — ${layer.name}`,
          designText: 'Full thickness, boards tight, no gaps',
          quantity: 'shortLength',
          designValue: layer.thickness,
          tolerance: { min: layer.thickness, max: null, basis: 'the thickness the R-value was proved with' },
          source: citation(src, 'build-up', `thermal.layers.${i}.thickness`),
        },
      ];
    if (layer.kind === 'framed' && layer.sections.some((s) => s.conductivity <= INSULATION_MAX_CONDUCTIVITY))
      return [
        looked({
          kind: 'insulation_type',
          group: 'insulation',
          label: `Cavity insulation — ${layer.name}`,
          designText: layer.sections
            .filter((s) => s.conductivity <= INSULATION_MAX_CONDUCTIVITY)
            .map((s) => s.name)
            .join(', '),
          source: citation(src, 'build-up', `thermal.layers.${i}.sections`),
        }),
      ];
    return [];
  });
}

function jointItems(src: ChecklistSource): GeneratedItem[] {
  const joints = src.assembly.input.joints ?? [];
  if (joints.length === 0) return [];
  let results: JointResult[];
  try {
    results = calculateJointSchedule(joints).joints;
  } catch (e) {
    if (e instanceof CalcInputError) return [];
    throw e;
  }
  return results.flatMap((r, i): GeneratedItem[] => {
    const j = joints[i]!;
    const tol = j.constructionTolerance;
    const movementWidth = Math.max(r.widthForExtension, r.widthForCompression) - tol;
    const depth = j.designDepth ?? r.requiredDepth;
    const items: GeneratedItem[] = [
      {
        kind: 'joint_width',
        group: 'joints',
        label: `Joint width — ${j.name}`,
        designText: `Sealant movement class ${j.sealant.movementClass}`,
        quantity: 'shortLength',
        designValue: j.designWidth,
        tolerance:
          movementWidth > j.designWidth + tol
            ? {
                min: movementWidth,
                max: null,
                basis: 'the width the movement needs: the design width is narrower (see the joint schedule)',
              }
            : {
                min: Math.max(j.designWidth - tol, movementWidth),
                max: j.designWidth + tol,
                basis:
                  'the design width ± the construction tolerance, and no narrower than the movement needs',
              },
        source: citation(src, 'joints', `joints.${i}.designWidth`, `joint schedule: ${r.marginText}`),
      },
      {
        kind: 'sealant_depth',
        group: 'joints',
        label: `Sealant bead depth — ${j.name}`,
        designText: 'Bead tooled to the design depth (depth rule ASTM C1193)',
        quantity: 'shortLength',
        designValue: depth,
        tolerance: {
          min: MIN_SEALANT_DEPTH,
          max: Math.max(r.requiredDepth, depth),
          basis: 'at least 6 mm for the bond, no deeper than the depth rule (ASTM C1193)',
        },
        source: citation(
          src,
          'joints',
          j.designDepth === undefined ? `joints.${i}` : `joints.${i}.designDepth`,
        ),
      },
    ];
    const b = r.backer;
    items.push(
      b.kind === 'rod'
        ? {
            kind: 'backer_rod',
            group: 'joints',
            label: `Backer rod — ${j.name}`,
            designText: `${b.cell === 'closed_cell' ? 'Closed-cell' : 'Open-cell'} backer rod, compressed in the joint`,
            quantity: 'shortLength',
            designValue: null,
            tolerance: {
              min: b.minDiameter,
              max: b.maxDiameter,
              basis: 'the rod diameters the joint schedule gives for the design width',
            },
            source: citation(src, 'joints', `joints.${i}.backer`),
          }
        : looked({
            kind: 'backer_rod',
            group: 'joints',
            label: `Bond-breaker tape — ${j.name}`,
            designText: 'Bond-breaker tape the full joint width (the opening is too shallow for a rod)',
            source: citation(src, 'joints', `joints.${i}.openingDepth`),
          }),
    );
    return items;
  });
}

/** Beads of the takeoff on joint lines the joint schedule does not cover (openings, corners, base…). */
function beadItems(src: ChecklistSource): GeneratedItem[] {
  const a = src.assembly.input;
  const beads = a.takeoff?.beads;
  if (!beads) return [];
  const scheduled = new Set<string>((a.joints ?? []).map((j) => j.type));
  return Object.entries(beads).flatMap(([type, bead]): GeneratedItem[] => {
    if (!bead || scheduled.has(type)) return [];
    const size = bead.shape === 'round' ? bead.diameter : bead.shape === 'fillet' ? bead.leg : bead.width;
    const what = bead.shape === 'round' ? 'diameter' : bead.shape === 'fillet' ? 'fillet leg' : 'width';
    return [
      {
        kind: 'bead_size',
        group: 'joints',
        label: `Sealant bead ${what} — ${type.replace('_', ' ')} joints`,
        designText: `${bead.shape[0]!.toUpperCase()}${bead.shape.slice(1)} bead`,
        quantity: 'shortLength',
        designValue: size,
        tolerance: { min: size, max: null, basis: 'the bead size the sealant quantities were taken with' },
        source: citation(src, 'joints', `takeoff.beads.${type}`),
      },
    ];
  });
}

function barrierItems(src: ChecklistSource): GeneratedItem[] {
  const a = src.assembly.input;
  const tape = a.takeoff?.tape;
  return a.thermal.layers.flatMap((layer, i): GeneratedItem[] => {
    const thin =
      layer.kind !== 'air' && layer.kind !== 'framed' && (layer.thickness ?? 1) <= BARRIER_MAX_THICKNESS;
    const metal = layer.kind === 'homogeneous' && layer.conductivity >= METAL_MIN_CONDUCTIVITY;
    if (!thin || metal) return [];
    const at = citation(src, 'build-up', `thermal.layers.${i}`);
    return [
      looked({
        kind: 'barrier_laps',
        group: 'barrier',
        label: `Laps — ${layer.name}`,
        designText: 'Laps shingled (upper over lower) to the width detailed, no reverse laps',
        source: at,
      }),
      tape
        ? {
            kind: 'barrier_tape',
            group: 'barrier',
            label: `Tape at seams — ${layer.name}`,
            designText: 'Seams taped, tape rolled down, no wrinkles or fish-mouths',
            quantity: 'shortLength',
            designValue: tape.width,
            tolerance: { min: tape.width, max: null, basis: 'the tape width of the takeoff' },
            source: citation(src, 'joints', 'takeoff.tape.width'),
          }
        : looked({
            kind: 'barrier_tape',
            group: 'barrier',
            label: `Tape at seams — ${layer.name}`,
            designText: 'Seams taped, tape rolled down, no wrinkles or fish-mouths',
            source: at,
          }),
      looked({
        kind: 'barrier_corners',
        group: 'barrier',
        label: `Corners — ${layer.name}`,
        designText: 'Inside and outside corners lapped and sealed as detailed',
        source: at,
      }),
    ];
  });
}

/** The openings of the elevation in scope (matched by name), else of every wall of the takeoff. */
function openingsInScope(src: ChecklistSource): { names: string[]; windows: boolean } {
  const walls = src.assembly.input.takeoff?.walls ?? [];
  const named = walls.filter((w) => w.name.trim().toLowerCase() === src.scope.elevation.trim().toLowerCase());
  const openings = (named.length > 0 ? named : walls).flatMap((w) => w.openings);
  return {
    names: openings.map((o) => `${o.name ?? o.kind ?? 'window'}${o.count > 1 ? ` ×${o.count}` : ''}`),
    windows: openings.length === 0 || openings.some((o) => o.kind !== 'door'),
  };
}

function trimAndOpeningItems(src: ChecklistSource): GeneratedItem[] {
  const a = src.assembly.input;
  const trims = a.takeoff?.trims ?? [];
  const base = trims.findIndex((t) => t.appliesTo === 'base');
  const surround = trims.findIndex((t) => t.appliesTo === 'opening');
  const { names, windows } = openingsInScope(src);
  const openingWords = names.length > 0 ? ` (${names.join(', ')})` : '';
  const openingSource = citation(
    src,
    'joints',
    surround >= 0 ? `takeoff.trims.${surround}` : 'takeoff.walls',
  );
  const items: GeneratedItem[] = [
    looked({
      kind: 'base_trim',
      group: 'trim',
      label: 'Base trim at the bottom of the wall',
      designText: `${base >= 0 ? trims[base]!.name : 'Base trim'}: continuous, lapped, drained to the outside`,
      source: citation(src, 'joints', base >= 0 ? `takeoff.trims.${base}` : 'takeoff'),
    }),
  ];
  if (windows)
    items.push(
      looked({
        kind: 'sill_flashing',
        group: 'trim',
        label: 'Sill flashing',
        designText: `Sill flashing with end dams, sloped out, lapped over the barrier${openingWords}`,
        source: openingSource,
      }),
    );
  items.push(
    looked({
      kind: 'opening_head',
      group: 'openings',
      label: 'Opening heads',
      designText: `Head flashing lapped under the barrier above, sealed as detailed${openingWords}`,
      source: openingSource,
    }),
    looked({
      kind: 'opening_jamb',
      group: 'openings',
      label: 'Opening jambs',
      designText: `Jambs wrapped and sealed to the frame as detailed${openingWords}`,
      source: openingSource,
    }),
  );
  if (windows)
    items.push(
      looked({
        kind: 'opening_sill',
        group: 'openings',
        label: 'Opening sills',
        designText: `Sills sealed as detailed, weeps open${openingWords}`,
        source: openingSource,
      }),
    );
  return items;
}

function panelItems(src: ChecklistSource): GeneratedItem[] {
  const a = src.assembly.input;
  const fromWind = a.windPanel?.panelModuleWidth;
  const module = fromWind ?? a.takeoff?.module.width;
  const items: GeneratedItem[] = [];
  if (module !== undefined)
    items.push({
      kind: 'panel_module',
      group: 'panels',
      label: 'Panel module width',
      designText: 'Panels of the design module',
      quantity: 'shortLength',
      designValue: module,
      tolerance: {
        min: null,
        max: module,
        basis:
          fromWind === undefined
            ? 'the module of the takeoff'
            : 'the tributary width the wind check used: a wider module is not proved',
      },
      source: citation(
        src,
        fromWind === undefined ? 'joints' : 'attachment',
        fromWind === undefined ? 'takeoff.module.width' : 'windPanel.panelModuleWidth',
      ),
    });
  items.push(
    looked({
      kind: 'joint_alignment',
      group: 'panels',
      label: 'Panel joint alignment',
      designText: 'Joints straight, in line and at even width across the elevation',
      source: citation(src, 'joints', a.takeoff ? 'takeoff.module' : 'joints'),
    }),
  );
  return items;
}

function firmItems(src: ChecklistSource): GeneratedItem[] {
  const t = src.template;
  if (!t) return [];
  return t.items.map((item, i) =>
    looked({
      kind: 'firm',
      group: item.group,
      label: item.label,
      designText: item.designText || item.label,
      source: {
        revision: src.assembly.revision,
        page: 'firm-template',
        field: `items.${i}`,
        checkRunId: null,
        sheetCode: null,
        text: `firm checklist template, version ${t.version}`,
      },
    }),
  );
}

/** The checklist of an inspection, in walking order: attachment, insulation, barrier, joints, trim, openings, panels, firm. */
export function generateChecklist(src: ChecklistSource): GeneratedItem[] {
  return [
    ...attachmentItems(src),
    ...insulationItems(src),
    ...barrierItems(src),
    ...jointItems(src),
    ...beadItems(src),
    ...trimAndOpeningItems(src),
    ...panelItems(src),
    ...firmItems(src),
  ];
}
