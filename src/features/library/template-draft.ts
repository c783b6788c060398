import {
  type InspectionTemplate,
  TEMPLATE_MAX_ITEMS,
  type TemplateItem,
  templateItemSchema,
} from '@shared/inspections/schema';

/** An item of the firm's checklist template while it is edited; `key` only tells the rows apart. */
export interface TemplateDraft {
  key: string;
  group: TemplateItem['group'];
  label: string;
  designText: string;
}

export type TemplateDraftField = 'label' | 'designText';
export type TemplateDraftErrors = Record<string, Partial<Record<TemplateDraftField, string>>>;

let counter = 0;
const nextKey = () => `template-${++counter}`;

export const toTemplateDrafts = (template: InspectionTemplate | null): TemplateDraft[] =>
  (template?.items ?? []).map((i) => ({ key: nextKey(), ...i }));

export const blankTemplateDraft = (): TemplateDraft => ({
  key: nextKey(),
  group: 'firm',
  label: '',
  designText: '',
});

const sentence = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * The items to save, or every problem by row and field (nothing is saved then): each item needs a name
 * (checked by the shared item schema, so the limits are the server's), and no two items share one — a
 * checklist with two alike would be answered twice or not at all.
 */
export function fromTemplateDrafts(
  drafts: readonly TemplateDraft[],
): { ok: true; items: TemplateItem[] } | { ok: false; errors: TemplateDraftErrors; message?: string } {
  const errors: TemplateDraftErrors = {};
  const items: TemplateItem[] = [];
  const seen = new Set<string>();
  for (const d of drafts) {
    const parsed = templateItemSchema.safeParse({ group: d.group, label: d.label, designText: d.designText });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = issue.path[0];
        if (field === 'label' || field === 'designText')
          errors[d.key] = { ...errors[d.key], [field]: `${sentence(issue.message)}.` };
      }
      continue;
    }
    const name = parsed.data.label.toLocaleLowerCase();
    if (seen.has(name)) errors[d.key] = { label: 'Another item has this name.' };
    seen.add(name);
    items.push(parsed.data);
  }
  const message =
    drafts.length > TEMPLATE_MAX_ITEMS
      ? `A template holds at most ${TEMPLATE_MAX_ITEMS} items; remove ${drafts.length - TEMPLATE_MAX_ITEMS}.`
      : undefined;
  return Object.keys(errors).length > 0 || message ? { ok: false, errors, message } : { ok: true, items };
}
