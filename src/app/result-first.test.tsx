import type { Assembly } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AssemblyBuilder } from '../features/assemblies/components/AssemblyBuilder';
import { startingInput } from '../features/assemblies/form';
import { AttachmentSheet } from '../features/wind/components/AttachmentSheet';
import { demoAssembly, demoProject } from '../features/wind/test-fixtures';
import { UnitSystemProvider } from '../lib/unit-system';

/*
 * Result first, on every calculation sheet: the result summary (verdict and headline figures) stands above the
 * inputs, and while the browser has not yet computed the newest input (React's useDeferredValue lags) the sheet
 * says "updating…" and dims the figures of the older input instead of showing them as current.
 */

// A busy browser on demand: while `lag.on`, every deferred value stays at the one it had when lagging began.
const lag = vi.hoisted(() => ({ on: false }));
vi.mock('react', async (importOriginal) => {
  const react = await importOriginal<typeof import('react')>();
  return {
    ...react,
    useDeferredValue: <T,>(value: T): T => {
      const held = react.useRef(value);
      if (!lag.on) held.current = value;
      return held.current;
    },
  };
});

afterEach(() => {
  lag.on = false;
  cleanup();
});

const project: Project = {
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
  myRole: 'owner',
};

const windAssembly: Assembly = {
  id: '00000000-0000-4000-8000-000000000003',
  projectId: project.id,
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
};

const byId = (id: string) => document.getElementById(id) as HTMLInputElement;

interface SheetCase {
  sheet: string;
  element: () => ReactNode;
  /** The first heading of the inputs. */
  inputs: RegExp;
  /** A figure of the summary that the edit changes. */
  figure: string;
  /** The input box the person types into, and two entries that give different results. */
  box: () => HTMLInputElement;
  entries: [string, string];
}

const SHEETS: SheetCase[] = [
  {
    sheet: 'build-up',
    element: () => <AssemblyBuilder projectId={project.id} initial={startingInput('sample')} />,
    inputs: /Build-up/,
    figure: 'summary-Reff',
    // The sample wall's mineral-wool board (layer 4).
    box: () => byId('f-thermal-layers-3-thickness'),
    entries: ['40', '200'],
  },
  {
    sheet: 'attachment',
    element: () => (
      <AttachmentSheet
        project={project}
        assembly={windAssembly}
        save={vi.fn()}
        conflictOf={() => null}
        onLoadTheirs={vi.fn()}
        errorText={String}
        library={null}
      />
    ),
    inputs: /Inputs — site and wind/,
    figure: 'summary-utilisation',
    box: () => screen.getByLabelText(/Design girt spacing/) as HTMLInputElement,
    entries: ['0.9', '1.5'],
  },
];

function renderSheet(element: ReactNode) {
  const router = createMemoryRouter([{ path: '/', element }]);
  render(
    <QueryClientProvider client={new QueryClient()}>
      <UnitSystemProvider value="SI">
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

describe.each(SHEETS)('the $sheet sheet, result first', ({ element, inputs, figure, box, entries }) => {
  it('shows the result summary above the inputs', () => {
    renderSheet(element());
    const summary = screen.getByTestId('result-summary');
    const firstInputs = screen.getByRole('heading', { name: inputs });
    expect(summary.compareDocumentPosition(firstInputs) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(screen.getByTestId('summary-verdict').textContent).not.toMatch(/NaN|undefined/);
    expect(screen.getByRole('link', { name: 'The result in full' })).toBeTruthy();
  });

  it('marks "updating…" and dims the older figures while the deferred input lags', () => {
    renderSheet(element());
    fireEvent.change(box(), { target: { value: entries[0] } });
    const before = screen.getByTestId(figure).textContent;
    expect(screen.queryByText('updating…')).toBeNull();
    expect(screen.getByTestId('result-summary-body').getAttribute('aria-busy')).toBeNull();

    lag.on = true;
    fireEvent.change(box(), { target: { value: entries[1] } });
    expect(screen.getAllByText('updating…').length).toBeGreaterThan(0);
    expect(screen.getByTestId(figure).textContent).toBe(before);
    expect(screen.getByTestId('result-summary-body').getAttribute('aria-busy')).toBe('true');
    expect(screen.getByTestId('result-summary-body').className).toContain('opacity-45');

    // The browser catches up: the mark goes, the figures are the new input's.
    lag.on = false;
    fireEvent.change(box(), { target: { value: ` ${entries[1]}` } });
    expect(screen.queryByText('updating…')).toBeNull();
    expect(screen.getByTestId(figure).textContent).not.toBe(before);
  });
});
