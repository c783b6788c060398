import type { Assembly } from '@shared/schemas/assembly';
import { type ReactNode, useEffect, useRef, useState } from 'react';
import { useBlocker } from 'react-router';
import { formatDateTime } from '../../lib/format';
import { isTextField, type RevisionSaving } from '../../lib/use-revision-editing';
import { Button } from './Button';
import { ConfirmDialog } from './ConfirmDialog';
import { Field } from './Field';
import { Notice } from './Notice';
import { TextInput } from './TextInput';

/** The words of one page in its save bar and notices. */
export interface RevisionSaveWords {
  /** What the person's unsaved work is called: “Your entries are kept”, “Load theirs (discard my entries)”. */
  yours: string;
  /** The carry-over button, e.g. “Carry my values over”. */
  carry: string;
  /** How the notice after carrying over names the work (“Your changes are now on top of …”; default `yours`). */
  carried?: string;
  /** The title of the notice that asks before leaving with unsaved edits. */
  unsaved: string;
  /** The part of the assembly the page saves, named in the button (“Save vapour data as revision 4”). */
  part?: string;
  /** Form name of the bar when it is a form of its own (“Save the vapour data”). */
  formLabel?: string;
  noteHint?: string;
  notePlaceholder: string;
  /** The conflict notice adds “, and your … are still on this page” (default true). */
  stillOnPage?: boolean;
}

interface RevisionSaveBarProps {
  editing: RevisionSaving;
  words: RevisionSaveWords;
  /** Save submits the form the bar stands in (the builder); otherwise it submits the bar's own form when
   * `words.formLabel` names one, else it is a button of its own. */
  inForm?: boolean;
  /** Figures shown live at the left of the bar. */
  live?: ReactNode;
  /** The page's own paragraphs in the conflict notice, after who saved when. */
  conflictDetail?: ReactNode;
  /** More in the notice after carrying over (e.g. the values both changed). */
  carriedDetail?: ReactNode;
  /** A line under Save while there are edits. */
  dirtyHint?: ReactNode;
  /** Offer “Discard my edits” (back to the saved revision at once). */
  undo?: boolean;
  /** Show the “newer revision elsewhere” notice here (false: the page shows `NewerRevisionNotice` itself). */
  showNewer?: boolean;
  /** Bring the conflict notice into view when it appears. */
  scrollToConflict?: boolean;
  /** Of the wrapper: `contents` lets the notices stand in the page's own column. */
  className?: string;
}

/** Someone saved a newer revision while this person has edits. */
export function NewerRevisionNotice({ newer, yours }: { newer: Assembly | null; yours: string }) {
  if (!newer) return null;
  return (
    <Notice
      tone="warning"
      title={`Revision ${newer.revision} was saved by someone else while you were editing.`}
    >
      <p>
        Your {yours} are kept. When you save, you will be asked whether to carry them over or load theirs.
      </p>
    </Notice>
  );
}

/**
 * Saving a page's edits as a new revision of the assembly, with a revision note: asks before leaving with unsaved
 * edits; a stale save shows who saved first and lets the person carry their edits over or load the saved revision;
 * the server's refusals are listed. The same on every assembly page; the page brings its words.
 */
/** The bar's Undo and Redo buttons: word, tooltip and the keys that do the same (handled in the bar). */
const STEP_BUTTONS = {
  undo: { label: 'Undo', title: 'Undo the last change (Ctrl+Z)', keys: 'Control+Z Meta+Z' },
  redo: {
    label: 'Redo',
    title: 'Redo (Ctrl+Shift+Z or Ctrl+Y)',
    keys: 'Control+Shift+Z Control+Y Meta+Shift+Z',
  },
};

export function RevisionSaveBar({
  editing,
  words,
  inForm = false,
  live,
  conflictDetail,
  carriedDetail,
  dirtyHint,
  undo = false,
  showNewer = true,
  scrollToConflict = false,
  className = 'flex flex-col gap-4',
}: RevisionSaveBarProps) {
  const { base, conflict, carried, dirty, canSave, saving, savedAs, problem, note, setNote, leaving } =
    editing;
  const conflictRef = useRef<HTMLDivElement>(null);
  // On a phone the bar is one line — live figures or the status, and Save; the note and Undo / Redo fold away.
  const [more, setMore] = useState(false);
  const folded = more ? '' : 'max-sm:hidden';
  // The status line: beside Save on a phone, unless the live figures stand there (then it folds away too).
  const status = live
    ? `max-sm:order-last max-sm:min-w-full ${folded}`
    : 'max-sm:order-first max-sm:min-w-0 max-sm:flex-1 max-sm:truncate';
  const { history } = editing;
  const stepsOpen = !saving && conflict === null;
  const canUndo = stepsOpen && history.canUndo;
  const canRedo = stepsOpen && history.canRedo;

  // Ctrl+Z / Ctrl+Shift+Z / Ctrl+Y (⌘ on a Mac) step through the page's values — except in a text box,
  // whose own undo of its text stays native.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey || isTextField(e.target)) return;
      const k = e.key.toLowerCase();
      const step = k === 'z' ? (e.shiftKey ? 'redo' : 'undo') : k === 'y' && !e.shiftKey ? 'redo' : null;
      if (step === 'undo' && canUndo) history.undo();
      else if (step === 'redo' && canRedo) history.redo();
      else return;
      e.preventDefault();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [canUndo, canRedo, history]);

  // Unsaved edits: ask before leaving the page (in-app links and the browser alike).
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty &&
      !leaving.current &&
      (currentLocation.pathname !== nextLocation.pathname || currentLocation.search !== nextLocation.search),
  );
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  useEffect(() => {
    if (conflict && scrollToConflict)
      requestAnimationFrame(() => conflictRef.current?.scrollIntoView({ block: 'center' }));
  }, [conflict, scrollToConflict]);

  const row = 'flex flex-wrap items-center gap-x-3 gap-y-3 sm:items-end sm:gap-x-6';
  const saveButton = (
    <Button
      type={inForm || words.formLabel ? 'submit' : 'button'}
      variant="primary"
      busy={saving}
      busyLabel="Saving…"
      disabled={conflict !== null || !canSave}
      onClick={inForm || words.formLabel ? undefined : () => void editing.saveNow()}
    >
      {base ? (
        // One text box (the button spaces its children apart); on a phone the rest is for screen readers only.
        <span>
          Save{' '}
          <span className="max-sm:sr-only">
            {`${words.part ? `${words.part} ` : ''}as revision ${base.version + 1}`}
          </span>
        </span>
      ) : (
        'Create assembly'
      )}
    </Button>
  );
  const stepOn = { undo: canUndo, redo: canRedo };
  const steps = (
    <div className={`flex gap-2 max-sm:order-last ${folded}`}>
      {(['undo', 'redo'] as const).map((step) => (
        <Button
          key={step}
          variant="quiet"
          onClick={history[step]}
          disabled={!stepOn[step]}
          title={STEP_BUTTONS[step].title}
          aria-keyshortcuts={STEP_BUTTONS[step].keys}
        >
          {STEP_BUTTONS[step].label}
        </Button>
      ))}
    </div>
  );
  const content = (
    <>
      {live ? (
        <div className="min-w-0 max-sm:flex-1 max-sm:overflow-hidden max-sm:[&_.label-caps]:sr-only max-sm:[&>*]:min-w-0">
          {live}
        </div>
      ) : null}
      {base ? (
        <Field
          label="Revision note"
          hint={words.noteHint ?? 'What changed, and why (kept with the revision).'}
          className={`min-w-64 flex-1 max-sm:order-last max-sm:min-w-full ${folded}`}
        >
          {(c) => (
            <TextInput
              {...c}
              value={note}
              maxLength={500}
              onChange={(e) => setNote(e.target.value)}
              placeholder={words.notePlaceholder}
              className="py-1.5 text-sm"
            />
          )}
        </Field>
      ) : (
        <p className={`flex-1 text-sm text-ink-muted max-sm:order-last max-sm:min-w-full ${folded}`}>
          The first save creates revision 1.
        </p>
      )}
      <div className="flex flex-col items-end gap-1 max-sm:contents">
        <div className="flex flex-wrap justify-end gap-3 max-sm:contents">
          {steps}
          {undo && dirty ? (
            <Button
              variant="quiet"
              onClick={editing.discard}
              disabled={saving}
              className={`max-sm:order-last ${folded}`}
            >
              Discard my edits
            </Button>
          ) : null}
          <Button
            variant="quiet"
            className="ml-auto sm:hidden"
            aria-expanded={more}
            onClick={() => setMore((open) => !open)}
          >
            {more ? 'Less' : 'More'}
          </Button>
          {saveButton}
        </div>
        {history.removed && canUndo ? (
          <p role="status" className="flex items-center gap-2 text-xs max-sm:min-w-full">
            Removed {history.removed} —
            <button type="button" className="underline underline-offset-2" onClick={history.undo}>
              Undo
            </button>
          </p>
        ) : null}
        {savedAs !== null && !dirty ? (
          <p role="status" className={`text-xs ${status}`}>
            <span aria-hidden="true">✓ </span>Saved as revision {savedAs}.
          </p>
        ) : base && !dirty ? (
          <p className={`text-xs text-ink-muted ${status}`}>No changes to save.</p>
        ) : dirtyHint ? (
          <p className={`text-xs text-ink-muted ${status}`}>{dirtyHint}</p>
        ) : dirty ? (
          <p className={`text-xs text-ink-muted sm:hidden ${status}`}>Not saved yet.</p>
        ) : null}
      </div>
    </>
  );

  return (
    <div className={className}>
      {showNewer ? <NewerRevisionNotice newer={editing.newerElsewhere} yours={words.yours} /> : null}

      {conflict ? (
        <div ref={conflictRef}>
          <Notice tone="warning" title="Someone else saved this assembly first." live>
            <p>
              Revision <span className="num">{conflict.theirs.revision}</span> was saved
              {conflict.theirs.current.createdBy ? ` by ${conflict.theirs.current.createdBy}` : ''} at{' '}
              <span className="num">{formatDateTime(conflict.theirs.current.createdAt)}</span>
              {conflict.theirs.current.note ? ` (“${conflict.theirs.current.note}”)` : ''} while you were
              editing revision <span className="num">{base?.version}</span>. Nothing of yours has been saved
              {words.stillOnPage === false ? '' : `, and your ${words.yours} are still on this page`}.
            </p>
            {conflictDetail}
            <div className="flex flex-wrap gap-3 pt-1">
              {conflict.carry ? (
                <Button variant="secondary" onClick={editing.carryOver}>
                  {words.carry}
                </Button>
              ) : null}
              <Button variant="secondary" onClick={editing.loadTheirs}>
                Load theirs (discard my {words.yours})
              </Button>
            </div>
          </Notice>
        </div>
      ) : carried ? (
        <Notice
          tone="info"
          title={`Your ${words.carried ?? words.yours} are now on top of revision ${carried.onto}. Check them, then save as revision ${carried.onto + 1}.`}
        >
          {carriedDetail}
        </Notice>
      ) : null}

      <ConfirmDialog
        open={blocker.state === 'blocked'}
        title={words.unsaved}
        confirmLabel="Leave without saving"
        confirmVariant="danger"
        cancelLabel="Stay and keep editing"
        onConfirm={() => {
          leaving.current = true;
          blocker.proceed?.();
        }}
        onCancel={() => blocker.reset?.()}
      >
        <p>If you leave now they are lost. Stay to save them as a new revision first.</p>
      </ConfirmDialog>

      {problem ? (
        <Notice tone="caution" title="Not saved." live>
          {problem.map((m) => (
            <p key={m}>{m}</p>
          ))}
        </Notice>
      ) : null}

      <div className="sticky bottom-0 z-10 -mx-4 border-t-2 border-ink bg-paper px-4 py-2 sm:-mx-6 sm:py-3 sm:px-6 print:hidden">
        {words.formLabel ? (
          <form
            className={row}
            aria-label={words.formLabel}
            onSubmit={(e) => {
              e.preventDefault();
              void editing.saveNow();
            }}
          >
            {content}
          </form>
        ) : (
          <div className={row}>{content}</div>
        )}
      </div>
    </div>
  );
}
