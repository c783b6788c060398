import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Deficiency } from '@shared/inspections/schema';
import { TEXT_MAX } from '@shared/schemas/common';
import type { Member } from '@shared/schemas/members';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Loading } from '../../../components/ui/Loading';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { useMembers } from '../../members/api/get-members';
import { conflictingDeficiency, useUpdateDeficiency } from '../api/mutations';

/** The owner choices: the project's members, and the current owner if they have left the project since. */
export function ownerChoices(members: Member[], d: Pick<Deficiency, 'ownerId' | 'ownerName'>) {
  const choices = members.map((m) => ({ id: m.userId, text: `${m.name} — ${PROJECT_ROLE_LABELS[m.role]}` }));
  return d.ownerId && !members.some((m) => m.userId === d.ownerId)
    ? [{ id: d.ownerId, text: d.ownerName ?? d.ownerId }, ...choices]
    : choices;
}

/**
 * An inspector sets who owns a deficiency (the server starts it with the project's first subcontractor), by
 * when, and what is wrong. A stale save (someone changed it meanwhile) shows theirs and keeps nothing silently.
 */
export function DeficiencyDetailsForm({
  projectId,
  inspectionId,
  deficiency: d,
}: {
  projectId: string;
  inspectionId: string;
  deficiency: Deficiency;
}) {
  const id = useId();
  const members = useMembers(projectId);
  const update = useUpdateDeficiency(inspectionId, d.id);
  const [conflict, setConflict] = useState(false);
  const [saved, setSaved] = useState(false);
  const fields = isApiRequestError(update.error) ? (update.error.fields ?? {}) : {};
  const failure =
    update.error && !conflict && Object.keys(fields).length === 0 ? errorMessage(update.error) : null;

  return (
    <section
      aria-labelledby={`${id}-h`}
      className="flex flex-col gap-4 border border-ink bg-paper-raised p-4"
    >
      <h3 id={`${id}-h`} className="text-xl">
        Owner and due date
      </h3>
      {conflict ? (
        <Notice tone="warning" title="Someone changed this deficiency after you opened it." live>
          <p>The page now shows their version; your edit was not saved. Make it again on top of theirs.</p>
        </Notice>
      ) : null}
      {failure ? <Notice tone="caution" live title={failure} /> : null}
      {members.isPending ? <Loading what="Loading the people of the project" /> : null}
      {members.isError ? <Notice tone="caution" title={errorMessage(members.error)} /> : null}
      {/* Drawn once the members are in, so the current owner is the chosen option from the start. */}
      {members.data ? (
        <form
          key={d.version}
          className="flex flex-col gap-4"
          onSubmit={(e) => {
            e.preventDefault();
            const form = new FormData(e.currentTarget);
            const text = (k: string) => String(form.get(k) ?? '');
            setConflict(false);
            setSaved(false);
            update.mutate(
              {
                version: d.version,
                ownerId: text('ownerId') || null,
                dueDate: text('dueDate') || null,
                description: text('description'),
              },
              {
                onSuccess: () => setSaved(true),
                onError: (err) => setConflict(conflictingDeficiency(err) !== null),
              },
            );
          }}
        >
          <div className="grid gap-4 sm:grid-cols-2">
            <Field label="Owner" error={fields.ownerId}>
              {(c) => (
                <Select {...c} name="ownerId" defaultValue={d.ownerId ?? ''} className="min-h-12">
                  <option value="">Nobody yet</option>
                  {ownerChoices(members.data.members, d).map((o) => (
                    <option key={o.id} value={o.id}>
                      {o.text}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            <Field label="Due" error={fields.dueDate}>
              {(c) => (
                <TextInput
                  {...c}
                  type="date"
                  name="dueDate"
                  defaultValue={d.dueDate ?? ''}
                  className="min-h-12"
                />
              )}
            </Field>
          </div>
          <Field label="What is wrong" error={fields.description}>
            {(c) => (
              <TextArea
                {...c}
                name="description"
                rows={3}
                maxLength={TEXT_MAX.note}
                defaultValue={d.description}
              />
            )}
          </Field>
          <div className="flex flex-wrap items-center gap-3">
            <Button
              type="submit"
              variant="primary"
              className="min-h-12 text-base"
              busy={update.isPending}
              busyLabel="Saving…"
            >
              Save owner and due date
            </Button>
            {saved && !update.isPending ? (
              <p className="text-sm font-semibold" role="status">
                <span aria-hidden="true">✓ </span>Saved
              </p>
            ) : null}
          </div>
        </form>
      ) : null}
    </section>
  );
}
