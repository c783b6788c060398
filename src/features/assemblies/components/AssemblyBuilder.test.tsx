import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { startingInput } from '../form';
import { AssemblyBuilder } from './AssemblyBuilder';

afterEach(cleanup);

const projectId = '11111111-1111-4111-8111-111111111111';

/** The builder for a new assembly from the sample wall: no server is needed until Save. */
function renderBuilder(system: 'SI' | 'IP' = 'SI', initial = startingInput('sample')) {
  const qc = new QueryClient();
  const router = createMemoryRouter(
    [
      {
        path: '/projects/:projectId/assemblies/new',
        element: <AssemblyBuilder projectId={projectId} initial={initial} />,
      },
    ],
    { initialEntries: [`/projects/${projectId}/assemblies/new`] },
  );
  return render(
    <QueryClientProvider client={qc}>
      <UnitSystemProvider value={system}>
        <RouterProvider router={router} />
      </UnitSystemProvider>
    </QueryClientProvider>,
  );
}

const byId = (id: string) => {
  const el = document.getElementById(id);
  if (!el) throw new Error(`no element #${id}`);
  return el as HTMLInputElement;
};

describe('Assembly builder', () => {
  it('computes the sample wall in the browser and shows R and U in SI and IP', async () => {
    renderBuilder();
    const reff = await screen.findByTestId('result-Reff');
    expect(reff.textContent).toMatch(/^\d+(\.\d{1,2})?\u202fm²·K\/W$/);
    expect(screen.getAllByText(/^R-\d+(\.\d)?$/).length).toBeGreaterThan(0);
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('shows a field-level error instead of NaN when a fraction makes the sum differ from 1', async () => {
    renderBuilder();
    await screen.findByTestId('result-Reff');
    // Layer 7 is the steel-stud layer; its first section is the batt (99.73 %).
    const fraction = byId('f-thermal-layers-6-sections-0-fraction');
    fireEvent.change(fraction, { target: { value: '50' } });

    const layer = screen.getByRole('listitem', { name: /Layer 7:/ });
    const message = within(layer).getByText(/area fractions must sum to 1 \(got 0\.502709\)/i);
    expect(message).toBeTruthy();
    expect(fraction.getAttribute('aria-invalid')).toBe('true');
    expect(fraction.getAttribute('aria-describedby')).toContain(message.parentElement?.id ?? 'missing');
    // No result, the reason named with a link to the layer, and never a NaN on the page.
    expect(screen.queryByTestId('result-Reff')).toBeNull();
    expect(screen.getByText(/No result yet/)).toBeTruthy();
    expect(document.body.textContent).not.toContain('NaN');

    // Giving the rest to the batt (or to the web) restores a sum of 1 and the result.
    expect(within(layer).getAllByRole('button', { name: /Give the rest to/ })).toHaveLength(2);
    fireEvent.click(within(layer).getByRole('button', { name: /Give the rest to “Glass-fibre batt”/ }));
    expect(await screen.findByTestId('result-Reff')).toBeTruthy();
  });

  it('changes the effective R when the clip spacing changes', async () => {
    renderBuilder();
    const before = (await screen.findByTestId('result-Reff')).textContent;
    const r0Before = screen.getByTestId('result-R0').textContent;

    // Clips at 406 mm × 600 mm → 203 mm: twice as many clips, more heat through them.
    fireEvent.change(byId('f-thermal-bridges-0-spacingHorizontal'), { target: { value: '203' } });

    const after = screen.getByTestId('result-Reff').textContent;
    expect(after).not.toBe(before);
    expect(Number.parseFloat(after ?? '')).toBeLessThan(Number.parseFloat(before ?? ''));
    // The clear field does not depend on the clips.
    expect(screen.getByTestId('result-R0').textContent).toBe(r0Before);
    expect(screen.getByTestId('live-Reff').textContent).toContain(after ?? 'missing');
  });

  it('takes clip spacing in inches when the person works in IP', async () => {
    renderBuilder('IP');
    const before = (await screen.findByTestId('result-Reff')).textContent;
    expect(before).toMatch(/^R-\d+\.\d$/);
    const h = byId('f-thermal-bridges-0-spacingHorizontal');
    expect(h.value).toBe('15.98');
    fireEvent.change(h, { target: { value: '24' } });
    expect(Number.parseFloat((screen.getByTestId('result-Reff').textContent ?? '').slice(2))).toBeGreaterThan(
      Number.parseFloat((before ?? '').slice(2)),
    );
  });

  it('a new layer takes the library μ, or says at once that its vapour data is needed', async () => {
    const sample = startingInput('sample');
    // Every sample layer has vapour data (μ 1 as a placeholder), so only a new layer can lack it.
    renderBuilder('SI', { ...sample, vapour: sample.thermal.layers.map(() => ({ kind: 'mu', mu: 1 })) });
    await screen.findByTestId('result-Reff');
    const count = sample.thermal.layers.length;
    const choose = screen.getByLabelText(/Add a layer/);
    fireEvent.change(choose, { target: { value: 'generic:mineral-wool-board' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add layer' }));
    expect(screen.queryByTestId(`vapour-needed-${count}`)).toBeNull();
    fireEvent.change(choose, { target: { value: 'kind:homogeneous' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add layer' }));
    const mark = await screen.findByTestId(`vapour-needed-${count + 1}`);
    expect(mark.textContent).toMatch(/Vapour data needed for the moisture check/);
  });

  it('an assembly with no vapour data at all marks every layer on the build-up page', async () => {
    const sample = startingInput('sample');
    renderBuilder('SI', { ...sample, vapour: undefined });
    await screen.findByTestId('result-Reff');
    for (const [i] of sample.thermal.layers.entries()) {
      expect(screen.getByTestId(`vapour-needed-${i}`).textContent).toMatch(/Vapour data needed/);
    }
  });
});
