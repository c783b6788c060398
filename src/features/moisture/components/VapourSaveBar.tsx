import { useEffect } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { formatDateTime } from '../../../lib/format';
import type { VapourEditing } from '../use-vapour-editing';
import { draftOf, KIND_SYMBOLS, KIND_UNITS } from '../vapour-draft';

const vapourWords = (v: Parameters<typeof draftOf>[0]) => {
  const d = draftOf(v);
  if (d.kind === 'none') return 'not entered';
  const unit = KIND_UNITS[d.kind];
  return `${KIND_SYMBOLS[d.kind]} ${d.text}${unit === '–' ? '' : ` ${unit}`}`;
};

/**
 * Saving the vapour data as a new revision of the assembly, with a revision note; a stale save shows who
 * saved first and lets the person carry their entries over or load the saved revision.
 */
export function VapourSaveBar({ editing, resultReady }: { editing: VapourEditing; resultReady: boolean }) {
  const { base, conflict, carried, dirty, saving, savedAs, problem, note, setNote, newerElsewhere, layers } =
    editing;
  const next = base.version + 1;

  // Unsaved vapour data: ask before leaving (in-app links and the browser alike).
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
            Your entries are kept. When you save, you will be asked whether to carry them over or load theirs.
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
            editing revision <span className="num">{base.version}</span>. Nothing of yours has been saved.
          </p>
          {conflict.merged ? (
            <p>
              <strong>Carry my entries over</strong> starts from revision {conflict.theirs.revision} and puts
              back every vapour value you changed
              {conflict.bothChanged.length > 0
                ? ` — where you both changed a layer (${conflict.bothChanged.map((i) => layers[i]?.name ?? `layer ${i + 1}`).join(', ')}), yours is kept`
                : ''}
              . Nothing is saved until you save again.
            </p>
          ) : (
            <>
              <p>
                The layers themselves changed in revision {conflict.theirs.revision} (added, removed or
                moved), so your vapour entries cannot be matched to layers. Load their revision and enter them
                again; yours were:
              </p>
              <ul className="num list-disc pl-5">
                {layers
                  .map((l, i) => ({
                    name: l.name,
                    key: `${i}:${l.name}`,
                    words: vapourWords(conflict.mine[i]),
                  }))
                  .map((row) => (
                    <li key={row.key}>
                      <span className="font-sans">{row.name}</span>: {row.words}
                    </li>
                  ))}
              </ul>
            </>
          )}
          <div className="flex flex-wrap gap-3 pt-1">
            {conflict.merged ? (
              <Button variant="secondary" onClick={editing.carryOver}>
                Carry my entries over
              </Button>
            ) : null}
            <Button variant="secondary" onClick={() => editing.loadTheirs(conflict.theirs)}>
              Load theirs (discard my entries)
            </Button>
          </div>
        </Notice>
      ) : carried ? (
        <Notice
          tone="info"
          title={`Your entries are now on top of revision ${carried.onto}. Check them, then save as revision ${carried.onto + 1}.`}
        />
      ) : null}

      {blocker.state === 'blocked' ? (
        <Notice tone="warning" title="The vapour data have edits that are not saved." live>
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
          aria-label="Save the vapour data"
          onSubmit={(e) => {
            e.preventDefault();
            void editing.saveNow();
          }}
        >
          <Field
            label="Revision note"
            hint="What changed, and why (kept with the revision)."
            className="min-w-64 flex-1"
          >
            {(c) => (
              <TextInput
                {...c}
                value={note}
                maxLength={500}
                onChange={(e) => setNote(e.target.value)}
                placeholder="e.g. vapour retarder from the maker’s test report"
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
                Save vapour data as revision {next}
              </Button>
            </div>
            {savedAs !== null && !dirty ? (
              <p role="status" className="text-xs">
                <span aria-hidden="true">✓ </span>Saved as revision {savedAs}.
              </p>
            ) : !dirty ? (
              <p className="text-xs text-ink-muted">No changes to save.</p>
            ) : !resultReady ? (
              <p className="text-xs text-ink-muted">
                Saving is allowed while the result waits for other data (the climate, other layers).
              </p>
            ) : null}
          </div>
        </form>
      </div>
    </div>
  );
}
