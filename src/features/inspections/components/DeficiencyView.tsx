import { can, type ProjectRole } from '@shared/auth/permissions';
import {
  DEFICIENCY_TRANSITIONS,
  type Deficiency,
  type DeficiencyTransition,
  type Inspection,
} from '@shared/inspections/schema';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { TextArea } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { useDeficiencyStep } from '../api/mutations';
import { shrinkPhoto } from '../photo';
import { DeficiencyDetailsForm } from './DeficiencyDetailsForm';
import { PhotoButton } from './PhotoButton';
import { DeficiencyStateMark, DueMark } from './StateMark';

const STEP_WORDS: Record<DeficiencyTransition, string> = {
  correct: 'Mark corrected',
  accept: 'Accept the correction',
  reopen: 'Reopen',
};

/** Who may take a step: the crew corrects, the inspectors accept and reopen (shared/auth/permissions). */
const mayTake = (role: ProjectRole | null, step: DeficiencyTransition) =>
  can(role, step === 'correct' ? 'deficiency.correct' : 'deficiency.review');

/**
 * One deficiency: what is wrong, on which item, who owns it and by when, its state; the steps the person's role
 * may take from here — correct (with a photo of the correction), accept, or reopen (saying what is still wrong).
 */
export function DeficiencyView({
  inspection,
  deficiency: d,
  role,
  readOnly,
}: {
  inspection: Inspection;
  deficiency: Deficiency;
  role: ProjectRole | null;
  readOnly: boolean;
}) {
  const id = useId();
  const [note, setNote] = useState('');
  const [photo, setPhoto] = useState<File>();
  const [photoProblem, setPhotoProblem] = useState<string>();
  const step = useDeficiencyStep(inspection.id, d.id);
  const item = inspection.items.find((i) => i.id === d.itemId);
  const correction = item?.photos.find((p) => p.id === d.correctionPhotoId);
  const steps = (Object.keys(DEFICIENCY_TRANSITIONS) as DeficiencyTransition[]).filter(
    (s) => (DEFICIENCY_TRANSITIONS[s].from as readonly string[]).includes(d.state) && mayTake(role, s),
  );
  const fields = isApiRequestError(step.error) ? (step.error.fields ?? {}) : {};

  return (
    <div className="flex flex-col gap-6">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-base">
        <dt className="font-semibold">State</dt>
        <dd data-testid="deficiency-state">
          <DeficiencyStateMark state={d.state} />
        </dd>
        <dt className="font-semibold">Item</dt>
        <dd className="min-w-0 [overflow-wrap:anywhere]">{d.itemLabel}</dd>
        <dt className="font-semibold">What is wrong</dt>
        <dd className="min-w-0 [overflow-wrap:anywhere]">{d.description || '—'}</dd>
        <dt className="font-semibold">Owner</dt>
        <dd className="min-w-0 [overflow-wrap:anywhere]" data-testid="deficiency-owner">
          {d.ownerName ?? 'nobody yet'}
        </dd>
        <dt className="font-semibold">Due</dt>
        <dd>
          <DueMark deficiency={d} word={false} />
        </dd>
        {d.note ? (
          <>
            <dt className="font-semibold">Latest note</dt>
            <dd className="min-w-0 [overflow-wrap:anywhere]">{d.note}</dd>
          </>
        ) : null}
      </dl>
      {item?.note ? <p className="text-sm">{`Inspector’s note on the item: ${item.note}`}</p> : null}
      {correction ? (
        <figure className="flex flex-col gap-1">
          <img
            src={correction.url}
            alt={`The correction of ${d.itemLabel}`}
            className="max-h-72 w-fit max-w-full border border-rule"
          />
          <figcaption className="text-sm text-ink-muted">Photo of the correction</figcaption>
        </figure>
      ) : null}

      {!readOnly && can(role, 'deficiency.review') ? (
        <DeficiencyDetailsForm projectId={inspection.projectId} inspectionId={inspection.id} deficiency={d} />
      ) : null}

      {readOnly || steps.length === 0 ? null : (
        <section
          aria-labelledby={`${id}-h`}
          className="flex flex-col gap-4 border border-ink bg-paper-raised p-4"
        >
          <h3 id={`${id}-h`} className="text-xl">
            Next step
          </h3>
          {step.error ? <Notice tone="caution" live title={errorMessage(step.error)} /> : null}
          {steps.includes('correct') ? (
            <div className="flex flex-col gap-2">
              <PhotoButton
                id={`${id}-photo`}
                onFile={async (file) => {
                  setPhotoProblem(undefined);
                  if (!file) return;
                  try {
                    setPhoto(await shrinkPhoto(file, { keepLocation: false }));
                  } catch (err) {
                    setPhotoProblem(err instanceof Error ? err.message : 'The photo could not be read.');
                  }
                }}
              >
                Photo of the correction
              </PhotoButton>
              {photo ? (
                <p className="text-sm" data-testid="correction-photo-ready">{`✓ ${photo.name} ready`}</p>
              ) : null}
              {photoProblem || fields.photoId ? (
                <p
                  role="alert"
                  className="text-sm font-semibold text-caution"
                >{`✕ ${photoProblem ?? fields.photoId}`}</p>
              ) : null}
            </div>
          ) : null}
          <label className="flex flex-col gap-1 text-sm font-semibold">
            {steps.includes('reopen') ? 'Note (to reopen: what is still wrong)' : 'Note'}
            <TextArea
              rows={3}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              aria-invalid={Boolean(fields.note)}
            />
          </label>
          {fields.note ? <p className="text-sm font-semibold text-caution">{`✕ ${fields.note}`}</p> : null}
          <div className="flex flex-wrap gap-3">
            {steps.map((s) => (
              <Button
                key={s}
                variant={s === 'reopen' ? 'danger' : 'primary'}
                className="min-h-12 text-base"
                busy={step.isPending && step.variables?.step === s}
                disabled={(s === 'correct' && !photo) || (s === 'reopen' && note.trim() === '')}
                onClick={() =>
                  step.mutate(
                    {
                      step: s,
                      version: d.version,
                      note,
                      itemId: d.itemId,
                      photo: s === 'correct' ? photo : undefined,
                    },
                    { onSuccess: () => setNote('') },
                  )
                }
              >
                {STEP_WORDS[s]}
              </Button>
            ))}
          </div>
        </section>
      )}
    </div>
  );
}
