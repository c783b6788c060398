import { WALL_CATEGORIES, WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import type { CriteriaSave, CriteriaSet, CriteriaSetMeta } from '@shared/schemas/criteria';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { useSaveCriteriaMeta } from '../api/save-criteria';
import { CriteriaTextFields } from './CriteriaTextFields';

const KEYS_BEFORE_DATE = ['name', 'jurisdiction', 'edition'] as const;

const metaOf = (s: CriteriaSet): CriteriaSetMeta => ({
  name: s.name,
  jurisdiction: s.jurisdiction,
  edition: s.edition,
  effectiveDate: s.effectiveDate,
  notes: s.notes,
  sourceReference: s.sourceReference,
  categoryLabels: s.categoryLabels,
});

/** The table's details and its own names for the wall categories. */
export function CriteriaMetaForm({
  set,
  onSaved,
  onCancel,
}: {
  set: CriteriaSet;
  onSaved: (saved: CriteriaSave) => void;
  onCancel: () => void;
}) {
  const [meta, setMeta] = useState<CriteriaSetMeta>(() => metaOf(set));
  const edit = (patch: Partial<CriteriaSetMeta>) => setMeta({ ...meta, ...patch });
  const save = useSaveCriteriaMeta();
  const fields = isApiRequestError(save.error) ? (save.error.fields ?? {}) : {};
  return (
    <form
      className="flex max-w-form flex-col gap-4"
      onSubmit={submitting(async () =>
        onSaved(await save.mutateAsync({ setId: set.id, revision: set.revision, changes: meta })),
      )}
    >
      {set.frozenAt ? (
        <Notice
          tone="info"
          title={`Saving creates version ${set.version + 1}; version ${set.version} is frozen.`}
        />
      ) : null}
      <CriteriaTextFields
        keys={KEYS_BEFORE_DATE}
        values={meta}
        onChange={edit}
        errorOf={(k) => fields[`changes.${k}`]}
      />
      <Field label="Effective date" error={fields['changes.effectiveDate']}>
        {(c) => (
          <TextInput
            {...c}
            type="date"
            value={meta.effectiveDate ?? ''}
            onChange={(e) => edit({ effectiveDate: e.target.value || null })}
          />
        )}
      </Field>
      <CriteriaTextFields
        keys={['sourceReference']}
        values={meta}
        onChange={edit}
        errorOf={(k) => fields[`changes.${k}`]}
      />
      <Field label="Notes" error={fields['changes.notes']}>
        {(c) => <TextArea {...c} value={meta.notes} onChange={(e) => edit({ notes: e.target.value })} />}
      </Field>
      <fieldset className="flex flex-col gap-3 border-t border-rule pt-3">
        <legend className="text-sm font-semibold">The table’s names for the wall categories</legend>
        <p className="text-sm text-ink-muted">
          Assemblies carry one of these categories; a table may call them by its own names. Leave a box empty
          for the standard name.
        </p>
        {WALL_CATEGORIES.map((c) => (
          <Field key={c} label={WALL_CATEGORY_LABELS[c]}>
            {(ctl) => (
              <TextInput
                {...ctl}
                value={meta.categoryLabels[c] ?? ''}
                onChange={(e) => {
                  const labels = { ...meta.categoryLabels };
                  if (e.target.value.trim() === '') delete labels[c];
                  else labels[c] = e.target.value;
                  edit({ categoryLabels: labels });
                }}
              />
            )}
          </Field>
        ))}
      </fieldset>
      {save.isError ? <Notice tone="caution" title={errorMessage(save.error)} live /> : null}
      <div className="flex gap-3">
        <Button type="submit" variant="primary" busy={save.isPending} busyLabel="Saving…">
          Save details
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
