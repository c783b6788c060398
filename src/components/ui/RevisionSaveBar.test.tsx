import type { Assembly } from '@shared/schemas/assembly';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useState } from 'react';
import { createMemoryRouter, Link, RouterProvider } from 'react-router';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import {
  conflictError,
  conflictOf,
  demoInput,
  revisionOf as revision,
} from '../../lib/revision-test-fixtures';
import { type SaveArgs, useRevisionEditing } from '../../lib/use-revision-editing';
import { RevisionSaveBar } from './RevisionSaveBar';

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

const first = revision(1, { ...demoInput, description: 'as built' });
const theirs = revision(
  2,
  { ...demoInput, name: 'Their name', description: 'theirs' },
  'Bea Ortiz',
  'renamed',
);

/** A page that edits the description, saved by the shared bar. */
function DescriptionPage({ save }: { save: (args: SaveArgs) => Promise<Assembly> }) {
  const [text, setText] = useState(first.current.input.description);
  const editing = useRevisionEditing<string, undefined>({
    assembly: first,
    values: text,
    isEdited: (v, base) => v !== base.current.input.description,
    reset: setText,
    formValues: (input) => input.description,
    toInput: (v, base) => ({ input: { ...base.current.input, description: v } }),
    carryOver: ({ values }) => ({ values, detail: undefined }),
    save,
    conflictOf,
    onLoadTheirs: () => {},
    errorText: String,
  });
  return (
    <div>
      <label>
        Description
        <input value={text} onChange={(e) => setText(e.target.value)} />
      </label>
      <Link to="/elsewhere">Elsewhere</Link>
      <RevisionSaveBar
        editing={editing}
        words={{
          yours: 'values',
          carry: 'Carry my values over',
          unsaved: 'The description has edits that are not saved.',
          part: 'the description',
          formLabel: 'Save the description',
          notePlaceholder: 'e.g. why',
        }}
        undo
      />
    </div>
  );
}

function renderSheet(save: (args: SaveArgs) => Promise<Assembly>) {
  const router = createMemoryRouter(
    [
      { path: '/page', element: <DescriptionPage save={save} /> },
      { path: '/elsewhere', element: <p>Somewhere else</p> },
    ],
    { initialEntries: ['/page'] },
  );
  return render(<RouterProvider router={router} />);
}

const description = () => screen.getByLabelText('Description') as HTMLInputElement;

describe('the revision save bar', () => {
  it('offers to carry my values onto the revision someone else saved first, then saves the one after', async () => {
    const save = vi.fn(async (args: SaveArgs) => {
      if (args.version === 1) throw conflictError(theirs);
      return revision(args.version + 1, args.input);
    });
    renderSheet(save);
    const button = screen.getByRole('button', { name: 'Save the description as revision 2' });
    expect(button.hasAttribute('disabled')).toBe(true);
    expect(screen.getByText('No changes to save.')).toBeTruthy();

    fireEvent.change(description(), { target: { value: 'mine' } });
    fireEvent.click(button);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Someone else saved this assembly first.');
    expect(alert.textContent).toContain('Revision 2 was saved by Bea Ortiz at');
    expect(alert.textContent).toContain(
      '(“renamed”) while you were editing revision 1. Nothing of yours has been saved, and your values are still on this page.',
    );
    expect(
      screen.getByRole('button', { name: 'Save the description as revision 2' }).hasAttribute('disabled'),
    ).toBe(true);
    expect(screen.getByRole('button', { name: 'Load theirs (discard my values)' })).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Carry my values over' }));
    expect(
      screen.getByText('Your values are now on top of revision 2. Check them, then save as revision 3.'),
    ).toBeTruthy();
    expect(description().value).toBe('mine');

    fireEvent.click(screen.getByRole('button', { name: 'Save the description as revision 3' }));
    await screen.findByText('Saved as revision 3.');
    expect(save).toHaveBeenLastCalledWith(
      expect.objectContaining({ version: 2, input: { ...theirs.current.input, description: 'mine' } }),
    );
  });

  it('asks before leaving with unsaved edits, and undoes them on request', async () => {
    renderSheet(async (a) => revision(a.version + 1, a.input));
    fireEvent.change(description(), { target: { value: 'mine' } });
    fireEvent.click(screen.getByRole('link', { name: 'Elsewhere' }));
    await screen.findByText('The description has edits that are not saved.');
    fireEvent.click(screen.getByRole('button', { name: 'Stay and keep editing' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(description().value).toBe('mine');

    fireEvent.click(screen.getByRole('button', { name: 'Discard my edits' }));
    expect(description().value).toBe('as built');
    fireEvent.change(description(), { target: { value: 'mine again' } });
    fireEvent.click(screen.getByRole('link', { name: 'Elsewhere' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Leave without saving' }));
    await screen.findByText('Somewhere else');
  });

  it('asks in a modal dialog, in view', async () => {
    renderSheet(async (a) => revision(a.version + 1, a.input));
    fireEvent.change(description(), { target: { value: 'mine' } });
    fireEvent.click(screen.getByRole('link', { name: 'Elsewhere' }));
    const dialog = await screen.findByRole('dialog', {
      name: 'The description has edits that are not saved.',
    });
    expect((dialog as HTMLDialogElement).open).toBe(true);
    expect(document.activeElement?.textContent).toBe('Stay and keep editing');
  });
});

describe('revision save bar — undo and redo', () => {
  const undoButton = () => screen.getByRole('button', { name: 'Undo' });
  const redoButton = () => screen.getByRole('button', { name: 'Redo' });
  const key = (init: KeyboardEventInit, target: Element = document.body) =>
    fireEvent.keyDown(target, { ctrlKey: true, ...init });

  it('steps back and forward through the edits since the last save, by button and by key', async () => {
    renderSheet(async (a) => revision(a.version + 1, a.input));
    expect(undoButton().hasAttribute('disabled')).toBe(true);
    expect(undoButton().getAttribute('aria-keyshortcuts')).toContain('Control+Z');
    expect(redoButton().getAttribute('title')).toContain('Ctrl+Y');

    fireEvent.change(description(), { target: { value: 'one' } });
    description().blur();
    fireEvent.change(description(), { target: { value: 'two' } });
    // Two edits typed in the same box in a row count as one step; blur between them to make two.
    fireEvent.click(undoButton());
    expect(description().value).toBe('one');
    fireEvent.click(undoButton());
    expect(description().value).toBe('as built');
    expect(undoButton().hasAttribute('disabled')).toBe(true);
    expect(screen.getByText('No changes to save.')).toBeTruthy();

    key({ key: 'Z', shiftKey: true });
    expect(description().value).toBe('one');
    key({ key: 'y' });
    expect(description().value).toBe('two');
    key({ key: 'z' });
    expect(description().value).toBe('one');

    fireEvent.click(screen.getByRole('button', { name: 'Save the description as revision 2' }));
    await screen.findByText('Saved as revision 2.');
    expect(undoButton().hasAttribute('disabled')).toBe(true);
    expect(redoButton().hasAttribute('disabled')).toBe(true);
  });

  it('leaves Ctrl+Z to a text box that has the focus', () => {
    renderSheet(async (a) => revision(a.version + 1, a.input));
    fireEvent.change(description(), { target: { value: 'one' } });
    description().focus();
    key({ key: 'z' }, description());
    expect(description().value).toBe('one');
    description().blur();
    key({ key: 'z' });
    expect(description().value).toBe('as built');
  });

  it('makes discarding all edits a step that can be undone', () => {
    renderSheet(async (a) => revision(a.version + 1, a.input));
    fireEvent.change(description(), { target: { value: 'mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Discard my edits' }));
    expect(description().value).toBe('as built');
    fireEvent.click(undoButton());
    expect(description().value).toBe('mine');
  });
});
