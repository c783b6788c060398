import type { BridgeValue, OrgMaterial } from '@shared/schemas/assembly';
import type { AttachmentProduct } from '@shared/schemas/attachment-library';
import type { UnitSystem } from '@shared/units';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { UnitSystemProvider } from '../../../lib/unit-system';
import { AddBridgeValueForm } from './AddBridgeValueForm';
import { AddFirmMaterialForm } from './AddFirmMaterialForm';
import { AttachmentProductsTable } from './AttachmentProductsTable';
import { BridgeValuesTable, FirmMaterialsTable } from './LibraryTables';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderIn(system: UnitSystem, node: ReactNode) {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <UnitSystemProvider value={system}>{node}</UnitSystemProvider>
    </QueryClientProvider>,
  );
}

const json = (body: unknown, status: number) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/** fetch answering every call with `answer`, recording the calls. */
function stubFetch(answer: (url: string, init: RequestInit) => Response | Promise<Response>) {
  const fetch = vi.fn(async (url: string, init: RequestInit) => answer(url, init));
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

const materials: OrgMaterial[] = [
  {
    id: '00000000-0000-4000-8000-000000000001',
    name: 'Board A',
    conductivity: 0.035,
    density: 140,
    vapourResistanceFactor: 1,
    source: 'Data sheet 1',
    createdAt: '2026-01-01T00:00:00.000Z',
  },
  {
    id: '00000000-0000-4000-8000-000000000002',
    name: 'Board B',
    conductivity: 0.022,
    source: 'Data sheet 2',
    createdAt: '2026-01-02T00:00:00.000Z',
  },
];

const bridges: BridgeValue[] = [
  {
    id: '00000000-0000-4000-8000-000000000011',
    name: 'Thermally broken clip',
    kind: 'point',
    value: 0.05,
    sourceType: 'test_report',
    source: 'TR 1',
    notes: 'at 100 mm',
    createdAt: '2026-01-01T00:00:00.000Z',
  },
];

describe('the firm tables', () => {
  it('say so when the firm has no entries of its own', () => {
    renderIn('SI', <FirmMaterialsTable orgId="o1" materials={[]} isAdmin />);
    expect(screen.getByText("No materials of the firm's own yet.")).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('show each header with its unit line in the person’s units, and no actions to a member', () => {
    renderIn('IP', <FirmMaterialsTable orgId="o1" materials={materials} isAdmin={false} />);
    const table = screen.getByRole('table', { name: "The firm's materials" });
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((h) => h.textContent);
    expect(headers).toEqual(['Material', 'λBtu·in/(h·ft²·°F)', 'ρlb/ft³', 'μ', 'Source', 'Added']);
    expect(within(table).getAllByRole('row')[2]!.textContent).toContain('—');
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('let an administrator remove an entry in two steps, and show why a removal failed', async () => {
    let answer: (r: Response) => void = () => undefined;
    const fetch = stubFetch(() => new Promise<Response>((resolve) => (answer = resolve)));
    renderIn('SI', <BridgeValuesTable orgId="o1" values={bridges} isAdmin />);
    expect(screen.getAllByRole('columnheader').at(-1)!.textContent).toBe('Actions');
    expect(screen.getByRole('cell', { name: /Thermally broken clipat 100 mm/ })).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Remove Thermally broken clip…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Keep' }));
    fireEvent.click(screen.getByRole('button', { name: 'Remove Thermally broken clip…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Remove Thermally broken clip for the whole firm' }));
    await waitFor(() => expect(fetch).toHaveBeenCalledOnce());
    expect(fetch.mock.calls[0]![0]).toBe(
      '/api/organisations/o1/bridge-values/00000000-0000-4000-8000-000000000011',
    );
    expect(fetch.mock.calls[0]![1].method).toBe('DELETE');
    await screen.findByText('Removing…');

    await act(async () =>
      answer(json({ error: { code: 'forbidden', message: 'Only firm administrators.' } }, 403)),
    );
    await screen.findByText('Only firm administrators.');
  });

  it('remove an attachment product by its id, and say so when there are none', async () => {
    const clip: AttachmentProduct = {
      id: '00000000-0000-4000-8000-0000000000c1',
      kind: 'clip',
      name: 'Screw-fixed clip',
      source: 'Maker’s table 3',
      notes: '',
      createdAt: '2026-02-01T00:00:00.000Z',
      clip: { fastenerCapacity: 900, fastenersPerClip: 2 },
      dataSheet: null,
    };
    const fetch = stubFetch(() => new Response(null, { status: 204 }));
    const view = renderIn('SI', <AttachmentProductsTable orgId="o1" products={[clip]} isAdmin mayWrite />);
    expect(screen.getByRole('row', { name: /Screw-fixed clip/ }).className).toBe('align-top');
    expect(screen.getByRole('button', { name: 'Upload…' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Remove Screw-fixed clip…' }));
    fireEvent.click(screen.getByRole('button', { name: 'Remove Screw-fixed clip for the whole firm' }));
    await waitFor(() => expect(fetch).toHaveBeenCalledOnce());
    expect(fetch.mock.calls[0]![0]).toBe(
      '/api/organisations/o1/attachment-products/00000000-0000-4000-8000-0000000000c1',
    );
    view.unmount();
    renderIn('SI', <AttachmentProductsTable orgId="o1" products={[]} isAdmin mayWrite />);
    expect(
      screen.getByText(
        'No panel tables or clips yet. Enter them on an assembly’s Attachment & wind page and save them to the library from there.',
      ),
    ).toBeTruthy();
  });

  it('offer a reader the data sheet to read but no upload and no removal', () => {
    const clip: AttachmentProduct = {
      id: '00000000-0000-4000-8000-0000000000c2',
      kind: 'clip',
      name: 'Read-only clip',
      source: 'Maker’s table 4',
      notes: '',
      createdAt: '2026-02-01T00:00:00.000Z',
      clip: { fastenerCapacity: 900, fastenersPerClip: 2 },
      dataSheet: {
        name: 'clip.pdf',
        contentType: 'application/pdf',
        size: 10,
        sha256: 'a'.repeat(64),
        uploadedAt: '2026-02-01T00:00:00.000Z',
      },
    };
    renderIn('SI', <AttachmentProductsTable orgId="o1" products={[clip]} isAdmin={false} mayWrite={false} />);
    expect(screen.getByRole('link', { name: 'clip.pdf' })).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
  });
});

describe('the add forms', () => {
  it('word the schema’s reasons on the typed fields, in the person’s units', async () => {
    const fetch = stubFetch(() => json({}, 500));
    renderIn('IP', <AddFirmMaterialForm orgId="o1" />);
    const form = screen.getByRole('form', { name: 'Add a firm material' });
    fireEvent.change(screen.getByLabelText(/^λ/), { target: { value: '0' } });
    fireEvent.change(screen.getByLabelText(/^Density/), { target: { value: '1e9' } });
    fireEvent.change(screen.getByLabelText(/^Vapour/), { target: { value: '0.5' } });
    await act(async () => fireEvent.submit(form));
    expect(screen.getByText('Give the material a name.')).toBeTruthy();
    expect(screen.getByText('Must be at least 0.0069 Btu·in/(h·ft²·°F).')).toBeTruthy();
    expect(screen.getByText('Must be at most 1560.7 lb/ft³.')).toBeTruthy();
    expect(screen.getByText('Must be at least 1.')).toBeTruthy();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('tell an unreadable number from an empty box', async () => {
    stubFetch(() => json({}, 500));
    renderIn('SI', <AddFirmMaterialForm orgId="o1" />);
    fireEvent.change(screen.getByLabelText(/^λ/), { target: { value: 'abc' } });
    await act(async () => fireEvent.submit(screen.getByRole('form', { name: 'Add a firm material' })));
    expect(screen.getByText('Enter a number (for example 0.035).')).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/^λ/), { target: { value: '' } });
    await act(async () => fireEvent.submit(screen.getByRole('form', { name: 'Add a firm material' })));
    expect(screen.getByText('Enter a value.')).toBeTruthy();
  });

  it('send SI values, name the added entry and empty the form', async () => {
    const fetch = stubFetch((_url, init) =>
      json(
        {
          ...JSON.parse(String(init.body)),
          id: '00000000-0000-4000-8000-0000000000ff',
          createdAt: '2026-03-01T00:00:00.000Z',
        },
        201,
      ),
    );
    renderIn('SI', <AddBridgeValueForm orgId="o1" />);
    fireEvent.change(screen.getByLabelText(/^Name/), { target: { value: 'Girt Z' } });
    fireEvent.click(screen.getByLabelText(/Linear bridge/));
    fireEvent.change(screen.getByLabelText(/^ψ/), { target: { value: '99' } });
    await act(async () => fireEvent.submit(screen.getByRole('form', { name: 'Add a χ or ψ value' })));
    expect(screen.getByText('Must be at most 10 W/(m·K).')).toBeTruthy();

    fireEvent.change(screen.getByLabelText(/^ψ/), { target: { value: '0.2' } });
    fireEvent.change(screen.getByLabelText(/^Source/), { target: { value: 'Model' } });
    await act(async () => fireEvent.submit(screen.getByRole('form', { name: 'Add a χ or ψ value' })));
    expect((await screen.findByRole('status')).textContent).toBe('✓ “Girt Z” added.');
    expect(fetch.mock.calls[0]![0]).toBe('/api/organisations/o1/bridge-values');
    expect(JSON.parse(String(fetch.mock.calls[0]![1].body))).toEqual({
      name: 'Girt Z',
      kind: 'linear',
      value: 0.2,
      sourceType: 'test_report',
      source: 'Model',
      notes: '',
    });
    expect((screen.getByLabelText(/^Name/) as HTMLInputElement).value).toBe('');
  });

  it('keep the typed values and show the server’s reason when adding fails', async () => {
    stubFetch(() => json({ error: { code: 'forbidden', message: 'Not a member of this firm.' } }, 403));
    renderIn('SI', <AddFirmMaterialForm orgId="o1" />);
    fireEvent.change(screen.getByLabelText(/^Name/), { target: { value: 'Board C' } });
    fireEvent.change(screen.getByLabelText(/^λ/), { target: { value: '0.03' } });
    fireEvent.change(screen.getByLabelText(/^Source/), { target: { value: 'DS 3' } });
    await act(async () => fireEvent.submit(screen.getByRole('form', { name: 'Add a firm material' })));
    await screen.findByText('Not a member of this firm.');
    expect(screen.queryByRole('status')).toBeNull();
    expect((screen.getByLabelText(/^Name/) as HTMLInputElement).value).toBe('Board C');
  });
});
