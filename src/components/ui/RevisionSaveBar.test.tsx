import type { Assembly } from '@shared/schemas/assembly';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useState } from 'react';
import { createMemoryRouter, Link, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  conflictError,
  conflictOf,
  demoInput,
  revisionOf as revision,
} from '../../lib/revision-test-fixtures';
import { type SaveArgs, useRevisionEditing } from '../../lib/use-revision-editing';
import { RevisionSaveBar } from './RevisionSaveBar';

afterEach(cleanup);

const first = revision(1, { ...demoInput, description: 'as built' });
const theirs = revision(
  2,
  { ...demoInput, name: 'Their name', description: 'theirs' },
  'Bea Ortiz',
  'renamed',
);

/** A sheet that edits the description, saved by the shared bar. */
function DescriptionSheet({ save }: { save: (args: SaveArgs) => Promise<Assembly> }) {
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
      { path: '/sheet', element: <DescriptionSheet save={save} /> },
      { path: '/elsewhere', element: <p>Somewhere else</p> },
    ],
    { initialEntries: ['/sheet'] },
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
    await waitFor(() =>
      expect(screen.queryByText('The description has edits that are not saved.')).toBeNull(),
    );
    expect(description().value).toBe('mine');

    fireEvent.click(screen.getByRole('button', { name: 'Undo my edits' }));
    expect(description().value).toBe('as built');
    fireEvent.change(description(), { target: { value: 'mine again' } });
    fireEvent.click(screen.getByRole('link', { name: 'Elsewhere' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Leave without saving' }));
    await screen.findByText('Somewhere else');
  });
});
