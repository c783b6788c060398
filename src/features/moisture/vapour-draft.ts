import { layerSd } from '@shared/calc/moisture/assembly';
import { DELTA_0 } from '@shared/calc/moisture/glaser';
import { type Vapour, vapourSchema } from '@shared/calc/moisture/schema';
import { findMaterial } from '@shared/calc/thermal/materials';
import type { Layer } from '@shared/calc/thermal/schema';
import { PERM_0C_TO_SI, PERM_23C_TO_SI } from '@shared/units';
import { formatNumber } from '../../lib/quantities';

/*
 * What the vapour table holds while someone types: per layer the kind of vapour data, the text in the box
 * and (for US perms) the reference temperature. Read into the shared `Vapour` type, or a reason in words
 * that is shown next to the box — never a NaN.
 */

export type VapourKind = Vapour['kind'];
export type DraftKind = VapourKind | 'none';

export interface VapourDraft {
  kind: DraftKind;
  text: string;
  reference: '23C' | '0C';
}

export const KIND_LABELS: Record<DraftKind, string> = {
  none: 'Not entered',
  mu: 'μ — resistance factor',
  sd: 's_d — equivalent air layer',
  permeance: 'Permeance, SI',
  usPerm: 'Permeance, US perms',
};

/** The unit of the number typed for each kind (shown beside the box and in its label). */
export const KIND_UNITS: Record<VapourKind, string> = {
  mu: '–',
  sd: 'm',
  permeance: 'ng/(Pa·s·m²)',
  usPerm: 'perm',
};

/** The symbol read out with the box's label. */
export const KIND_SYMBOLS: Record<VapourKind, string> = {
  mu: 'μ',
  sd: 's_d',
  permeance: 'W',
  usPerm: 'perm',
};

/** The box's accessible name for each kind: "μ of layer 7 (…)", "Permeance of layer 3 (…), in US perms". */
export function valueLabel(kind: VapourKind, layer: string): string {
  switch (kind) {
    case 'mu':
      return `μ of ${layer}`;
    case 'sd':
      return `s_d of ${layer}, in m`;
    case 'permeance':
      return `Permeance W of ${layer}, in ng/(Pa·s·m²)`;
    case 'usPerm':
      return `Permeance of ${layer}, in US perms`;
  }
}

/** The engine's field name for each kind (`layers.3.vapour.mu`). */
export const KIND_FIELD: Record<VapourKind, string> = {
  mu: 'mu',
  sd: 'sd',
  permeance: 'permeance',
  usPerm: 'perm',
};

const numberText = (n: number) => {
  // Keep what was stored exactly, but never as 1e-7-style noise for ordinary values.
  const plain = String(n);
  return /e/i.test(plain) ? formatNumber(n, 10) || plain : plain;
};

/** The draft of a stored value (null → not entered). */
export function draftOf(v: Vapour | null | undefined): VapourDraft {
  if (!v) return { kind: 'none', text: '', reference: '23C' };
  switch (v.kind) {
    case 'mu':
      return { kind: 'mu', text: numberText(v.mu), reference: '23C' };
    case 'sd':
      return { kind: 'sd', text: numberText(v.sd), reference: '23C' };
    case 'permeance':
      return { kind: 'permeance', text: numberText(v.permeance), reference: '23C' };
    case 'usPerm':
      return { kind: 'usPerm', text: numberText(v.perm), reference: v.reference };
  }
}

export type DraftReading = { vapour: Vapour | null; error?: undefined } | { vapour: null; error: string };

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/** Bounds of each kind from the shared schema, worded for the person. */
function rangeMessage(kind: VapourKind, code: string, bound: number): string {
  const unit = KIND_UNITS[kind];
  const shown = `${formatNumber(bound, 6) || String(bound)}${unit === '–' ? '' : `\u202f${unit}`}`;
  if (code === 'too_small')
    return kind === 'mu'
      ? `μ must be at least 1 — still air; no layer is more open to vapour than air.`
      : `Must be at least ${shown}.`;
  return `Must be at most ${shown}.`;
}

/** Read one row: a valid `Vapour`, `null` when nothing is entered, or the reason in words. */
export function readDraft(d: VapourDraft): DraftReading {
  if (d.kind === 'none') return { vapour: null };
  const t = d.text.trim().replace(/\u2212/g, '-');
  if (t === '') return { vapour: null, error: `Enter ${KIND_SYMBOLS[d.kind]}, or choose “Not entered”.` };
  if (!NUMBER.test(t))
    return { vapour: null, error: `Enter a number (for example 12.5); “${d.text.trim()}” is not one.` };
  const n = Number(t);
  const candidate =
    d.kind === 'mu'
      ? { kind: 'mu' as const, mu: n }
      : d.kind === 'sd'
        ? { kind: 'sd' as const, sd: n }
        : d.kind === 'permeance'
          ? { kind: 'permeance' as const, permeance: n }
          : { kind: 'usPerm' as const, perm: n, reference: d.reference };
  const parsed = vapourSchema.safeParse(candidate);
  if (parsed.success) return { vapour: parsed.data };
  const issue = parsed.error.issues[0] as
    | { code?: string; minimum?: number | bigint; maximum?: number | bigint; message?: string }
    | undefined;
  if (issue?.code === 'too_small' && issue.minimum !== undefined)
    return { vapour: null, error: rangeMessage(d.kind, 'too_small', Number(issue.minimum)) };
  if (issue?.code === 'too_big' && issue.maximum !== undefined)
    return { vapour: null, error: rangeMessage(d.kind, 'too_big', Number(issue.maximum)) };
  return { vapour: null, error: 'Not accepted.' };
}

/** Read every row: the vapour list (aligned with the layers) and the rows that cannot be read. */
export function readDrafts(drafts: readonly VapourDraft[]): {
  vapour: (Vapour | null)[];
  errors: Record<number, string>;
} {
  const vapour: (Vapour | null)[] = [];
  const errors: Record<number, string> = {};
  drafts.forEach((d, i) => {
    const r = readDraft(d);
    vapour.push(r.vapour);
    if (r.error) errors[i] = r.error;
  });
  return { vapour, errors };
}

/** The drafts of an assembly's stored vapour list, one per layer (missing entries → not entered). */
export const draftsFor = (layers: readonly Layer[], vapour: readonly (Vapour | null)[] | undefined) =>
  layers.map((_, i) => draftOf(vapour?.[i] ?? null));

/** Two vapour lists hold the same values (null and a missing entry are the same). */
export function sameVapour(
  a: readonly (Vapour | null)[] | undefined,
  b: readonly (Vapour | null)[] | undefined,
  length: number,
): boolean {
  for (let i = 0; i < length; i++)
    if (JSON.stringify(a?.[i] ?? null) !== JSON.stringify(b?.[i] ?? null)) return false;
  return true;
}

export interface LibraryMu {
  materialName: string;
  source: string;
  /** Dry-cup and wet-cup μ; null = the table lists the material as vapour-tight (μ = ∞). */
  dry: number | null;
  wet: number | null;
}

/** The generic library's μ for a layer that names a library material (data/reference/materials.json). */
export function libraryMu(layer: Layer): LibraryMu | null {
  if (layer.kind !== 'homogeneous' || !layer.materialId) return null;
  const m = findMaterial(layer.materialId);
  if (!m) return null;
  return {
    materialName: m.name,
    source: m.source,
    dry: m.mu.dry,
    wet: m.mu.wet,
  };
}

/** The layer's thickness in m, undefined for a declared-resistance layer (it has none). */
export const layerThickness = (layer: Layer): number | undefined =>
  layer.kind === 'resistance' ? undefined : layer.thickness;

/** Four significant figures, as typed text ("0.0696", "15", "1.5e-7" never: plain decimals). */
const fourFigures = (n: number) => {
  const v = Number(n.toPrecision(4));
  return /e/i.test(String(v)) ? formatNumber(v, 12) || String(v) : String(v);
};

/**
 * The row with another kind of vapour data chosen: the number is re-expressed so that the layer keeps its
 * s_d (μ = s_d/d, W = δ₀/s_d, perms = W/perm size); it is cleared when that cannot be done (nothing valid
 * typed yet, or μ for a layer without a thickness).
 */
export function switchKind(d: VapourDraft, kind: DraftKind, thickness: number | undefined): VapourDraft {
  if (kind === d.kind) return d;
  if (kind === 'none') return { ...d, kind, text: '' };
  const reading = readDraft(d);
  let sd: number | null = null;
  if (reading.vapour) {
    try {
      sd = layerSd(reading.vapour, thickness, 'v');
    } catch {
      sd = null;
    }
  }
  const next = { ...d, kind };
  if (sd === null || !(sd > 0)) return { ...next, text: '' };
  switch (kind) {
    case 'mu':
      return thickness ? { ...next, text: fourFigures(sd / thickness) } : { ...next, text: '' };
    case 'sd':
      return { ...next, text: fourFigures(sd) };
    case 'permeance':
      return { ...next, text: fourFigures((DELTA_0 / sd) * 1e12) };
    case 'usPerm':
      return {
        ...next,
        text: fourFigures(DELTA_0 / sd / (d.reference === '0C' ? PERM_0C_TO_SI : PERM_23C_TO_SI)),
      };
  }
}
