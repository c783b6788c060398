import type { Assembly } from '@shared/schemas/assembly';
import { act, renderHook } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { ApiRequestError } from './api';
import { conflictError, conflictOf, demoInput, revisionOf as revision } from './revision-test-fixtures';
import { type NoteAlone, type SaveArgs, useRevisionEditing } from './use-revision-editing';

/*
 * The shared revision editing, driven by a small page that edits the assembly's description: a save, the 409
 * carry-over onto their revision, loading theirs, the server's field reasons, a newer revision elsewhere.
 */

const first = revision(1, { ...demoInput, description: 'as built' });
/** Someone else's revision 2: they renamed the assembly and changed the description too. */
const theirs = revision(2, { ...demoInput, name: 'Their name', description: 'theirs' }, 'Bea Ortiz');
const savedFrom = (args: SaveArgs) => revision(args.version + 1, args.input);

function useDescriptionPage(
  assembly: Assembly,
  save: (args: SaveArgs) => Promise<Assembly>,
  more: { noteAlone?: NoteAlone; markCarried?: boolean; onLoadTheirs?: (a: Assembly) => void } = {},
) {
  const [text, setText] = useState(assembly.current.input.description);
  const editing = useRevisionEditing<string, { theyChangedIt: boolean }>({
    assembly,
    values: text,
    isEdited: (v, base) => v !== base.current.input.description,
    reset: setText,
    formValues: (input) => input.description,
    toInput: (v, base) =>
      v.includes('✕')
        ? { problem: ['Put right the ✕ first.'] }
        : { input: { ...base.current.input, description: v } },
    carryOver: ({ base, values, theirs }) => ({
      values,
      detail: { theyChangedIt: theirs.current.input.description !== base.current.input.description },
    }),
    fieldPath: (path) => (path === 'input.description' ? 'description' : null),
    save,
    conflictOf,
    onLoadTheirs: more.onLoadTheirs ?? (() => {}),
    errorText: (e) => (e instanceof Error ? e.message : String(e)),
    noteAlone: more.noteAlone,
    markCarried: more.markCarried,
  });
  return { text, setText, editing };
}

describe('revision editing — saving', () => {
  it('saves the edits as the next revision and starts again from it', async () => {
    const save = vi.fn(async (args: SaveArgs) => savedFrom(args));
    const { result } = renderHook(() => useDescriptionPage(first, save));
    expect(result.current.editing.dirty).toBe(false);
    expect(result.current.editing.canSave).toBe(false);

    act(() => result.current.setText('re-clad'));
    act(() => result.current.editing.setNote('  new panels  '));
    expect(result.current.editing.dirty).toBe(true);
    await act(() => result.current.editing.saveNow());

    expect(save).toHaveBeenCalledWith({
      assemblyId: first.id,
      version: 1,
      note: 'new panels',
      input: { ...first.current.input, description: 're-clad' },
    });
    expect(result.current.editing.base.version).toBe(2);
    expect(result.current.editing.savedAs).toBe(2);
    expect(result.current.editing.note).toBe('');
    expect(result.current.editing.dirty).toBe(false);
  });

  it('does not send what the page refuses, and says why', async () => {
    const save = vi.fn(savedFrom);
    const { result } = renderHook(() => useDescriptionPage(first, async (a) => save(a)));
    act(() => result.current.setText('✕'));
    await act(() => result.current.editing.saveNow());
    expect(save).not.toHaveBeenCalled();
    expect(result.current.editing.problem).toEqual(['Put right the ✕ first.']);
  });

  it('shows the server’s reasons at the field while its values are on the page, the rest by path', async () => {
    const save = vi.fn(async () => {
      throw new ApiRequestError(400, 'validation_failed', 'no', {
        'input.description': 'too long',
        'input.name': 'an assembly needs a name',
      });
    });
    const { result } = renderHook(() => useDescriptionPage(first, save));
    act(() => result.current.setText('very long'));
    await act(() => result.current.editing.saveNow());
    expect(result.current.editing.serverErrors).toEqual({ description: 'too long' });
    expect(result.current.editing.problem).toEqual([
      'The server did not accept some values — see the fields marked ✕.',
      'name: an assembly needs a name',
    ]);
    act(() => result.current.setText('shorter'));
    expect(result.current.editing.serverErrors).toEqual({});
  });
});

describe('revision editing — someone else saved first (409)', () => {
  it('carries my edits onto their revision and saves them as the revision after theirs', async () => {
    const save = vi.fn(async (args: SaveArgs) => {
      if (args.version === 1) throw conflictError(theirs);
      return savedFrom(args);
    });
    const { result } = renderHook(() => useDescriptionPage(first, save));
    act(() => result.current.setText('mine'));
    await act(() => result.current.editing.saveNow());

    // Nothing saved; who saved first is known, and what I tried to save is kept.
    const conflict = result.current.editing.conflict;
    expect(conflict?.theirs.revision).toBe(2);
    expect(conflict?.theirs.current.createdBy).toBe('Bea Ortiz');
    expect(conflict?.mine.description).toBe('mine');
    expect(conflict?.carry?.detail).toEqual({ theyChangedIt: true });
    expect(result.current.editing.base.version).toBe(1);
    expect(result.current.text).toBe('mine');
    expect(result.current.editing.newerElsewhere).toBeNull();

    act(() => result.current.editing.carryOver());
    expect(result.current.editing.conflict).toBeNull();
    expect(result.current.editing.base.version).toBe(2);
    expect(result.current.text).toBe('mine');
    expect(result.current.editing.carried).toEqual({ onto: 2, detail: { theyChangedIt: true } });
    expect(result.current.editing.dirty).toBe(true);
    expect(result.current.editing.canSave).toBe(true);

    await act(() => result.current.editing.saveNow());
    // Onto their revision: their rename stays, my description replaces theirs.
    expect(save).toHaveBeenLastCalledWith(
      expect.objectContaining({
        version: 2,
        input: { ...theirs.current.input, name: 'Their name', description: 'mine' },
      }),
    );
    expect(result.current.editing.savedAs).toBe(3);
    expect(result.current.editing.carried).toBeNull();
    expect(result.current.editing.dirty).toBe(false);
  });

  it('loads their revision instead, putting it in the cache and dropping my edits and note', async () => {
    const onLoadTheirs = vi.fn();
    const { result } = renderHook(() =>
      useDescriptionPage(
        first,
        async () => {
          throw conflictError(theirs);
        },
        { onLoadTheirs },
      ),
    );
    act(() => result.current.setText('mine'));
    act(() => result.current.editing.setNote('why'));
    await act(() => result.current.editing.saveNow());
    act(() => result.current.editing.loadTheirs());
    expect(onLoadTheirs).toHaveBeenCalledWith(theirs);
    expect(result.current.text).toBe('theirs');
    expect(result.current.editing.base.version).toBe(2);
    expect(result.current.editing.note).toBe('');
    expect(result.current.editing.conflict).toBeNull();
    expect(result.current.editing.dirty).toBe(false);
  });

  it('without marking the carry-over, the page is only as edited as its values', async () => {
    const { result } = renderHook(() =>
      useDescriptionPage(
        first,
        async () => {
          throw conflictError(revision(2, { ...demoInput, description: 'mine' }));
        },
        { markCarried: false },
      ),
    );
    act(() => result.current.setText('mine'));
    await act(() => result.current.editing.saveNow());
    act(() => result.current.editing.carryOver());
    expect(result.current.editing.carried).toBeNull();
    // They saved the same text: nothing of mine is left to save.
    expect(result.current.editing.dirty).toBe(false);
  });
});

describe('revision editing — the note and newer revisions', () => {
  it('counts a note typed alone as the page says', () => {
    const cases: [NoteAlone, boolean, boolean][] = [
      ['saves', true, true],
      ['guards', true, false],
      ['ignored', false, false],
    ];
    for (const [noteAlone, dirty, canSave] of cases) {
      const { result, unmount } = renderHook(() =>
        useDescriptionPage(first, async (a) => savedFrom(a), { noteAlone }),
      );
      act(() => result.current.editing.setNote('just a note'));
      expect([noteAlone, result.current.editing.dirty, result.current.editing.canSave]).toEqual([
        noteAlone,
        dirty,
        canSave,
      ]);
      unmount();
    }
  });

  it('takes a newer revision from elsewhere when nothing is edited, and only tells of it otherwise', () => {
    const save = async (a: SaveArgs) => savedFrom(a);
    const clean = renderHook(({ a }) => useDescriptionPage(a, save), { initialProps: { a: first } });
    clean.rerender({ a: theirs });
    expect(clean.result.current.editing.base.version).toBe(2);
    expect(clean.result.current.text).toBe('theirs');
    expect(clean.result.current.editing.newerElsewhere).toBeNull();

    const edited = renderHook(({ a }) => useDescriptionPage(a, save), { initialProps: { a: first } });
    act(() => edited.result.current.setText('mine'));
    edited.rerender({ a: theirs });
    expect(edited.result.current.editing.base.version).toBe(1);
    expect(edited.result.current.text).toBe('mine');
    expect(edited.result.current.editing.newerElsewhere?.revision).toBe(2);
  });
});
