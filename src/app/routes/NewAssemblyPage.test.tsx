import { ASSEMBLY_TEMPLATES } from '@shared/assemblies/templates';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import { projectKeys } from '../../lib/query-keys';
import { sampleProject } from '../../lib/revision-test-fixtures';
import { UnitSystemProvider } from '../../lib/unit-system';
import { NewAssemblyPage } from './NewAssemblyPage';

afterEach(cleanup);

const { id } = sampleProject;
const project = sampleProject;

function renderNew(search: string) {
  const qc = new QueryClient({
    defaultOptions: { queries: { staleTime: Number.POSITIVE_INFINITY, retry: false } },
  });
  qc.setQueryData(projectKeys.detail(id), project);
  const router = createMemoryRouter(
    [{ path: '/projects/:projectId/assemblies/new', element: <NewAssemblyPage /> }],
    { initialEntries: [`/projects/${id}/assemblies/new${search}`] },
  );
  return render(
    <QueryClientProvider client={qc}>
      <UnitSystemProvider value="SI">
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

const category = () => document.getElementById('f-wallCategory') as HTMLSelectElement;

describe('New assembly page', () => {
  it.each(ASSEMBLY_TEMPLATES.map((t) => [t.title, t] as const))(
    'starts from the template %s',
    async (title, t) => {
      renderNew(`?start=${t.id}`);
      await screen.findByTestId('result-Reff');
      expect(screen.getByRole('heading', { level: 2, name: title })).toBeTruthy();
      expect(screen.getByRole('link', { name: title }).getAttribute('aria-current')).toBe('page');
      const text = document.body.textContent ?? '';
      expect(text).toContain(
        'generic design values (ISO 10456 / ASHRAE Fundamentals) — use the maker’s declared values',
      );
      expect(text).not.toMatch(/NaN|memory|recalled/i);
      // The template preselects its category; the person can change it.
      expect(category().value).toBe(t.input.wallCategory);
      fireEvent.change(category(), { target: { value: 'other' } });
      expect(category().value).toBe('other');
    },
  );

  it('opens on the insulated metal panel template when no start is named', async () => {
    renderNew('');
    await screen.findByTestId('result-Reff');
    expect(screen.getByRole('heading', { level: 2, name: 'Insulated metal panel on girts' })).toBeTruthy();
  });

  it('a blank start asks for the wall category and will not save without one', async () => {
    renderNew('?start=blank');
    await screen.findByText(/Starting blank: choose the wall category/);
    expect(category().value).toBe('');
    expect(category().getAttribute('aria-required')).toBe('true');
    fireEvent.change(document.getElementById('f-name') as HTMLInputElement, { target: { value: 'Wall A' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create assembly' }));
    expect(await screen.findByText('Choose one of the listed options.')).toBeTruthy();
    expect(category().getAttribute('aria-invalid')).toBe('true');
  });
});
