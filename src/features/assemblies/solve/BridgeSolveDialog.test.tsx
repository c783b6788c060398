import type { Bridge } from '@shared/calc/thermal/schema';
import { ENGINE_VERSION } from '@shared/calc/trace';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { demoInput } from '../../../lib/revision-test-fixtures';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { BridgeSolveDialog } from './BridgeSolveDialog';
import { directRunner, runBridge } from './run-bridge';
import type { BridgeRunner } from './runners';

afterEach(cleanup);

// jsdom has no modal dialogs: open and close them as a browser would, without the top layer.
beforeAll(() => {
  HTMLDialogElement.prototype.showModal ??= function (this: HTMLDialogElement) {
    this.setAttribute('open', '');
  };
  HTMLDialogElement.prototype.close ??= function (this: HTMLDialogElement) {
    this.removeAttribute('open');
  };
});

const layers = demoInput.thermal.layers;
const bridgeOf = (kind: Bridge['kind']) => demoInput.thermal.bridges.find((b) => b.kind === kind)!;

function renderDialog(
  kind: Bridge['kind'],
  runner: BridgeRunner,
  system: 'SI' | 'IP' = 'SI',
  onUse = vi.fn(),
) {
  render(
    <UnitSystemProvider value={system}>
      <BridgeSolveDialog
        bridge={bridgeOf(kind)}
        layers={layers}
        onUse={onUse}
        onClose={() => {}}
        runner={runner}
      />
    </UnitSystemProvider>,
  );
  return onUse;
}

describe('Solve dialog (bridge solver on the assembly layers)', () => {
  it('girt: prefilled from the layers, solved, and "Use this value" hands back ψ with its source', async () => {
    const onUse = renderDialog('linear', directRunner);
    // The demo girt runs through the 100 mm mineral wool (the first insulation layer), 1.2 m apart.
    expect(screen.getByTestId('crossed-depth').textContent).toBe('100\u202fmm');
    expect((screen.getByLabelText(/Girt spacing/) as HTMLInputElement).value).toBe('1200');
    expect((screen.getByLabelText(/Steel thickness/) as HTMLInputElement).value).toBe('1.5');
    expect(screen.getByText(/generic design values/)).toBeTruthy();
    // The girt drawn to scale from the model the solver gets: steel solid, the wool hatched.
    const drawing = screen.getByTestId('detail-section');
    const metal = [...drawing.querySelectorAll('rect[fill="url(#dh-metal)"]')].map((r) => r.textContent);
    expect(metal).toEqual(['girt, outer flange, λ 50', 'girt, web, λ 50', 'girt, inner flange, λ 50']);
    expect(drawing.querySelector('rect[fill="url(#dh-batt)"]')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Solve' }));
    expect(screen.getByRole('button', { name: 'Cancel' })).toBeTruthy();
    const use = await screen.findByRole('button', { name: 'Use this value' }, { timeout: 20_000 });
    const result = screen.getByRole('region', { name: 'Result' });
    expect(within(result).getByTestId('temperature-map')).toBeTruthy();
    expect(within(result).getByTestId('coldest-point')).toBeTruthy();
    expect(within(result).getByTestId('isotherms').querySelectorAll('path').length).toBe(9);
    expect(within(result).getByText(/maker's tested values or a specialist's model/)).toBeTruthy();

    fireEvent.click(use);
    expect(onUse).toHaveBeenCalledTimes(1);
    const [psi, source] = onUse.mock.calls[0]!;
    expect(psi).toBeGreaterThan(0);
    expect(Number.isFinite(psi)).toBe(true);
    // The solve travels with the value: its detail (to redraw it), mesh, f_Rsi and a coarse map.
    expect(source.computed.detail.template).toBe('girt');
    expect(source.computed.value).toBe(psi);
    expect(source.computed.fRsi).toBeGreaterThan(0);
    expect(source.computed.fRsi).toBeLessThan(1);
    expect(source.computed.map.x.length).toBeLessThanOrEqual(49);
    expect(source.text).toMatch(
      new RegExp(
        `^computed by Skinwright ${ENGINE_VERSION.replace(/\./g, '\\.')}, mesh [\\d,]+ cells, \\d{4}-\\d{2}-\\d{2}$`,
      ),
    );
  }, 30_000);

  it('"Save to the library" sends the computed value with its detail; "Use this value" then names the entry', async () => {
    const add = vi.fn(async () => ({ id: '00000000-0000-4000-8000-000000000001' }));
    const onUse = vi.fn();
    render(
      <UnitSystemProvider value="SI">
        <BridgeSolveDialog
          bridge={bridgeOf('linear')}
          layers={layers}
          onUse={onUse}
          onClose={() => {}}
          runner={directRunner}
          save={{ firmName: 'Larchmere', add }}
        />
      </UnitSystemProvider>,
    );
    fireEvent.change(screen.getByLabelText('Detail'), { target: { value: 'corner' } });
    fireEvent.click(screen.getByRole('button', { name: 'Solve' }));
    const save = await screen.findByRole(
      'button',
      { name: "Save to Larchmere's library" },
      { timeout: 20_000 },
    );
    fireEvent.change(screen.getByLabelText('Name in the library'), {
      target: { value: 'Corner, demo wall' },
    });
    fireEvent.click(save);
    expect(await screen.findByText(/Saved to Larchmere's library/)).toBeTruthy();
    const [entry] = add.mock.calls[0]! as unknown as [Record<string, unknown>];
    expect(entry).toMatchObject({ name: 'Corner, demo wall', kind: 'linear', sourceType: 'calculation' });
    expect((entry.computed as { detail: { input: { kind: string } } }).detail.input.kind).toBe('corner');
    fireEvent.click(screen.getByRole('button', { name: 'Use this value' }));
    expect(onUse.mock.calls[0]![1].libraryEntryId).toBe('00000000-0000-4000-8000-000000000001');
  }, 30_000);

  it('clip: a thermally broken clip starts with a pad; inputs shown in IP units', () => {
    renderDialog('point', directRunner, 'IP');
    expect((screen.getByLabelText(/Thermal break pad/) as HTMLInputElement).checked).toBe(true);
    expect(screen.getByTestId('crossed-depth').textContent).toMatch(/in$/);
    expect(screen.getByLabelText(/Spacing along the girt/)).toBeTruthy();
  });

  it('fastener: prefilled from the row (diameter, spacing from the count, the layer crossed)', () => {
    renderDialog('fastener', directRunner);
    expect((screen.getByLabelText(/Shank diameter/) as HTMLInputElement).value).toBe('5');
    expect((screen.getByLabelText(/Spacing along x/) as HTMLInputElement).value).toBe('500');
    expect(screen.getByTestId('crossed-depth').textContent).toBe('100\u202fmm');
    expect(screen.getByText(/the round shank is a square of the same area/)).toBeTruthy();
  });

  it('edge: a linear row solves a slab edge, drawn with its map, ψ handed back', async () => {
    const onUse = renderDialog('linear', directRunner);
    fireEvent.change(screen.getByLabelText('Detail'), { target: { value: 'slab' } });
    expect(screen.getByLabelText(/Slab thickness/)).toBeTruthy();
    expect(screen.queryByTestId('crossed-depth')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Solve' }));
    const use = await screen.findByRole('button', { name: 'Use this value' }, { timeout: 20_000 });
    expect(screen.getByRole('img', { name: /Section through the slab edge: temperature/ })).toBeTruthy();
    fireEvent.click(use);
    const [psi] = onUse.mock.calls[0]!;
    // A concrete slab through the backup wall bridges the insulation's inside face: ψ > 0, finite.
    expect(psi).toBeGreaterThan(0);
    expect(Number.isFinite(psi)).toBe(true);
  }, 30_000);

  it('Cancel stops the solve and returns to the inputs', () => {
    const cancel = vi.fn();
    renderDialog('linear', () => ({ outcome: new Promise(() => {}), cancel }));
    fireEvent.click(screen.getByRole('button', { name: 'Solve' }));
    expect(screen.getByText(/Solving…/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(cancel).toHaveBeenCalled();
    expect(screen.getByRole('button', { name: 'Solve' })).toBeTruthy();
  });

  it('an impossible input is refused with the reason, and nothing is solved', () => {
    const runner = vi.fn(directRunner);
    renderDialog('linear', runner);
    fireEvent.change(screen.getByLabelText(/Outer flange/), { target: { value: '900' } });
    fireEvent.click(screen.getByRole('button', { name: 'Solve' }));
    expect(runner).not.toHaveBeenCalled();
    expect(screen.getByRole('alert').textContent).toMatch(/outerFlange/);
  });

  it('the worker outcome of a model the solver refuses names the field', () => {
    const outcome = runBridge({
      dimension: '2d',
      boxes: [{ name: 'a', lambda: 1, min: [0, 0], max: [1, 1] }],
      boundaries: [
        { name: 'o', side: 'outside', temperature: 0, resistance: 0.04, min: [5, 5], max: [6, 5] },
      ],
    });
    expect(outcome.ok).toBe(false);
  });
});
