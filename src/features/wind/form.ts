import type { ValueSource } from '@shared/calc/source';
import { clipByFastenersSchema, clipByRatingSchema, type SpanCondition } from '@shared/calc/wind/schema';
import { type AssemblyInput, windPanelSchema } from '@shared/schemas/assembly';
import type { AttachmentProductInput, ClipProduct, PanelProduct } from '@shared/schemas/attachment-library';
import type { z } from 'zod';

/*
 * What the attachment page's form holds. Numbers are SI; NaN while a box is empty or unreadable, and null for an
 * optional box deliberately left empty (the engine's default applies).
 */

export interface LoadSpanRowValues {
  span: number;
  allowableInward: number;
  allowableOutward: number;
  allowableDeflectionPressure: number;
}

export type ClipKind = 'rating' | 'fasteners';

export interface AttachmentFormValues {
  /** Design girt spacing (panel span), m; null = not chosen yet. */
  girtSpacing: number | null;
  /** Design clip spacing along a girt, m; null = not chosen yet. */
  clipSpacing: number | null;
  spanCondition: SpanCondition | '';
  deflectionLimit: string;
  /** The table has the optional deflection column (for every row, or for none). */
  hasDeflection: boolean;
  rows: LoadSpanRowValues[];
  clipKind: ClipKind;
  allowableLoad: number;
  fastenerCapacity: number;
  fastenersPerClip: number;
  panelModuleWidth: number;
  continuityFactor: number | null;
  deflectionWindFactor: number | null;
  /** Where the load–span table came from (data sheet, test report); the firm library entry it was taken from. */
  tableSource: string;
  tableProductId: string | null;
  /** Where the clip capacity came from; the firm library entry it was taken from. */
  clipSource: string;
  clipProductId: string | null;
}

export type WindPanel = z.infer<typeof windPanelSchema>;

export const blankRow = (): LoadSpanRowValues => ({
  span: Number.NaN,
  allowableInward: Number.NaN,
  allowableOutward: Number.NaN,
  allowableDeflectionPressure: Number.NaN,
});

/** The form's starting values from a saved assembly (a blank two-row table when it has no panel data yet). */
export function attachmentFormValues(input: AssemblyInput): AttachmentFormValues {
  const panel = input.windPanel;
  const clip = panel?.clip;
  const rows = panel?.loadSpanTable.rows ?? [];
  return {
    girtSpacing: input.attachment.girtSpacing ?? null,
    clipSpacing: input.attachment.clipSpacing ?? null,
    spanCondition: panel?.loadSpanTable.spanCondition ?? '',
    deflectionLimit: panel?.loadSpanTable.deflectionLimit ?? 'L/180',
    hasDeflection: panel ? rows.every((r) => r.allowableDeflectionPressure !== undefined) : true,
    rows:
      rows.length > 0
        ? rows.map((r) => ({
            span: r.span,
            allowableInward: r.allowableInward,
            allowableOutward: r.allowableOutward,
            allowableDeflectionPressure: r.allowableDeflectionPressure ?? Number.NaN,
          }))
        : [blankRow(), blankRow()],
    clipKind: clip && 'fastenerCapacity' in clip ? 'fasteners' : 'rating',
    allowableLoad: clip && 'allowableLoad' in clip ? clip.allowableLoad : Number.NaN,
    fastenerCapacity: clip && 'fastenerCapacity' in clip ? clip.fastenerCapacity : Number.NaN,
    fastenersPerClip: clip && 'fastenersPerClip' in clip ? clip.fastenersPerClip : Number.NaN,
    panelModuleWidth: panel?.panelModuleWidth ?? Number.NaN,
    continuityFactor: panel?.continuityFactor ?? null,
    deflectionWindFactor: panel?.deflectionWindFactor ?? null,
    tableSource: panel?.sources?.loadSpanTable?.text ?? '',
    tableProductId: panel?.sources?.loadSpanTable?.libraryEntryId ?? null,
    clipSource: panel?.sources?.clip?.text ?? '',
    clipProductId: panel?.sources?.clip?.libraryEntryId ?? null,
  };
}

/** The form's values with a library panel's table (and module width, where the entry gives one) put in. */
export function withPanelProduct(v: AttachmentFormValues, p: PanelProduct): AttachmentFormValues {
  const rows = p.loadSpanTable.rows;
  const hasDeflection = rows.every((r) => r.allowableDeflectionPressure !== undefined);
  return {
    ...v,
    spanCondition: p.loadSpanTable.spanCondition,
    deflectionLimit: p.loadSpanTable.deflectionLimit,
    hasDeflection,
    rows: rows.map((r) => ({
      ...r,
      allowableDeflectionPressure: r.allowableDeflectionPressure ?? Number.NaN,
    })),
    panelModuleWidth: p.panelModuleWidth ?? v.panelModuleWidth,
    tableSource: p.source,
    tableProductId: p.id,
  };
}

/** The form's values with a library clip's capacity put in. */
export function withClipProduct(v: AttachmentFormValues, p: ClipProduct): AttachmentFormValues {
  const byRating = 'allowableLoad' in p.clip;
  return {
    ...v,
    clipKind: byRating ? 'rating' : 'fasteners',
    allowableLoad: 'allowableLoad' in p.clip ? p.clip.allowableLoad : v.allowableLoad,
    fastenerCapacity: 'fastenerCapacity' in p.clip ? p.clip.fastenerCapacity : v.fastenerCapacity,
    fastenersPerClip: 'fastenersPerClip' in p.clip ? p.clip.fastenersPerClip : v.fastenersPerClip,
    clipSource: p.source,
    clipProductId: p.id,
  };
}

/**
 * The table or the clip as a new firm library entry (not yet validated: the server and the schema say what
 * is missing). `name` is the product's name as the person typed it.
 */
export function libraryEntryFrom(
  v: AttachmentFormValues,
  kind: 'panel' | 'clip',
  name: string,
): Record<string, unknown> & Pick<AttachmentProductInput, 'kind'> {
  const candidate = panelCandidate(v);
  return kind === 'panel'
    ? {
        kind,
        name,
        source: v.tableSource,
        loadSpanTable: candidate.loadSpanTable,
        ...(Number.isFinite(v.panelModuleWidth) ? { panelModuleWidth: v.panelModuleWidth } : {}),
      }
    : { kind, name, source: v.clipSource, clip: candidate.clip };
}

const sourceOf = (text: string, libraryEntryId: string | null): ValueSource | undefined =>
  text.trim() === '' ? undefined : { text: text.trim(), ...(libraryEntryId ? { libraryEntryId } : {}) };

const blank = (v: number | null | undefined) => v == null || Number.isNaN(v);

/** True when nothing of the panel has been entered (the missing-data list then names the whole panel). */
export function panelIsBlank(v: AttachmentFormValues): boolean {
  const numbers = [
    ...v.rows.flatMap((r) => [r.span, r.allowableInward, r.allowableOutward]),
    v.clipKind === 'rating' ? v.allowableLoad : v.fastenerCapacity,
    v.panelModuleWidth,
  ];
  return numbers.every(blank);
}

/** The panel as the shared schema wants it (not yet validated): the chosen clip form, the deflection column or none. */
export function panelCandidate(v: AttachmentFormValues): Record<string, unknown> {
  return {
    loadSpanTable: {
      spanCondition: v.spanCondition === '' ? undefined : v.spanCondition,
      deflectionLimit: v.deflectionLimit.trim(),
      rows: v.rows.map((r) => ({
        span: r.span,
        allowableInward: r.allowableInward,
        allowableOutward: r.allowableOutward,
        ...(v.hasDeflection ? { allowableDeflectionPressure: r.allowableDeflectionPressure } : {}),
      })),
    },
    clip:
      v.clipKind === 'rating'
        ? { allowableLoad: v.allowableLoad }
        : { fastenerCapacity: v.fastenerCapacity, fastenersPerClip: v.fastenersPerClip },
    panelModuleWidth: v.panelModuleWidth,
    ...(v.continuityFactor === null ? {} : { continuityFactor: v.continuityFactor }),
    ...(v.deflectionWindFactor === null ? {} : { deflectionWindFactor: v.deflectionWindFactor }),
    designLevel: 'ASD',
    ...sourcesOf(v),
  };
}

/** `sources` of the saved panel, only for what has a source. */
function sourcesOf(v: AttachmentFormValues): { sources?: Record<string, ValueSource> } {
  const table = sourceOf(v.tableSource, v.tableProductId);
  const clip = sourceOf(v.clipSource, v.clipProductId);
  return table || clip
    ? { sources: { ...(table ? { loadSpanTable: table } : {}), ...(clip ? { clip } : {}) } }
    : {};
}

/** The panel schema with the clip branch the person chose, so errors name that branch's fields only. */
export const panelSchemaFor = (kind: ClipKind) =>
  windPanelSchema.extend({ clip: kind === 'rating' ? clipByRatingSchema : clipByFastenersSchema });

/** The saved assembly with this page's fields put in (everything else as it was). */
export function withAttachment(
  base: AssemblyInput,
  panel: WindPanel | undefined,
  design: { girtSpacing?: number; clipSpacing?: number },
): AssemblyInput {
  const { girtSpacing: _g, clipSpacing: _c, ...attachment } = base.attachment;
  return {
    ...base,
    attachment: {
      ...attachment,
      ...(design.girtSpacing === undefined ? {} : { girtSpacing: design.girtSpacing }),
      ...(design.clipSpacing === undefined ? {} : { clipSpacing: design.clipSpacing }),
    },
    windPanel: panel,
  };
}

/** A form path's element id (the missing-data list and the error list link to it). */
export const windFieldId = (path: string) => `wind-${path.replace(/\./g, '-')}`;

/** Where an error path of the panel schema or the engine (`panel.loadSpanTable.rows.2.span`) sits in the form. */
export function toFormPath(path: string): string {
  const p = path.replace(/^panel\./, '').replace(/^windPanel\./, '');
  if (p.startsWith('loadSpanTable.')) return p.slice('loadSpanTable.'.length);
  if (p.startsWith('clip.')) return p.slice('clip.'.length);
  return p;
}
