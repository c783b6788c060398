import type { ProjectRole } from '@shared/auth/permissions';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import { projectKeys } from '../../lib/query-keys';
import { sampleProject } from '../../lib/revision-test-fixtures';
import { UnitSystemProvider } from '../../lib/unit-system';
import { ProjectOverviewPage } from './ProjectOverviewPage';

afterEach(cleanup);

const { id } = sampleProject;
const base = sampleProject;

function renderOverview(myRole: ProjectRole, system: 'SI' | 'IP' = 'SI') {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Number.POSITIVE_INFINITY } } });
  qc.setQueryData(projectKeys.detail(id), { ...base, myRole });
  const router = createMemoryRouter([{ path: '/projects/:projectId', element: <ProjectOverviewPage /> }], {
    initialEntries: [`/projects/${id}`],
  });
  return render(
    <QueryClientProvider client={qc}>
      <UnitSystemProvider value={system}>
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

describe('Project overview permissions', () => {
  it('shows editing and archiving to the owner', async () => {
    renderOverview('owner');
    expect(await screen.findByRole('button', { name: 'Edit site data' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Archive project…' })).toBeTruthy();
  });

  it('lets an architect edit but not archive', async () => {
    renderOverview('architect');
    expect(await screen.findByRole('button', { name: 'Edit site data' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Archive/ })).toBeNull();
  });

  it.each<ProjectRole>(['envelope_consultant', 'engineer', 'subcontractor', 'viewer'])(
    'hides editing and archiving from a %s',
    async (role) => {
      renderOverview(role);
      expect(await screen.findByText('1 Quay Street')).toBeTruthy();
      expect(screen.queryByRole('button', { name: 'Edit site data' })).toBeNull();
      expect(screen.queryByRole('button', { name: /Archive/ })).toBeNull();
    },
  );

  it('offers duplicating the project to those who edit its site data only', async () => {
    renderOverview('architect');
    expect(await screen.findByRole('button', { name: 'Duplicate…' })).toBeTruthy();
    for (const role of ['envelope_consultant', 'engineer', 'subcontractor', 'viewer'] as const) {
      cleanup();
      renderOverview(role);
      expect(await screen.findByText('1 Quay Street')).toBeTruthy();
      expect(screen.queryByRole('button', { name: 'Duplicate…' })).toBeNull();
    }
  });

  it('sets the title block in the person’s units', async () => {
    renderOverview('viewer', 'IP');
    expect(await screen.findByText('30 ft')).toBeTruthy();
    expect(screen.getByText('\u22124 °F')).toBeTruthy();
  });
});
