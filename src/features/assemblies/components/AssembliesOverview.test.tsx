import type { AssemblySummary } from '@shared/schemas/assembly';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { assemblyKeys } from '../../../lib/query-keys';
import { demoInput, revisionOf } from '../../../lib/revision-test-fixtures';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { AssembliesOverview } from './AssembliesOverview';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// jsdom has no modal dialogs: open and close them as a browser would, without the top layer.
beforeAll(() => {
  HTMLDialogElement.prototype.showModal ??= function (this: HTMLDialogElement) {
    this.setAttribute('open', '');
  };
  HTMLDialogElement.prototype.close ??= function (this: HTMLDialogElement) {
    this.removeAttribute('open');
  };
});

const projectId = '11111111-1111-4111-8111-111111111111';
const other = { id: '44444444-4444-4444-8444-444444444444', name: 'Harbour Depot, phase 2' };
const targets = [{ id: projectId, name: 'Harbour Depot' }, other];
const summary = (id: string, name: string): AssemblySummary => ({
  id,
  projectId,
  name,
  wallCategory: 'metal_building',
  revision: 2,
  version: 2,
  updatedAt: '2025-01-02T00:00:00Z',
  Ueff: null,
  Reff: null,
  lastRun: null,
});
const list = [
  summary('33333333-3333-4333-8333-333333333333', 'North wall'),
  summary('55555555-5555-4555-8555-555555555555', 'Dock wall'),
];

function renderList(duplicateTargets?: typeof targets) {
  const qc = new QueryClient({
    defaultOptions: { queries: { staleTime: Number.POSITIVE_INFINITY, retry: false } },
  });
  qc.setQueryData(assemblyKeys.list(projectId), list);
  const router = createMemoryRouter(
    [
      {
        path: '/projects/:projectId/assemblies',
        element: (
          <AssembliesOverview projectId={projectId} mayWrite searchable duplicateTargets={duplicateTargets} />
        ),
      },
      { path: '/projects/:projectId/assemblies/:assemblyId', element: <p>the copy’s page</p> },
    ],
    { initialEntries: [`/projects/${projectId}/assemblies`] },
  );
  render(
    <QueryClientProvider client={qc}>
      <UnitSystemProvider value="SI">
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
  return router;
}

describe('the assembly list', () => {
  it('duplicates a row’s assembly from a dialog into the project chosen, and opens the copy', async () => {
    const copy = {
      ...revisionOf(1, demoInput),
      id: '66666666-6666-4666-8666-666666666666',
      projectId: other.id,
    };
    const fetch = vi.fn(async () => new Response(JSON.stringify(copy), { status: 201 }));
    vi.stubGlobal('fetch', fetch);
    const router = renderList(targets);

    fireEvent.click(screen.getByRole('button', { name: 'Duplicate Dock wall…' }));
    const dialog = screen.getByRole('dialog', { name: 'Duplicate “Dock wall”' });
    const form = within(dialog).getByRole('form', { name: 'Duplicate this assembly' });
    const name = within(form).getByLabelText(/^Name of the copy/) as HTMLInputElement;
    // Named "<name> (copy)" and into this project unless changed; the name box has the focus.
    expect(name.value).toBe('Dock wall (copy)');
    expect(document.activeElement).toBe(name);
    expect((within(form).getByLabelText('Into project') as HTMLSelectElement).value).toBe(projectId);

    fireEvent.change(within(form).getByLabelText('Into project'), { target: { value: other.id } });
    fireEvent.change(name, { target: { value: 'Dock wall, option B' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Make the copy' }));
    await waitFor(() =>
      expect(router.state.location.pathname).toBe(`/projects/${other.id}/assemblies/${copy.id}`),
    );
    expect(fetch).toHaveBeenCalledWith(
      '/api/assemblies/55555555-5555-4555-8555-555555555555/duplicate',
      expect.objectContaining({
        method: 'POST',
        body: JSON.stringify({ projectId: other.id, name: 'Dock wall, option B' }),
      }),
    );
  });

  it('Cancel closes the dialog; without projects to copy into no row offers it', () => {
    renderList(targets);
    fireEvent.click(screen.getByRole('button', { name: 'Duplicate North wall…' }));
    fireEvent.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).toBeNull();
    cleanup();
    renderList([]);
    expect(screen.queryByRole('button', { name: /^Duplicate/ })).toBeNull();
  });
});
