import { type InspectionTemplate, TEMPLATE_MAX_ITEMS } from '@shared/inspections/schema';
import { TEXT_MAX } from '@shared/schemas/common';
import { describe, expect, it } from 'vitest';
import { blankTemplateDraft, fromTemplateDrafts, toTemplateDrafts } from './template-draft';

const template: InspectionTemplate = {
  id: '00000000-0000-4000-8000-000000000001',
  organisationId: '00000000-0000-4000-8000-000000000002',
  version: 2,
  items: [
    { group: 'firm', label: 'Site left clean, offcuts removed', designText: '' },
    { group: 'trim', label: 'Drip edge at every floor line', designText: 'as detailed' },
  ],
  frozen: true,
  revision: 1,
  createdAt: '2026-12-01T00:00:00.000Z',
};

describe('firm checklist template drafts', () => {
  it('saves the items as read, trimmed, keeping their groups', () => {
    const drafts = toTemplateDrafts(template);
    drafts[0] = { ...drafts[0]!, label: '  Site left clean, offcuts removed  ' };
    expect(fromTemplateDrafts(drafts)).toEqual({ ok: true, items: template.items });
    expect(toTemplateDrafts(null)).toEqual([]);
    expect(fromTemplateDrafts([])).toEqual({ ok: true, items: [] });
  });

  it('a new item is a firm item and needs a name', () => {
    const blank = blankTemplateDraft();
    expect(blank.group).toBe('firm');
    const result = fromTemplateDrafts([blank]);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[blank.key]?.label).toBe('Name the item.');
  });

  it('refuses two items of the same name (case and spaces aside), naming the second', () => {
    const [a, b] = toTemplateDrafts(template);
    const twin = { ...b!, label: ' SITE LEFT CLEAN, offcuts removed' };
    const result = fromTemplateDrafts([a!, twin]);
    expect(result).toEqual({ ok: false, errors: { [twin.key]: { label: 'Another item has this name.' } } });
  });

  it('holds the server’s length limits, field by field', () => {
    const d = {
      ...blankTemplateDraft(),
      label: 'x'.repeat(TEXT_MAX.name + 1),
      designText: 'y'.repeat(TEXT_MAX.line + 1),
    };
    const result = fromTemplateDrafts([d]);
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.errors[d.key]).toEqual({
        label: `At most ${TEXT_MAX.name} characters.`,
        designText: `At most ${TEXT_MAX.line} characters.`,
      });
  });

  it('refuses more items than a template holds, saying how many to remove', () => {
    expect(TEMPLATE_MAX_ITEMS).toBe(100);
    const many = Array.from({ length: TEMPLATE_MAX_ITEMS + 2 }, (_, n) => ({
      ...blankTemplateDraft(),
      label: `Item ${n + 1}`,
    }));
    const result = fromTemplateDrafts(many);
    expect(result).toEqual({
      ok: false,
      errors: {},
      message: `A template holds at most ${TEMPLATE_MAX_ITEMS} items; remove 2.`,
    });
  });
});
