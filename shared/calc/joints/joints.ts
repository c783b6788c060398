import { CalcInputError, requireNonNegative, requirePositive } from '@shared/calc/errors';
import { step, type TraceStep, v } from '@shared/calc/trace';
import { K, M, ONE, PCT, PER_K } from '@shared/calc/trace-units';
import { engineMessage, type JointWarning } from '@shared/format/message-schema';
import { INCH } from '@shared/units';
import { findExpansionMaterial } from './expansion';
import type {
  Backer,
  BackerCell,
  InstallationTemperature,
  JointInput,
  JointResult,
  JointScheduleResult,
  JointSide,
  MovementClass,
  TemperatureRange,
} from './schema';

/*
 * Sealant joint sizing, SI throughout (m, °C, 1/K).
 * Movement: ΔL = α·L·ΔT per moving side, split at the installation temperature (ASTM C1472 approach):
 * the joint opens while the panels cool from the warmest installation temperature to the coldest surface
 * temperature, and closes while they warm from the coolest installation temperature to the hottest.
 * Width: W = (100/X)·movement + tolerance (ASTM C1193 approach, as taught in university course notes),
 * checked separately in extension and compression with the ASTM C920 class capabilities, the larger
 * governing, never below the minimum practical width.
 * Depth: ASTM C1193 (sealant depth equal to the width for joints ¼–½ in wide, ½ in for wider joints).
 * Class capabilities: ASTM C920. Backer rod sizing, the minimum width and the review of very wide joints:
 * common practice (the tests name the published sources they were checked against).
 */

const SRC_THERMAL = 'ASTM C1472 approach: ΔL = α·L·ΔT from surface temperatures, split at installation';
const SRC_WIDTH = 'ASTM C1193 approach: W = (100/X)·movement + tolerance; X per ASTM C920 class';
const SRC_DEPTH = 'ASTM C1193, sealant joint depth: D = W for ¼–½ in joints, ½ in for wider joints';
const SRC_BACKER =
  'Common practice: closed-cell rod 25–33 % wider than the joint, open-cell 40–50 % (ASTM C1193 sealant backing)';
const SRC_TAPE =
  'Kubal, Construction Waterproofing Handbook ch. 5, backing tape cut to the joint width — trade practice';

/** ASTM C920 movement capability X in extension and compression, % of joint width. */
export const MOVEMENT_CAPABILITY: Readonly<
  Record<MovementClass, { readonly extension: number; readonly compression: number }>
> = {
  '12.5': { extension: 12.5, compression: 12.5 },
  '25': { extension: 25, compression: 25 },
  '35': { extension: 35, compression: 35 },
  '50': { extension: 50, compression: 50 },
  '100/50': { extension: 100, compression: 50 },
};

/** Smallest joint a gun and tool can fill, 6 mm ≈ ¼ in — common practice. */
export const DEFAULT_MINIMUM_WIDTH = 0.006;
/** Deepest sealant bead, ½ in: reached at a ½ in wide joint and kept for wider ones (ASTM C1193). */
export const MAX_SEALANT_DEPTH = 0.5 * INCH;
/** Smallest bond depth, 6 mm ≈ ¼ in — common practice for the bond to the substrate. */
export const MIN_SEALANT_DEPTH = 0.006;
/** A joint wider than 2 in goes to the sealant maker for review — common practice. */
export const MAX_WIDTH_WITHOUT_REVIEW = 2 * INCH;
/** Rod diameter ÷ joint width: closed-cell 1.25–1.33, open-cell 1.40–1.50 — common practice. */
export const ROD_OVERSIZE: Readonly<Record<BackerCell, { readonly min: number; readonly max: number }>> = {
  closed_cell: { min: 1.25, max: 1.33 },
  open_cell: { min: 1.4, max: 1.5 },
};

// ------------------------------------------------------------------------------------------ formulas

/** ΔL = α·L·ΔT (linear thermal movement). */
export const thermalMovement = (alpha: number, length: number, deltaT: number): number =>
  alpha * length * deltaT;

/** W = (100/X)·movement + tolerance (ASTM C1193 approach). */
export const widthForMovement = (movement: number, capabilityPercent: number, tolerance: number): number =>
  (100 / capabilityPercent) * movement + tolerance;

/**
 * D = min(W, ½ in): as deep as wide up to ½ in, ½ in for wider joints (ASTM C1193). Continuous and never
 * falling as the width grows, so the bead W·D grows with the width too (the earlier 2:1 step halved the
 * depth at ½ in).
 */
export const sealantDepth = (width: number): number => Math.min(width, MAX_SEALANT_DEPTH);

/** Rod diameters for a joint width, or bond-breaker tape when the opening is too shallow for the rod. */
export function backerFor(width: number, depth: number, cell: BackerCell, openingDepth?: number): Backer {
  const k = ROD_OVERSIZE[cell];
  const minDiameter = k.min * width;
  if (openingDepth !== undefined && openingDepth < depth + minDiameter)
    return { kind: 'bond_breaker_tape', width };
  return { kind: 'rod', cell, minDiameter, maxDiameter: k.max * width };
}

/** "meets — margin 12 %" or "short by 3.2 mm". */
export function marginText(designWidth: number, requiredWidth: number): string {
  return designWidth >= requiredWidth
    ? `meets — margin ${Math.round(((designWidth - requiredWidth) / requiredWidth) * 100)} %`
    : `short by ${((requiredWidth - designWidth) * 1000).toFixed(1)} mm`;
}

// ---------------------------------------------------------------------------------------- validation

interface ResolvedSide {
  label: string;
  alpha: number;
  length: number;
  /** True when α came from the generic table rather than the user's entry. */
  generic: boolean;
}

function resolveSide(side: JointSide, path: string): ResolvedSide {
  requirePositive(side.length, `${path}.length`, 'moving length L');
  if ('material' in side) {
    const row = findExpansionMaterial(side.material);
    if (row === undefined)
      throw new CalcInputError(
        `${path}.material`,
        `unknown material "${side.material}" — pick a row of the expansion table or enter a custom α`,
      );
    return { label: row.name, alpha: row.alpha, length: side.length, generic: true };
  }
  requirePositive(side.alpha, `${path}.alpha`, 'coefficient of thermal expansion α');
  return { label: side.label ?? 'custom α', alpha: side.alpha, length: side.length, generic: false };
}

function installationRange(t: InstallationTemperature, path: string): TemperatureRange {
  const range = typeof t === 'number' ? { min: t, max: t } : t;
  if (!Number.isFinite(range.min) || !Number.isFinite(range.max) || range.min > range.max)
    throw new CalcInputError(path, 'the installation range needs a finite min no higher than its max');
  return range;
}

function validateSurface(range: TemperatureRange, path: string): void {
  if (!Number.isFinite(range.min) || !Number.isFinite(range.max))
    throw new CalcInputError(path, 'surface temperatures must be finite numbers');
  if (range.min >= range.max)
    throw new CalcInputError(
      path,
      `the lowest surface temperature (${range.min} °C) must be below the highest (${range.max} °C)`,
    );
}

// --------------------------------------------------------------------------------------- calculation

/** Size one joint; `path` prefixes the field paths of any CalcInputError (e.g. `joints.3`). */
export function calculateJoint(joint: JointInput, path = 'joint'): JointResult {
  if (joint.sides.length < 1 || joint.sides.length > 2)
    throw new CalcInputError(`${path}.sides`, 'a joint has one or two moving sides');
  const capability = MOVEMENT_CAPABILITY[joint.sealant.movementClass];
  if (capability === undefined)
    throw new CalcInputError(
      `${path}.sealant.movementClass`,
      'must be an ASTM C920 class: 12.5, 25, 35, 50 or 100/50',
    );
  requirePositive(joint.designWidth, `${path}.designWidth`, 'design width');
  if (joint.designDepth !== undefined)
    requirePositive(joint.designDepth, `${path}.designDepth`, 'design depth');
  const tolerance = requireNonNegative(
    joint.constructionTolerance,
    `${path}.constructionTolerance`,
    'construction tolerance',
  );
  const minimumWidth = requirePositive(
    joint.minimumPracticalWidth ?? DEFAULT_MINIMUM_WIDTH,
    `${path}.minimumPracticalWidth`,
    'minimum practical width',
  );
  const other = joint.otherMovement ?? { extension: 0, compression: 0 };
  requireNonNegative(other.extension, `${path}.otherMovement.extension`, 'other extension');
  requireNonNegative(other.compression, `${path}.otherMovement.compression`, 'other compression');
  if (joint.openingDepth !== undefined)
    requirePositive(joint.openingDepth, `${path}.openingDepth`, 'opening depth');

  const surface = joint.surfaceTemperatureRange;
  validateSurface(surface, `${path}.surfaceTemperatureRange`);
  const install = installationRange(joint.installationTemperature, `${path}.installationTemperature`);
  if (install.min < surface.min || install.max > surface.max)
    throw new CalcInputError(
      `${path}.installationTemperature`,
      `installation (${install.min}–${install.max} °C) must lie within the surface range (${surface.min}–${surface.max} °C)`,
    );
  const sides = joint.sides.map((s, k) => resolveSide(s, `${path}.sides.${k}`));

  const trace: TraceStep[] = [];
  const warnings: JointWarning[] = [];
  const id = (s: string) => `${path}.${s}`;
  const deltaTExtension = install.max - surface.min;
  const deltaTCompression = surface.max - install.min;

  const sideResults = sides.map((s, k) => {
    const [extension, compression] = (
      [
        ['extension', 'opening', 'ΔL_ext = α·L·(T_install,max − T_surface,min)', deltaTExtension],
        ['compression', 'closing', 'ΔL_comp = α·L·(T_surface,max − T_install,min)', deltaTCompression],
      ] as const
    ).map(([part, words, formula, deltaT]) => {
      const movement = thermalMovement(s.alpha, s.length, deltaT);
      trace.push(
        step(
          id(`side.${k}.${part}`),
          `Side ${k + 1} (${s.label}): thermal ${words}`,
          formula,
          SRC_THERMAL,
          { α: v(s.alpha, PER_K), L: v(s.length, M), ΔT: v(deltaT, K) },
          movement,
          M,
        ),
      );
      return movement;
    });
    if (s.generic && !warnings.some((w) => w.code === 'expansion_generic' && w.values.side === s.label))
      warnings.push(engineMessage('expansion_generic', `${path}.sides.${k}`, { side: s.label }));
    return { label: s.label, alpha: s.alpha, length: s.length, extension, compression };
  });

  let movementExtension = other.extension;
  let movementCompression = other.compression;
  for (const s of sideResults) {
    movementExtension += s.extension;
    movementCompression += s.compression;
  }
  const widthForExtension = widthForMovement(movementExtension, capability.extension, tolerance);
  const widthForCompression = widthForMovement(movementCompression, capability.compression, tolerance);
  const movementWidth = Math.max(widthForExtension, widthForCompression);
  const requiredWidth = Math.max(movementWidth, minimumWidth);
  const governing =
    minimumWidth > movementWidth
      ? 'minimum'
      : widthForExtension >= widthForCompression
        ? 'extension'
        : 'compression';
  trace.push(
    step(
      id('movementExtension'),
      'Total opening movement',
      'M_ext = ΣΔL_ext + other extension',
      SRC_THERMAL,
      { ΣΔL_ext: v(movementExtension - other.extension, M), other: v(other.extension, M) },
      movementExtension,
      M,
    ),
    step(
      id('movementCompression'),
      'Total closing movement',
      'M_comp = ΣΔL_comp + other compression',
      SRC_THERMAL,
      { ΣΔL_comp: v(movementCompression - other.compression, M), other: v(other.compression, M) },
      movementCompression,
      M,
    ),
    step(
      id('widthForExtension'),
      'Width needed in extension',
      'W_ext = (100/X_ext)·M_ext + t',
      SRC_WIDTH,
      { X_ext: v(capability.extension, PCT), M_ext: v(movementExtension, M), t: v(tolerance, M) },
      widthForExtension,
      M,
    ),
    step(
      id('widthForCompression'),
      'Width needed in compression',
      'W_comp = (100/X_comp)·M_comp + t',
      SRC_WIDTH,
      { X_comp: v(capability.compression, PCT), M_comp: v(movementCompression, M), t: v(tolerance, M) },
      widthForCompression,
      M,
    ),
    step(
      id('requiredWidth'),
      'Required joint width',
      'W = max(W_ext, W_comp, W_min)',
      SRC_WIDTH,
      { W_ext: v(widthForExtension, M), W_comp: v(widthForCompression, M), W_min: v(minimumWidth, M) },
      requiredWidth,
      M,
      governing === 'minimum'
        ? 'The minimum practical width governs (6 mm ≈ ¼ in by default — common trade practice)'
        : undefined,
    ),
  );

  const width = joint.designWidth;
  const requiredDepth = sealantDepth(width);
  trace.push(
    step(
      id('requiredDepth'),
      'Sealant depth for the design width',
      'D = min(W, ½ in)',
      SRC_DEPTH,
      { W: v(width, M) },
      requiredDepth,
      M,
      'The sealant maker’s own depth for its product governs where it differs',
    ),
  );
  if (joint.designDepth !== undefined && joint.designDepth > requiredDepth * (1 + 1e-9))
    warnings.push(
      engineMessage('depth_over_rule', `${path}.designDepth`, {
        designDepth: joint.designDepth,
        requiredDepth,
      }),
    );
  if (joint.designDepth !== undefined && joint.designDepth < MIN_SEALANT_DEPTH)
    warnings.push(
      engineMessage('depth_below_bond', `${path}.designDepth`, {
        designDepth: joint.designDepth,
        minimum: MIN_SEALANT_DEPTH,
      }),
    );
  if (width > MAX_WIDTH_WITHOUT_REVIEW)
    warnings.push(
      engineMessage('joint_over_wide', `${path}.designWidth`, { width, limit: MAX_WIDTH_WITHOUT_REVIEW }),
    );

  const backer = backerFor(width, requiredDepth, joint.backer ?? 'closed_cell', joint.openingDepth);
  if (backer.kind === 'rod')
    trace.push(
      step(
        id('backer'),
        `Backer rod, ${backer.cell === 'closed_cell' ? 'closed' : 'open'}-cell`,
        `d = ${ROD_OVERSIZE[backer.cell].min}–${ROD_OVERSIZE[backer.cell].max} × W`,
        SRC_BACKER,
        { W: v(width, M) },
        backer.minDiameter,
        M,
        `Rod diameter ${(backer.minDiameter * 1000).toFixed(1)}–${(backer.maxDiameter * 1000).toFixed(1)} mm${joint.openingDepth === undefined ? '; opening depth not given — check that the rod fits behind the sealant' : ''}`,
      ),
    );
  else
    trace.push(
      step(
        id('backer'),
        'Bond-breaker tape (the opening is too shallow for a rod)',
        'tape width = W; rod needs opening depth ≥ D + 1.25·W',
        SRC_TAPE,
        { W: v(width, M), D: v(requiredDepth, M), 'opening depth': v(joint.openingDepth!, M) },
        backer.width,
        M,
      ),
    );
  if (joint.openingDepth !== undefined && joint.openingDepth < requiredDepth)
    warnings.push(
      engineMessage('opening_shallow', `${path}.openingDepth`, {
        openingDepth: joint.openingDepth,
        requiredDepth,
      }),
    );

  const margin = (width - requiredWidth) / requiredWidth;
  const verdict = width >= requiredWidth ? 'pass' : 'fail';
  const text = marginText(width, requiredWidth);
  trace.push(
    step(
      id('margin'),
      'Design width against required width',
      'margin = (W_design − W_required)/W_required',
      SRC_WIDTH,
      { W_design: v(width, M), W_required: v(requiredWidth, M) },
      margin,
      ONE,
      text,
    ),
  );

  return {
    name: joint.name,
    type: joint.type,
    sides: sideResults,
    deltaTExtension,
    deltaTCompression,
    movementExtension,
    movementCompression,
    widthForExtension,
    widthForCompression,
    requiredWidth,
    governing,
    designWidth: width,
    requiredDepth,
    backer,
    verdict,
    margin,
    marginText: text,
    warnings,
    trace,
  };
}

/** Size every joint of a schedule; error paths read `joints.<i>.<field>`. */
export function calculateJointSchedule(joints: readonly JointInput[]): JointScheduleResult {
  if (joints.length === 0) throw new CalcInputError('joints', 'needs at least one joint');
  const results = joints.map((j, i) => calculateJoint(j, `joints.${i}`));
  const passCount = results.filter((r) => r.verdict === 'pass').length;
  return { joints: results, passCount, failCount: results.length - passCount };
}
