import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { M, M2, M3, PCS } from '@shared/calc/trace-units';
import { engineMessage, type TakeoffNote } from '@shared/format/message-schema';
import { INCH } from '@shared/units';
import {
  type BeadProfile,
  type PanelModule,
  TAKEOFF_JOINT_TYPES,
  type TakeoffInput,
  type TakeoffJointType,
  type TakeoffResult,
  type Wall,
} from './schema';

/*
 * Material takeoff of a panelised wall from an elevation list. Joint lines are measured per wall from the
 * panel module; sealant = Σ length × bead cross-section, packaged into cartridges and sausages; tape,
 * lapped trim pieces and fasteners on a girt grid. Pure geometry: every line is "derived" and its formula
 * is in the trace. Opening positions are not part of the input, so panel joints are measured gross through
 * openings and only fasteners certainly inside an opening are deducted (see `notes`).
 */

const SRC_GEOMETRY = 'Elevation geometry (derived)';
const SRC_BEAD = 'Plane geometry: round πd²/4, triangular fillet leg²/2, rectangular W·D';
const SRC_WASTE = 'Waste allowance as entered (derived)';
const SRC_PACKAGE =
  'NIST Handbook 44, Appendix C: 1 US gallon = 231 in³ exactly = 128 US fl oz → 1 US fl oz = 231/128 in³';
const SRC_TRIM = 'Lapped stock lengths: n pieces cover n·S − (n − 1)·l (derived)';
const SRC_FASTENER = 'Girt grid (derived): (⌊L/s_f⌋ + 1)·(⌊H/s_g⌋ + 1) less points certainly inside openings';

/** Relative slack so that a run of exactly n modules (to rounding) needs n, not n + 1. */
const EPS = 1e-9;

/**
 * Most pieces (packages, trim pieces, rolls, fasteners) on one takeoff line. A billion is beyond any real
 * project, and keeps every count an exact whole number (below 2⁵³).
 */
export const MAX_PIECES = 1e9;

/** 1 US fluid ounce = 231/128 in³ = 29.573 529 562 5 ml exactly, in m³ (NIST Handbook 44 App. C). */
export const US_FLUID_OUNCE = (231 / 128) * INCH ** 3;

/** Package sizes, m³: cartridges 10.1 US fl oz and 300 ml, sausages 20 US fl oz and 600 ml. */
export const PACKAGES = {
  cartridgeUsFlOz10_1: 10.1 * US_FLUID_OUNCE,
  cartridgeMl300: 300e-6,
  sausageUsFlOz20: 20 * US_FLUID_OUNCE,
  sausageMl600: 600e-6,
} as const;

// ------------------------------------------------------------------------------------------ formulas

/** Whole units for a quantity (never −0); a quantity within 1e-9 of a whole number takes that number. */
export const wholeUnits = (x: number): number => Math.max(0, Math.ceil(x - EPS));

/** Panels needed to cover a run: ⌈run/module⌉, at least 1. */
export const modulesToCover = (run: number, module: number): number => Math.max(1, wholeUnits(run / module));

/** Bead cross-section A: round πd²/4, triangular fillet leg²/2, rectangular W·D. */
export function beadCrossSection(bead: BeadProfile): number {
  switch (bead.shape) {
    case 'round':
      return (Math.PI * bead.diameter * bead.diameter) / 4;
    case 'fillet':
      return (bead.leg * bead.leg) / 2;
    case 'rectangular':
      return bead.width * bead.depth;
  }
}

/** Stock pieces to cover a run R with stock S lapped l: 1 when R ≤ S, else ⌈(R − l)/(S − l)⌉. */
export function trimPieces(run: number, stock: number, lap: number): number {
  if (run <= 0) return 0;
  return run <= stock * (1 + EPS) ? 1 : wholeUnits((run - lap) / (stock - lap));
}

/** Girt lines from the base at s_g up to the top, fasteners from end to end at s_f. */
export const fastenerGrid = (length: number, height: number, sf: number, sg: number): number =>
  (Math.floor(length / sf + EPS) + 1) * (Math.floor(height / sg + EPS) + 1);

/** Grid points inside a w × h opening wherever it sits: (⌈w/s_f⌉ − 1)·(⌈h/s_g⌉ − 1). */
export const fastenersInsideOpening = (w: number, h: number, sf: number, sg: number): number =>
  Math.max(0, wholeUnits(w / sf) - 1) * Math.max(0, wholeUnits(h / sg) - 1);

/** Refuse a count above MAX_PIECES: the input that drives it (`field`) is a slip of units, not a project. */
function requireCount(n: number, field: string, what: string, check: string): number {
  if (!(n <= MAX_PIECES))
    throw new CalcInputError(
      field,
      `${what}: ${n.toPrecision(3)} is more than ${MAX_PIECES.toExponential()} pieces on one line — check ${check}`,
    );
  return n;
}

// -------------------------------------------------------------------------------------------- runs

/** A continuous joint line repeated `count` times. */
interface Run {
  joint: TakeoffJointType;
  length: number;
  count: number;
}

interface WallRuns {
  runs: Run[];
  trace: TraceStep[];
}

/** Every joint line of one wall, with one trace step per joint type. */
function wallRuns(wall: Wall, panel: PanelModule, i: number): WallRuns {
  const { length: L, height: H } = wall;
  const vertical = panel.orientation === 'vertical';
  const along = vertical ? panel.width : panel.length;
  const up = vertical ? panel.length : panel.width;
  const columns = modulesToCover(L, along);
  const rows = modulesToCover(H, up);
  const corners = wall.corners ?? 0;
  const abutments = wall.abutments ?? 0;
  let doorWidth = 0;
  const openingRuns: Run[] = [];
  for (const o of wall.openings) {
    const door = o.kind === 'door';
    if (door) doorWidth += o.width * o.count;
    openingRuns.push(
      { joint: 'opening', length: o.width, count: (door ? 1 : 2) * o.count },
      { joint: 'opening', length: o.height, count: 2 * o.count },
    );
  }
  const base = L - doorWidth;
  const runs: Run[] = [
    { joint: 'panel_vertical', length: H, count: columns - 1 },
    { joint: 'panel_horizontal', length: L, count: rows - 1 },
    { joint: 'perimeter', length: L, count: 1 },
    { joint: 'perimeter', length: H, count: abutments },
    ...openingRuns,
    { joint: 'corner', length: H, count: corners },
    { joint: 'base', length: base, count: base > 0 ? 1 : 0 },
  ];
  const id = (s: string) => `walls.${i}.${s}`;
  const label = (s: string) => `${wall.name}: ${s}`;
  const total = (joint: TakeoffJointType) =>
    runs.reduce((sum, r) => (r.joint === joint ? sum + r.length * r.count : sum), 0);
  // The two panel joint lines: (⌈across/s⌉ − 1) lines, each as long as the other side of the wall.
  const sides = { L, H };
  const panelJoints = (
    [
      ['panel_vertical', 'vertical', 'L', 'H', along, vertical ? 'module width' : 'panel length'],
      ['panel_horizontal', 'horizontal', 'H', 'L', up, vertical ? 'panel length' : 'module width'],
    ] as const
  ).map(([joint, words, across, run, s, module]) =>
    step(
      id(joint),
      label(`${words} panel joints`),
      `(⌈${across}/s⌉ − 1)·${run}, s = ${module}`,
      SRC_GEOMETRY,
      { [across]: v(sides[across], M), s: v(s, M), [run]: v(sides[run], M) },
      total(joint),
      M,
      'Measured gross through openings',
    ),
  );
  const trace = [
    ...panelJoints,
    step(
      id('perimeter'),
      label('perimeter joints (head and abutting ends)'),
      'L + n_abut·H',
      SRC_GEOMETRY,
      { L: v(L, M), n_abut: v(abutments, PCS), H: v(H, M) },
      total('perimeter'),
      M,
    ),
    step(
      id('opening'),
      label('opening perimeters'),
      'Σ n·(2w + 2h) for windows, Σ n·(w + 2h) for doors',
      SRC_GEOMETRY,
      { openings: v(wall.openings.length, PCS) },
      total('opening'),
      M,
    ),
    step(
      id('corner'),
      label('corners'),
      'n_corner·H',
      SRC_GEOMETRY,
      { n_corner: v(corners, PCS), H: v(H, M) },
      total('corner'),
      M,
    ),
    step(
      id('base'),
      label('base'),
      'L − Σ n·w_door',
      SRC_GEOMETRY,
      { L: v(L, M), 'Σ n·w_door': v(doorWidth, M) },
      total('base'),
      M,
    ),
  ];
  return { runs, trace };
}

// ---------------------------------------------------------------------------------------- validation

function validateWall(wall: Wall, i: number): void {
  const p = `walls.${i}`;
  requirePositive(wall.length, `${p}.length`, 'wall length');
  requirePositive(wall.height, `${p}.height`, 'wall height');
  const ends = (wall.corners ?? 0) + (wall.abutments ?? 0);
  for (const key of ['corners', 'abutments'] as const) {
    const n = wall[key] ?? 0;
    if (!Number.isInteger(n) || n < 0 || n > 2)
      throw new CalcInputError(`${p}.${key}`, `must be a whole number from 0 to 2 (got ${n})`);
  }
  if (ends > 2)
    throw new CalcInputError(`${p}.abutments`, 'a wall has two ends: corners + abutments is at most 2');
  let area = 0;
  let doors = 0;
  wall.openings.forEach((o, j) => {
    const q = `${p}.openings.${j}`;
    requirePositive(o.width, `${q}.width`, 'opening width');
    requirePositive(o.height, `${q}.height`, 'opening height');
    if (!Number.isInteger(o.count) || o.count < 1)
      throw new CalcInputError(`${q}.count`, `must be a whole number of 1 or more (got ${o.count})`);
    if (o.width > wall.length)
      throw new CalcInputError(
        `${q}.width`,
        `the opening (${o.width} m) is wider than the wall (${wall.length} m)`,
      );
    if (o.height > wall.height)
      throw new CalcInputError(
        `${q}.height`,
        `the opening (${o.height} m) is taller than the wall (${wall.height} m)`,
      );
    area += o.count * o.width * o.height;
    if (o.kind === 'door') doors += o.count * o.width;
  });
  if (area > wall.length * wall.height)
    throw new CalcInputError(`${p}.openings`, 'the openings cover more than the wall area');
  if (doors > wall.length)
    throw new CalcInputError(`${p}.openings`, 'the doors are wider in total than the wall');
}

function validateBead(bead: BeadProfile, path: string): void {
  switch (bead.shape) {
    case 'round':
      requirePositive(bead.diameter, `${path}.diameter`, 'bead diameter');
      return;
    case 'fillet':
      requirePositive(bead.leg, `${path}.leg`, 'fillet leg');
      return;
    case 'rectangular':
      requirePositive(bead.width, `${path}.width`, 'joint width');
      requirePositive(bead.depth, `${path}.depth`, 'sealant depth');
      return;
    default:
      throw new CalcInputError(`${path}.shape`, 'must be round, fillet or rectangular');
  }
}

function validate(input: TakeoffInput): void {
  if (input.walls.length === 0) throw new CalcInputError('walls', 'needs at least one wall');
  input.walls.forEach(validateWall);
  requirePositive(input.module.width, 'module.width', 'module width');
  requirePositive(input.module.length, 'module.length', 'panel length');
  if (input.module.orientation !== 'vertical' && input.module.orientation !== 'horizontal')
    throw new CalcInputError('module.orientation', 'must be vertical or horizontal');
  for (const t of TAKEOFF_JOINT_TYPES) {
    const bead = input.beads[t];
    if (bead !== undefined) validateBead(bead, `beads.${t}`);
  }
  requireInRange(input.wasteFactor, 0, 1, 'wasteFactor', 'waste factor');
  input.trims.forEach((t, k) => {
    requirePositive(t.stockLength, `trims.${k}.stockLength`, 'stock length');
    requireNonNegative(t.lapAllowance, `trims.${k}.lapAllowance`, 'lap allowance');
    if (t.lapAllowance >= t.stockLength)
      throw new CalcInputError(`trims.${k}.lapAllowance`, 'the lap must be shorter than the stock length');
  });
  if (input.fasteners) {
    requirePositive(input.fasteners.spacingAlongGirt, 'fasteners.spacingAlongGirt', 'fastener spacing');
    requirePositive(input.fasteners.girtSpacing, 'fasteners.girtSpacing', 'girt spacing');
  }
  if (input.tape) {
    requirePositive(input.tape.width, 'tape.width', 'tape width');
    if (input.tape.appliesTo.length === 0)
      throw new CalcInputError('tape.appliesTo', 'name at least one joint line for the tape');
    if (input.tape.rollLength !== undefined)
      requirePositive(input.tape.rollLength, 'tape.rollLength', 'roll length');
  }
}

// --------------------------------------------------------------------------------------- calculation

const typeLabel: Record<TakeoffJointType, string> = {
  panel_vertical: 'Vertical panel joints',
  panel_horizontal: 'Horizontal panel joints',
  perimeter: 'Perimeter joints',
  opening: 'Opening perimeters',
  corner: 'Corners',
  base: 'Base',
};

const beadFormula: Record<BeadProfile['shape'], string> = {
  round: 'V = L·πd²/4',
  fillet: 'V = L·leg²/2',
  rectangular: 'V = L·W·D',
};

function beadInputs(bead: BeadProfile): TraceStep['inputs'] {
  switch (bead.shape) {
    case 'round':
      return { d: v(bead.diameter, M) };
    case 'fillet':
      return { leg: v(bead.leg, M) };
    case 'rectangular':
      return { W: v(bead.width, M), D: v(bead.depth, M) };
  }
}

/** Joint lengths, sealant, tape, trim pieces and fasteners for an elevation list. */
export function calculateTakeoff(input: TakeoffInput): TakeoffResult {
  validate(input);
  const trace: TraceStep[] = [];
  const lines: TraceStep[] = [];
  const runs: Run[] = [];
  input.walls.forEach((wall, i) => {
    const w = wallRuns(wall, input.module, i);
    runs.push(...w.runs);
    trace.push(...w.trace);
  });

  const lengths = Object.fromEntries(TAKEOFF_JOINT_TYPES.map((t) => [t, 0])) as Record<
    TakeoffJointType,
    number
  >;
  for (const r of runs) lengths[r.joint] += r.length * r.count;
  for (const t of TAKEOFF_JOINT_TYPES)
    lines.push(step(`takeoff.length.${t}`, typeLabel[t], 'Σ over walls', SRC_GEOMETRY, {}, lengths[t], M));

  const waste = input.wasteFactor;
  const byJoint = TAKEOFF_JOINT_TYPES.flatMap((joint) => {
    const bead = input.beads[joint];
    if (bead === undefined) return [];
    const crossSection = beadCrossSection(bead);
    const volume = lengths[joint] * crossSection;
    lines.push(
      step(
        `takeoff.sealant.${joint}`,
        `Sealant, ${typeLabel[joint].toLowerCase()} (${bead.shape} bead)`,
        beadFormula[bead.shape],
        SRC_BEAD,
        { L: v(lengths[joint], M), ...beadInputs(bead) },
        volume,
        M3,
      ),
    );
    return [{ joint, length: lengths[joint], crossSection, volume }];
  });
  const volume = byJoint.reduce((sum, b) => sum + b.volume, 0);
  const volumeWithWaste = volume * (1 + waste);
  lines.push(
    step(
      'takeoff.sealant.volumeWithWaste',
      'Sealant volume with waste',
      'V_w = ΣV·(1 + waste)',
      SRC_WASTE,
      { ΣV: v(volume, M3), waste: v(waste, '1') },
      volumeWithWaste,
      M3,
    ),
  );
  const packages = [
    ['cartridgeUsFlOz10_1', 'Cartridges, 10.1 US fl oz', 'n = ⌈V_w / (10.1 × 231/128 in³)⌉'],
    ['cartridgeMl300', 'Cartridges, 300 ml', 'n = ⌈V_w / 300 ml⌉'],
    ['sausageUsFlOz20', 'Sausages, 20 US fl oz', 'n = ⌈V_w / (20 × 231/128 in³)⌉'],
    ['sausageMl600', 'Sausages, 600 ml', 'n = ⌈V_w / 600 ml⌉'],
  ] as const;
  const largest = byJoint.reduce<(typeof byJoint)[number] | undefined>(
    (a, b) => (a === undefined || b.volume > a.volume ? b : a),
    undefined,
  );
  const counts = packages.map(([key, label, formula]) => {
    const n = requireCount(
      wholeUnits(volumeWithWaste / PACKAGES[key]),
      `beads.${largest?.joint ?? 'panel_vertical'}`,
      label,
      'the bead size and the wall dimensions',
    );
    lines.push(
      step(
        `takeoff.sealant.${key}`,
        label,
        formula,
        SRC_PACKAGE,
        { V_w: v(volumeWithWaste, M3), package: v(PACKAGES[key], M3) },
        n,
        PCS,
      ),
    );
    return n;
  });

  let tape: TakeoffResult['tape'] = null;
  if (input.tape) {
    const types = [...new Set(input.tape.appliesTo)];
    const net = types.reduce((sum, t) => sum + lengths[t], 0);
    const length = net * (1 + waste);
    const area = length * input.tape.width;
    const rolls =
      input.tape.rollLength === undefined
        ? null
        : requireCount(
            wholeUnits(length / input.tape.rollLength),
            'tape.rollLength',
            'Tape rolls',
            'the roll length',
          );
    lines.push(
      step(
        'takeoff.tape.length',
        `Tape (${types.map((t) => typeLabel[t].toLowerCase()).join(', ')})`,
        'L_tape = ΣL·(1 + waste)',
        SRC_WASTE,
        { ΣL: v(net, M), waste: v(waste, '1') },
        length,
        M,
      ),
      step(
        'takeoff.tape.area',
        'Tape area',
        'A = L_tape·b',
        SRC_GEOMETRY,
        { L_tape: v(length, M), b: v(input.tape.width, M) },
        area,
        M2,
      ),
    );
    if (rolls !== null)
      lines.push(
        step(
          'takeoff.tape.rolls',
          'Tape rolls',
          'n = ⌈L_tape / roll⌉',
          SRC_GEOMETRY,
          { L_tape: v(length, M), roll: v(input.tape.rollLength!, M) },
          rolls,
          PCS,
        ),
      );
    tape = { length, area, rolls };
  }

  const trims = input.trims.map((t, k) => {
    let pieces = 0;
    let length = 0;
    let runCount = 0;
    for (const r of runs)
      if (r.joint === t.appliesTo && r.count > 0) {
        pieces += r.count * trimPieces(r.length, t.stockLength, t.lapAllowance);
        length += r.count * r.length;
        runCount += r.count;
      }
    requireCount(
      pieces,
      `trims.${k}.${t.lapAllowance > t.stockLength / 2 ? 'lapAllowance' : 'stockLength'}`,
      `Trim pieces (${t.name})`,
      `the stock length (${t.stockLength} m) and the lap (${t.lapAllowance} m): each piece adds only ${(t.stockLength - t.lapAllowance).toPrecision(3)} m`,
    );
    lines.push(
      step(
        `takeoff.trim.${k}`,
        `Trim: ${t.name} (${typeLabel[t.appliesTo].toLowerCase()})`,
        'Σ per run: 1 if R ≤ S, else ⌈(R − l)/(S − l)⌉',
        SRC_TRIM,
        { runs: v(runCount, PCS), ΣR: v(length, M), S: v(t.stockLength, M), l: v(t.lapAllowance, M) },
        pieces,
        PCS,
      ),
    );
    return { name: t.name, appliesTo: t.appliesTo, runs: runCount, length, pieces };
  });

  let fasteners: number | null = null;
  if (input.fasteners) {
    const { spacingAlongGirt: sf, girtSpacing: sg } = input.fasteners;
    fasteners = 0;
    for (const wall of input.walls) {
      fasteners += fastenerGrid(wall.length, wall.height, sf, sg);
      for (const o of wall.openings) fasteners -= o.count * fastenersInsideOpening(o.width, o.height, sf, sg);
    }
    requireCount(
      fasteners,
      'fasteners.spacingAlongGirt',
      'Fasteners',
      `the fastener spacing (${sf} m) and the girt spacing (${sg} m)`,
    );
    lines.push(
      step(
        'takeoff.fasteners',
        'Fasteners',
        'Σ walls (⌊L/s_f⌋ + 1)(⌊H/s_g⌋ + 1) − Σ n(⌈w/s_f⌉ − 1)(⌈h/s_g⌉ − 1)',
        SRC_FASTENER,
        { s_f: v(sf, M), s_g: v(sg, M) },
        fasteners,
        PCS,
      ),
    );
  }

  const notes: TakeoffNote[] = [
    engineMessage('joints_gross_through_openings', '', {}),
    engineMessage('waste_on_sealant_and_tape', '', {}),
  ];
  if (input.walls.some((w) => w.openings.some((o) => o.kind === 'door')))
    notes.push(engineMessage('base_net_of_doors', 'walls', {}));
  if (input.fasteners) notes.push(engineMessage('fasteners_counted_on_girt_lines', 'fasteners', {}));

  return {
    lengths,
    sealant: {
      byJoint,
      volume,
      volumeWithWaste,
      cartridges: { usFlOz10_1: counts[0]!, ml300: counts[1]! },
      sausages: { usFlOz20: counts[2]!, ml600: counts[3]! },
    },
    tape,
    trims,
    fasteners,
    lines,
    trace: [...trace, ...lines],
    notes,
  };
}
