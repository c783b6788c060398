import type { AuditEntry } from '@shared/schemas/me';
import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { AuditLog } from './AuditLog';

const entry = (e: Partial<AuditEntry>): AuditEntry => ({
  id: 1,
  at: '2026-12-04T10:00:00.000Z',
  actorName: 'Marguerite Oyelaran',
  entity: 'submittal',
  entityId: '0b0e7b7e-2f55-4c4e-9d2a-3f4a1e0c9b11',
  entityName: 'S-003 rev 1 — Façade panels',
  action: 'decide',
  before: null,
  after: { status: 'under_review', decision: 'approved_as_noted', note: 'see mark-ups' },
  ...e,
});

const show = (entries: AuditEntry[]) =>
  render(
    <MemoryRouter>
      <UnitSystemProvider value="SI">
        <AuditLog projectId="p1" entries={entries} />
      </UnitSystemProvider>
    </MemoryRouter>,
  );

describe('the activity log', () => {
  it('words each entry and links its object by name, never by raw key or id', () => {
    show([
      entry({}),
      entry({
        id: 2,
        entity: 'submittal',
        action: 'add_sheet',
        after: { item: 'a1b2', checkRun: 'c3d4', assembly: 'Wall A', verificationCode: 'ABCDE-FGHIJ' },
      }),
      entry({ id: 3, entity: 'assembly', entityId: 'a9', entityName: null, action: 'revise', after: {} }),
      entry({
        id: 4,
        entity: 'assembly',
        entityId: 'b7',
        entityName: 'Wall A (copy)',
        action: 'create',
        after: {
          name: 'Wall A (copy)',
          copiedFrom: { assembly: 'Wall A', project: 'Corvid Lane', revision: 3 },
        },
      }),
    ]);
    const decided = screen.getByText(/Decided submittal/).closest('td')!;
    expect(decided.textContent).toBe('Decided submittal S-003 rev 1 — Façade panels: approved as noted');
    const link = screen.getAllByRole('link', { name: 'S-003 rev 1 — Façade panels' })[0]!;
    expect(link.getAttribute('href')).toBe('/projects/p1/submittals/0b0e7b7e-2f55-4c4e-9d2a-3f4a1e0c9b11');
    expect(screen.getByText(/Saved a new revision of assembly/).textContent).toContain('(no longer there)');
    expect(screen.getByText(/Created assembly/).closest('tr')!.textContent).toContain('Copied from: —');
    expect(screen.getByText('Wall A in Corvid Lane rev 3')).toBeTruthy();
    const text = document.body.textContent ?? '';
    expect(text).not.toMatch(/submittal: decide|add_sheet|0b0e7b7e|a1b2|c3d4/);
  });

  it('a saved sweep reads in words: saved with what it ran on and found, deleted with its name', () => {
    show([
      entry({
        id: 5,
        entity: 'sweep',
        entityId: 's1',
        entityName: 'Insulation × clips',
        action: 'create',
        after: {
          name: 'Insulation × clips',
          assembly: 'Wall A',
          revision: 3,
          criteriaSet: 'Demo code table',
          version: 2,
          variants: 15,
          passing: 6,
        },
      }),
      entry({
        id: 6,
        entity: 'sweep',
        entityId: 's2',
        entityName: null,
        action: 'delete',
        before: { name: 'Old sweep' },
        after: null,
      }),
    ]);
    const saved = screen.getByText(/Saved the sweep/).closest('tr')!;
    expect(saved.textContent).toContain('Saved the sweep Insulation × clips');
    for (const line of [
      'Assembly: —',
      'Code table: —',
      'Code table version: —',
      'Variants: —',
      'Passing variants: —',
    ])
      expect(saved.textContent).toContain(line);
    expect(saved.textContent).not.toMatch(/criteriaSet|passing:/);
    expect(screen.getByText(/Deleted the sweep/).textContent).toBe(
      'Deleted the sweep “Old sweep” (no longer there)',
    );
  });
});
