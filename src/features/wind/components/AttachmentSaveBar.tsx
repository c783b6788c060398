import { useEffect } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { formatDateTime } from '../../../lib/format';
import type { AttachmentEditing } from '../use-attachment-editing';

/**
 * Saving the attachment inputs as a new revision of the assembly, with a revision note; a stale save shows who saved
 * first and lets the person carry their values over or load the saved revision.
 */
export function AttachmentSaveBar({ editing }: { editing: AttachmentEditing }) {
  const { base, conflict, carried, dirty, saving, savedAs, problem, note, setNote, newerElsewhere } = editing;
  const next = base.version + 1;

  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  return (
    <div className="flex flex-col gap-4">
      {newerElsewhere ? (
        <Notice
          tone="warning"
          title={`Revision ${newerElsewhere.revision} was saved by someone else while you were editing.`}
        >
          <p>
            Your values are kept. When you save, you will be asked whether to carry them over or load theirs.
          </p>
        </Notice>
      ) : null}

      {conflict ? (
        <Notice tone="warning" title="Someone else saved this assembly first." live>
          <p>
            Revision <span className="num">{conflict.theirs.revision}</span> was saved
            {conflict.theirs.current.createdBy ? ` by ${conflict.theirs.current.createdBy}` : ''} at{' '}
            <span className="num">{formatDateTime(conflict.theirs.current.createdAt)}</span>
            {conflict.theirs.current.note ? ` (“${conflict.theirs.current.note}”)` : ''} while you were
            editing revision <span className="num">{base.version}</span>. Nothing of yours has been saved, and
            your values are still on this page.
          </p>
          <p>
            <strong>Carry my values over</strong> starts from revision {conflict.theirs.revision} and puts
            your design spacings, panel table and clip on top of it; their other changes (build-up, vapour,
            joints) stay.
            {conflict.theyChangedWind
              ? ' They also changed the wind inputs of this sheet — yours replace theirs, so compare first.'
              : ''}{' '}
            Nothing is saved until you save again.
          </p>
          <div className="flex flex-wrap gap-3 pt-1">
            <Button variant="secondary" onClick={editing.carryOver}>
              Carry my values over
            </Button>
            <Button variant="secondary" onClick={() => editing.loadTheirs(conflict.theirs)}>
              Load theirs (discard my values)
            </Button>
          </div>
        </Notice>
      ) : carried ? (
        <Notice
          tone="info"
          title={`Your values are now on top of revision ${carried.onto}. Check them, then save as revision ${carried.onto + 1}.`}
        />
      ) : null}

      {blocker.state === 'blocked' ? (
        <Notice tone="warning" title="The attachment sheet has edits that are not saved." live>
          <div className="flex flex-wrap gap-3 pt-1">
            <Button variant="secondary" onClick={() => blocker.reset?.()}>
              Stay and keep editing
            </Button>
            <Button variant="danger" onClick={() => blocker.proceed?.()}>
              Leave without saving
            </Button>
          </div>
        </Notice>
      ) : null}

      {problem ? (
        <Notice tone="caution" title="Not saved." live>
          {problem.map((m) => (
            <p key={m}>{m}</p>
          ))}
        </Notice>
      ) : null}

      <div className="sticky bottom-0 z-10 -mx-4 border-t-2 border-ink bg-paper px-4 py-3 sm:-mx-6 sm:px-6">
        <form
          className="flex flex-wrap items-end gap-x-6 gap-y-3"
          aria-label="Save the attachment inputs"
          onSubmit={(e) => {
            e.preventDefault();
            void editing.saveNow();
          }}
        >
          <Field
            label="Revision note"
            hint="What changed and why; name the maker’s table and clip test you used."
            className="min-w-64 flex-1"
          >
            {(c) => (
              <TextInput
                {...c}
                value={note}
                maxLength={500}
                onChange={(e) => setNote(e.target.value)}
                placeholder="e.g. girts at 1.2 m; load–span table of the 0.7 mm panel, maker’s 2024 catalogue"
                className="py-1.5 text-sm"
              />
            )}
          </Field>
          <div className="flex flex-col items-end gap-1">
            <div className="flex gap-3">
              {dirty ? (
                <Button variant="quiet" onClick={editing.discard} disabled={saving}>
                  Undo my edits
                </Button>
              ) : null}
              <Button
                type="submit"
                variant="primary"
                busy={saving}
                busyLabel="Saving…"
                disabled={conflict !== null || !dirty}
              >
                Save as revision {next}
              </Button>
            </div>
            {savedAs !== null && !dirty ? (
              <p role="status" className="text-xs">
                <span aria-hidden="true">✓ </span>Saved as revision {savedAs}.
              </p>
            ) : !dirty ? (
              <p className="text-xs text-ink-muted">No changes to save.</p>
            ) : null}
          </div>
        </form>
      </div>
    </div>
  );
}
