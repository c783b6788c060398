import demo from '@data/seed/demo-assembly.json';
import { assemblyInputSchema } from '@shared/schemas/assembly';
import { projectClimateSchema } from '@shared/schemas/project';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AssemblyBuilder } from '../features/assemblies/components/AssemblyBuilder';
import { startingInput } from '../features/assemblies/form';
import { JointsView } from '../features/joints/components/JointsView';
import { MoistureView } from '../features/moisture/components/MoistureView';
import { AttachmentView } from '../features/wind/components/AttachmentView';
import { demoAssembly, testAssembly, testProject } from '../features/wind/test-fixtures';
import { UnitSystemProvider } from '../lib/unit-system';

/*
 * Result first, on every calculation page: the result summary (verdict and headline figures) stands above the
 * inputs, and while the browser has not yet computed the newest input (React's useDeferredValue lags) the page
 * says "updating…" and dims the figures of the older input instead of showing them as current.
 */

// A busy browser on demand: while `lag.on`, every deferred value stays at the one it had when lagging began;
// `catchUp` ends the lag and renders the deferred values anew, as React does once the browser is free.
const lag = vi.hoisted(() => ({ on: false, wake: new Set<() => void>() }));
vi.mock('react', async (importOriginal) => {
  const react = await importOriginal<typeof import('react')>();
  return {
    ...react,
    useDeferredValue: <T,>(value: T): T => {
      const held = react.useRef(value);
      const [, wake] = react.useReducer((n: number) => n + 1, 0);
      react.useEffect(() => {
        lag.wake.add(wake);
        return () => {
          lag.wake.delete(wake);
        };
      }, []);
      if (!lag.on) held.current = value;
      return held.current;
    },
  };
});

function catchUp() {
  lag.on = false;
  act(() => {
    for (const wake of lag.wake) wake();
  });
}

afterEach(() => {
  lag.on = false;
  cleanup();
});

const project = testProject('owner');
const assemblyOf = testAssembly;
const demoWall = assemblyOf(assemblyInputSchema.parse(demo.assembly));
const revisionApi = { save: vi.fn(), conflictOf: () => null, onLoadTheirs: vi.fn(), errorText: String };

const byId = (id: string) => document.getElementById(id) as HTMLInputElement;

interface PageCase {
  page: string;
  element: () => ReactNode;
  /** The first heading of the inputs. */
  inputs: RegExp;
  /** A figure of the summary that the edit changes. */
  figure: string;
  /** The input box the person types into, and an entry that changes the figure. */
  box: () => HTMLInputElement;
  entry: string;
}

const PAGES: PageCase[] = [
  {
    page: 'build-up',
    element: () => <AssemblyBuilder projectId={project.id} initial={startingInput('sample')} />,
    inputs: /Build-up/,
    figure: 'summary-Reff',
    // The sample wall's mineral-wool board (layer 4).
    box: () => byId('f-thermal-layers-3-thickness'),
    entry: '200',
  },
  {
    page: 'attachment',
    element: () => (
      <AttachmentView
        project={project}
        assembly={assemblyOf(demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 }))}
        library={null}
        {...revisionApi}
      />
    ),
    inputs: /Inputs — site and wind/,
    figure: 'summary-utilisation',
    box: () => screen.getByLabelText(/Design girt spacing/) as HTMLInputElement,
    entry: '1.5',
  },
  {
    page: 'moisture',
    element: () => (
      <MoistureView
        project={{ ...project, climate: projectClimateSchema.parse(demo.climate) }}
        assembly={demoWall}
        climateSummary={null}
        {...revisionApi}
      />
    ),
    inputs: /Inputs — layers and their vapour data/,
    figure: 'summary-accumulation',
    // The polyethylene film's μ, from a vapour retarder's to as if it were not there.
    box: () => screen.getByLabelText('μ of layer 7 (Polyethylene film)') as HTMLInputElement,
    entry: '1',
  },
  {
    page: 'joints',
    element: () => <JointsView project={project} assembly={demoWall} {...revisionApi} />,
    inputs: /Joint schedule — inputs/,
    figure: 'summary-joints',
    // The first joint's design width (mm), from wide enough to too narrow for its movement.
    box: () => screen.getByLabelText(/^Design width/) as HTMLInputElement,
    entry: '5',
  },
];

function renderPage(element: ReactNode) {
  const router = createMemoryRouter([{ path: '/', element }]);
  render(
    <QueryClientProvider client={new QueryClient()}>
      <UnitSystemProvider value="SI">
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

describe.each(PAGES)('the $page page, result first', ({ element, inputs, figure, box, entry }) => {
  it('shows the result summary above the inputs', () => {
    renderPage(element());
    const summary = screen.getByTestId('result-summary');
    const firstInputs = screen.getByRole('heading', { name: inputs });
    expect(summary.compareDocumentPosition(firstInputs) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(screen.getByTestId('summary-verdict').textContent).not.toMatch(/NaN|undefined/);
    expect(screen.getByRole('link', { name: 'The result in full' })).toBeTruthy();
  });

  it('marks "updating…" and dims the older figures while the deferred input lags', () => {
    renderPage(element());
    const before = screen.getByTestId(figure).textContent;
    const body = () => screen.getByTestId('result-summary-body');
    expect(screen.queryByText('updating…')).toBeNull();
    expect(body().getAttribute('aria-busy')).toBeNull();

    lag.on = true;
    fireEvent.change(box(), { target: { value: entry } });
    expect(screen.getAllByText('updating…').length).toBeGreaterThan(0);
    expect(screen.getByTestId(figure).textContent).toBe(before);
    expect(body().getAttribute('aria-busy')).toBe('true');
    expect(body().className).toContain('opacity-45');

    // The browser catches up: the mark goes, the figures are the new input's.
    catchUp();
    expect(screen.queryByText('updating…')).toBeNull();
    expect(body().getAttribute('aria-busy')).toBeNull();
    expect(screen.getByTestId(figure).textContent).not.toBe(before);
  }, 60_000);
});
