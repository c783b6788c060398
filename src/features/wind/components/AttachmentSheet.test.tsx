import type { Assembly } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { cleanup, render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoAssembly, demoProject } from '../test-fixtures';
import { AttachmentSheet } from './AttachmentSheet';

afterEach(cleanup);

const project = (role: Project['myRole']): Project => ({
  ...demoProject(),
  id: '00000000-0000-4000-8000-000000000001',
  organisationId: '00000000-0000-4000-8000-000000000002',
  organisationName: 'Test firm',
  name: 'Test project',
  number: '',
  description: '',
  siteAddress: '',
  climateZone: '5A',
  elevationM: 150,
  archivedAt: null,
  version: 1,
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  myRole: role,
});

const assembly = (): Assembly => ({
  id: '00000000-0000-4000-8000-000000000003',
  projectId: '00000000-0000-4000-8000-000000000001',
  name: 'Demo wall',
  wallCategory: 'metal_building',
  revision: 1,
  version: 1,
  updatedAt: '2026-01-01T00:00:00.000Z',
  Ueff: null,
  Reff: null,
  current: {
    revision: 1,
    note: '',
    input: demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 }),
    thermalResult: null,
    engineVersion: '0.1.0',
    createdBy: 'Test',
    createdAt: '2026-01-01T00:00:00.000Z',
  },
});

describe('the attachment sheet for a role that only reads', () => {
  it('computes the schedule from the saved inputs and offers no editing', () => {
    render(
      <MemoryRouter>
        <AttachmentSheet
          project={project('viewer')}
          assembly={assembly()}
          save={vi.fn()}
          conflictOf={() => null}
          onLoadTheirs={vi.fn()}
          errorText={String}
        />
      </MemoryRouter>,
    );
    expect(screen.getByTestId('status-zone-4').textContent).toMatch(/meets/);
    expect(screen.getByTestId('status-zone-5').textContent).toMatch(/meets/);
    const girt = screen.getByLabelText(/Design girt spacing/) as HTMLInputElement;
    expect(girt.disabled).toBe(true);
    expect(girt.value).toBe('1.2');
    expect(screen.queryByRole('button', { name: /Save as revision/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add a row' })).toBeNull();
    expect(screen.getByText(/shows the attachment inputs read-only/)).toBeTruthy();
    expect(
      screen.getByText(/Girts, their connections and the backup structure are not checked here/),
    ).toBeTruthy();
    expect(document.body.textContent).not.toContain('NaN');
  });
});
