import type { Assembly } from '@shared/schemas/assembly';
import type { AttachmentProduct } from '@shared/schemas/attachment-library';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { createMemoryRouter, MemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoAssembly, testAssembly, testProject } from '../test-fixtures';
import { AttachmentView } from './AttachmentView';
import type { AttachmentLibrary } from './LibraryPick';

afterEach(cleanup);

const project = testProject;
const assembly = () => testAssembly(demoAssembly({ girtSpacing: 1.2, clipSpacing: 0.6 }));

describe('the attachment page for a role that only reads', () => {
  it('computes the schedule from the saved inputs and offers no editing', () => {
    render(
      <MemoryRouter>
        <AttachmentView
          project={project('viewer')}
          assembly={assembly()}
          save={vi.fn()}
          conflictOf={() => null}
          onLoadTheirs={vi.fn()}
          errorText={String}
          library={null}
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

describe('the firm library on the attachment page', () => {
  const products: AttachmentProduct[] = [
    {
      id: '00000000-0000-4000-8000-0000000000a1',
      kind: 'panel',
      name: 'Library panel',
      source: 'Library data sheet, rev. 4',
      notes: '',
      createdAt: '2026-01-01T00:00:00.000Z',
      panelModuleWidth: 0.9,
      loadSpanTable: {
        spanCondition: 'single',
        deflectionLimit: 'L/120',
        rows: [
          { span: 1, allowableInward: 3000, allowableOutward: 2500 },
          { span: 2, allowableInward: 1000, allowableOutward: 900 },
          { span: 3, allowableInward: 500, allowableOutward: 400 },
        ],
      },
      dataSheet: {
        name: 'rev4.pdf',
        contentType: 'application/pdf',
        size: 10,
        sha256: 'x',
        uploadedAt: '2026-01-01T00:00:00.000Z',
      },
    },
    {
      id: '00000000-0000-4000-8000-0000000000a2',
      kind: 'clip',
      name: 'Library clip',
      source: 'Test report 12',
      notes: '',
      createdAt: '2026-01-01T00:00:00.000Z',
      clip: { allowableLoad: 2500 },
      dataSheet: null,
    },
  ];

  /** `save` null: the person's firm role only reads the library. */
  function renderEditor(save: AttachmentLibrary['save'] | null = vi.fn()) {
    const saveAssembly = vi.fn(async (args: { input: unknown }) => ({
      ...assembly(),
      version: 2,
      revision: 2,
      current: { ...assembly().current, revision: 2, input: args.input as Assembly['current']['input'] },
    }));
    const sheet = (
      <AttachmentView
        project={project('engineer')}
        assembly={assembly()}
        save={saveAssembly}
        conflictOf={() => null}
        onLoadTheirs={vi.fn()}
        errorText={String}
        library={{
          orgId: '00000000-0000-4000-8000-000000000002',
          firmName: 'Test firm',
          products,
          dataSheetHref: (id) => `/sheet/${id}`,
          save: save ?? undefined,
          errorText: String,
        }}
      />
    );
    render(<RouterProvider router={createMemoryRouter([{ path: '/', element: sheet }])} />);
    return { saveAssembly };
  }

  it('takes a library table and clip with their sources, and saves the sources with the revision', async () => {
    const { saveAssembly } = renderEditor();
    const pickers = screen.getAllByLabelText(/Take from Test firm’s library/);
    fireEvent.change(pickers[0]!, { target: { value: products[0]!.id } });
    fireEvent.change(pickers[1]!, { target: { value: products[1]!.id } });
    await waitFor(() =>
      expect((screen.getByLabelText('Source of the load–span table') as HTMLInputElement).value).toBe(
        'Library data sheet, rev. 4',
      ),
    );
    expect((screen.getByLabelText('Source of the clip capacity') as HTMLInputElement).value).toBe(
      'Test report 12',
    );
    expect(screen.getByRole('link', { name: /data sheet \(rev4.pdf\)/ }).getAttribute('href')).toBe(
      `/sheet/${products[0]!.id}`,
    );
    expect(screen.getAllByRole('row').length).toBeGreaterThan(3);
    fireEvent.click(screen.getByRole('button', { name: /Save as revision/ }));
    await waitFor(() => expect(saveAssembly).toHaveBeenCalled());
    const panel = (saveAssembly.mock.calls[0]![0] as { input: Assembly['current']['input'] }).input
      .windPanel!;
    expect(panel.loadSpanTable).toEqual(products[0]!.kind === 'panel' ? products[0]!.loadSpanTable : null);
    expect(panel.clip).toEqual({ allowableLoad: 2500 });
    expect(panel.panelModuleWidth).toBe(0.9);
    expect(panel.sources).toEqual({
      loadSpanTable: { text: 'Library data sheet, rev. 4', libraryEntryId: products[0]!.id },
      clip: { text: 'Test report 12', libraryEntryId: products[1]!.id },
    });
  });

  it('saves the entered table to the library under a product name, with its source', async () => {
    const save = vi.fn(async (input: unknown) => ({
      ...(input as object),
      id: '00000000-0000-4000-8000-0000000000b1',
      notes: '',
      createdAt: '2026-01-01T00:00:00.000Z',
      dataSheet: null,
    })) as never;
    renderEditor(save);
    fireEvent.change(screen.getByLabelText('Source of the load–span table'), {
      target: { value: 'Maker data sheet, 2026 edition' },
    });
    fireEvent.click(screen.getByRole('button', { name: /Save this load–span table to Test firm’s library/ }));
    fireEvent.change(screen.getByLabelText('Product name for the library'), {
      target: { value: 'Our panel' },
    });
    fireEvent.click(screen.getByRole('button', { name: 'Save the load–span table' }));
    await waitFor(() => expect(save).toHaveBeenCalled());
    const input = (save as unknown as { mock: { calls: [Record<string, unknown>][] } }).mock.calls[0]![0];
    expect(input.kind).toBe('panel');
    expect(input.name).toBe('Our panel');
    expect(input.source).toBe('Maker data sheet, 2026 edition');
    expect(await screen.findByText(/Saved to Test firm’s library as “Our panel”/)).toBeTruthy();
  });

  it('offers a reader of the firm library its entries but no saving to it', () => {
    renderEditor(null);
    expect(screen.getAllByLabelText(/Take from Test firm’s library/)).toHaveLength(2);
    expect(screen.queryByRole('button', { name: /to Test firm’s library/ })).toBeNull();
  });
});
