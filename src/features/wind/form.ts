import { clipByFastenersSchema, clipByRatingSchema, type SpanCondition } from '@shared/calc/wind/schema';
import { type AssemblyInput, windPanelSchema } from '@shared/schemas/assembly';
import type { z } from 'zod';

/*
 * What the attachment sheet's form holds. Numbers are SI; NaN while a box is empty or unreadable, and null for an
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
  };
}

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
  };
}

/** The panel schema with the clip branch the person chose, so errors name that branch's fields only. */
export const panelSchemaFor = (kind: ClipKind) =>
  windPanelSchema.extend({ clip: kind === 'rating' ? clipByRatingSchema : clipByFastenersSchema });

/** The saved assembly with this sheet's fields put in (everything else as it was). */
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
