import demo from '@data/seed/demo-assembly.json';
import type { ProjectRole } from '@shared/auth/permissions';
import type { Vapour } from '@shared/calc/moisture/schema';
import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import { type Project, projectClimateSchema } from '@shared/schemas/project';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import { assemblyKeys, projectKeys } from '../../lib/query-keys';
import { demoInput, sampleProject } from '../../lib/revision-test-fixtures';
import { UnitSystemProvider } from '../../lib/unit-system';
import { AssemblyLayout } from '../layout/AssemblyLayout';
import { AssemblyMoisturePage } from './AssemblyMoisturePage';

afterEach(cleanup);

const projectId = sampleProject.id;
const assemblyId = '33333333-3333-4333-8333-333333333333';

const baseProject: Project = {
  ...sampleProject,
  buildingHeightM: 11.5,
  planLengthM: 96,
  planWidthM: 54,
  indoorTempC: 18,
  indoorRh: 0.45,
  winterDesignTempC: -19,
  climate: projectClimateSchema.parse(demo.climate),
  myRole: 'envelope_consultant',
};

function assemblyOf(input: AssemblyInput): Assembly {
  return {
    id: assemblyId,
    projectId,
    name: input.name,
    wallCategory: input.wallCategory,
    revision: 1,
    version: 1,
    updatedAt: '2025-01-02T00:00:00Z',
    Ueff: null,
    Reff: null,
    current: {
      revision: 1,
      note: '',
      input,
      thermalResult: null,
      engineVersion: '0.1.0',
      createdBy: 'Ada Quarrie',
      createdAt: '2025-01-02T00:00:00Z',
    },
  };
}

function renderPage({
  project = {},
  vapour = demoInput.vapour,
  system = 'SI',
}: {
  project?: Partial<Project> & { myRole?: ProjectRole };
  vapour?: (Vapour | null)[];
  system?: 'SI' | 'IP';
} = {}) {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: Number.POSITIVE_INFINITY } } });
  qc.setQueryData(projectKeys.detail(projectId), { ...baseProject, ...project });
  qc.setQueryData(assemblyKeys.detail(assemblyId), assemblyOf({ ...demoInput, vapour }));
  const router = createMemoryRouter(
    [
      {
        path: '/projects/:projectId/assemblies/:assemblyId',
        element: <AssemblyLayout />,
        children: [{ path: 'moisture', element: <AssemblyMoisturePage /> }],
      },
    ],
    { initialEntries: [`/projects/${projectId}/assemblies/${assemblyId}/moisture`] },
  );
  return render(
    <QueryClientProvider client={qc}>
      <UnitSystemProvider value={system}>
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

const film = () => screen.getByLabelText('μ of layer 7 (Polyethylene film)') as HTMLInputElement;

describe('Assembly moisture page — verdict', () => {
  it('finds no condensation in the demo wall and says so in words and a glyph', async () => {
    renderPage();
    const verdict = await screen.findByTestId('verdict-interstitial');
    expect(verdict.textContent).toBe('meets — No interstitial condensation in any month.');
    expect(screen.getByTestId('moisture-verdict').textContent).toMatch(/^✓\s*Meets the ISO 13788 screening/);
    expect(screen.getByTestId('verdict-surface').textContent).toMatch(
      /meets — The interior surface stays at or below 80 % RH in every month: f_Rsi 0\.956 ≥ f_Rsi,min 0\.831 of the critical month, November\./,
    );
    expect(screen.getByTestId('profile-chart')).toBeTruthy();
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('predicts condensation that dries out when the polyethylene film loses its vapour resistance', async () => {
    renderPage();
    await screen.findByTestId('verdict-interstitial');
    fireEvent.change(film(), { target: { value: '1' } });
    expect(screen.getByTestId('verdict-interstitial').textContent).toBe(
      'conditional — Condenses between Water-resistive barrier and Mineral wool board from November, peaks at 1.34\u202fkg/m² in February, and dries out by the end of April. Check that this amount suits the materials there.',
    );
    expect(screen.getByTestId('moisture-verdict').textContent).toMatch(/^▲/);
    // The profile opens on the month with most water held, with the condensation plane marked.
    expect(screen.getByRole('heading', { name: 'Profile through the wall — February' })).toBeTruthy();
    expect(screen.getAllByTestId('condensation-plane')).toHaveLength(1);
    // The film's s_d follows what is typed: μ·d = 1 × 0.15 mm.
    const row = film().closest('tr') as HTMLElement;
    expect(within(row).getByText('0.00015 m')).toBeTruthy();
    expect(
      screen.getByRole('button', { name: 'Save vapour data as revision 2' }).hasAttribute('disabled'),
    ).toBe(false);
  });

  it('works in IP: thickness in inches, water in oz/ft²', async () => {
    renderPage({ system: 'IP' });
    await screen.findByTestId('verdict-interstitial');
    fireEvent.change(film(), { target: { value: '1' } });
    expect(screen.getByTestId('verdict-interstitial').textContent).toMatch(
      /peaks at 4\.39\u202foz\/ft² in February/,
    );
    expect(screen.getByText('3.937 in')).toBeTruthy();
  });

  it('shows the schema’s and the engine’s reasons next to the field, never NaN', async () => {
    renderPage();
    await screen.findByTestId('verdict-interstitial');
    fireEvent.change(film(), { target: { value: '0.5' } });
    const row = film().closest('tr') as HTMLElement;
    const reason = within(row).getByText(/μ must be at least 1 — still air/).parentElement as HTMLElement;
    expect(film().getAttribute('aria-invalid')).toBe('true');
    expect(film().getAttribute('aria-describedby')).toBe(reason.id);
    expect(screen.queryByTestId('verdict-interstitial')).toBeNull();
    expect(
      within(screen.getByTestId('moisture-needs')).getByText(/Layer 7 \(Polyethylene film\): μ must be/),
    ).toBeTruthy();

    fireEvent.change(film(), { target: { value: '100000' } });
    expect(screen.getByTestId('verdict-interstitial')).toBeTruthy();

    // A declared-resistance layer has no thickness, so μ cannot give its s_d: the engine says so at the field.
    fireEvent.change(screen.getByLabelText('Kind of vapour data of layer 3 (Water-resistive barrier)'), {
      target: { value: 'mu' },
    });
    fireEvent.change(screen.getByLabelText('μ of layer 3 (Water-resistive barrier)'), {
      target: { value: '50' },
    });
    const engine = screen.getAllByText(/μ needs a layer thickness; give s_d or a permeance/);
    expect(engine.length).toBeGreaterThan(0);
    const wrb = screen.getByLabelText('μ of layer 3 (Water-resistive barrier)');
    expect(wrb.getAttribute('aria-invalid')).toBe('true');
    expect(document.body.textContent).not.toContain('NaN');
  });
});

describe('Assembly moisture page — what is missing', () => {
  it('lists the missing vapour data and climate in plain words, each linked to where it is entered', async () => {
    const vapour = [...(demoInput.vapour ?? [])];
    vapour[3] = null;
    renderPage({ project: { climate: null }, vapour });
    const needs = await screen.findByTestId('moisture-needs');
    const items = within(needs).getAllByRole('listitem');
    expect(items.map((li) => li.textContent)).toEqual([
      'Vapour data of layer 4 (Mineral wool board) — in the table of layers above.',
      'The project’s monthly climate — enter it on the project’s Climate page.',
    ]);
    expect(within(items[0]!).getByRole('link').getAttribute('href')).toBe('#vapour-row-3');
    expect(within(items[1]!).getByRole('link').getAttribute('href')).toBe(
      `/projects/${projectId}/climate?edit=1`,
    );
    expect(screen.queryByTestId('verdict-interstitial')).toBeNull();

    // Entering the layer's μ leaves only the climate missing.
    fireEvent.change(screen.getByLabelText('Kind of vapour data of layer 4 (Mineral wool board)'), {
      target: { value: 'mu' },
    });
    fireEvent.change(screen.getByLabelText('μ of layer 4 (Mineral wool board)'), { target: { value: '1' } });
    expect(within(screen.getByTestId('moisture-needs')).getAllByRole('listitem')).toHaveLength(1);
  });

  it('tells a viewer who enters the climate, and shows the vapour data read-only', async () => {
    renderPage({ project: { climate: null, myRole: 'viewer' } });
    const needs = await screen.findByTestId('moisture-needs');
    expect(needs.textContent).toContain(
      'The project’s monthly climate — the project owner, architect or envelope consultant enters it on the Climate page.',
    );
    expect(screen.queryByLabelText(/μ of layer/)).toBeNull();
    expect(screen.queryByRole('button', { name: /Save vapour data/ })).toBeNull();
  });

  it('takes μ from the generic library for a layer that names a library material', async () => {
    renderPage();
    await screen.findByTestId('verdict-interstitial');
    fireEvent.click(
      screen.getByRole('button', {
        name: 'Take μ 4 (wet cup) from the library for layer 8 (Interior gypsum board)',
      }),
    );
    expect((screen.getByLabelText('μ of layer 8 (Interior gypsum board)') as HTMLInputElement).value).toBe(
      '4',
    );
  });
});
