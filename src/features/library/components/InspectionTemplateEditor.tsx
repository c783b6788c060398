import { type InspectionTemplate, TEMPLATE_MAX_ITEMS } from '@shared/inspections/schema';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { conflictingTemplate, useSaveInspectionTemplate } from '../api/inspection-template';
import {
  blankTemplateDraft,
  fromTemplateDrafts,
  type TemplateDraft,
  type TemplateDraftErrors,
  toTemplateDrafts,
} from '../template-draft';

/** "Version 3, made … · frozen: …, so saving makes version 4" — and, for an editor, what a save will do. */
function versionText(t: InspectionTemplate | null, editing: boolean) {
  if (!t) return editing ? 'No template yet: the first save makes version 1.' : 'No template yet.';
  const made = `Version ${t.version}, made ${formatDate(t.createdAt)}`;
  if (!editing) return t.frozen ? `${made} · used by an inspection.` : `${made}.`;
  return t.frozen
    ? `${made} · frozen: an inspection uses it, so saving makes version ${t.version + 1}.`
    : `${made} · not used by an inspection yet, so saving changes it.`;
}

/** The firm's own checklist items as a list, for those who may not change them. */
function TemplateItems({ template }: { template: InspectionTemplate | null }) {
  if (!template || template.items.length === 0)
    return <p className="text-sm">The firm has no checklist items of its own.</p>;
  return (
    <ol className="flex list-decimal flex-col gap-2 pl-6 text-sm">
      {template.items.map((i) => (
        <li key={`${i.group}:${i.label}:${i.designText}`}>
          <span className="font-semibold">{i.label}</span>
          {i.designText ? <span className="block text-ink-muted">{i.designText}</span> : null}
        </li>
      ))}
    </ol>
  );
}

/**
 * The firm's checklist template: items added to every inspection of its projects, looked at (not measured).
 * Editors and administrators change it; a version an inspection used is frozen, so a save makes the next.
 */
export function InspectionTemplateEditor({
  orgId,
  template,
  mayWrite,
}: {
  orgId: string;
  template: InspectionTemplate | null;
  mayWrite: boolean;
}) {
  const save = useSaveInspectionTemplate(orgId);
  // The version the drafts were read from: its revision goes with the save.
  const [base, setBase] = useState(template);
  const [drafts, setDrafts] = useState(() => toTemplateDrafts(template));
  const [errors, setErrors] = useState<TemplateDraftErrors>({});
  const [problem, setProblem] = useState<string | undefined>();
  const [theirs, setTheirs] = useState<InspectionTemplate | null>(null);
  const [saved, setSaved] = useState(false);

  if (!mayWrite)
    return (
      <div className="flex flex-col gap-3">
        <p className="text-sm text-ink-muted">{versionText(template, false)}</p>
        <TemplateItems template={template} />
      </div>
    );

  const edit = (key: string, change: Partial<TemplateDraft>) => {
    setSaved(false);
    setDrafts((list) => list.map((d) => (d.key === key ? { ...d, ...change } : d)));
  };
  const submit = (over: InspectionTemplate | null) => {
    const result = fromTemplateDrafts(drafts);
    setErrors(result.ok ? {} : result.errors);
    setProblem(result.ok ? undefined : (result.message ?? 'Some items need a change; see each one.'));
    if (!result.ok) return;
    save.mutate(
      { revision: over?.revision, items: result.items },
      {
        onSuccess: (t) => {
          setBase(t);
          setTheirs(null);
          setSaved(true);
        },
        onError: (e) => setTheirs(conflictingTemplate(e)),
      },
    );
  };
  const keepTheirs = (t: InspectionTemplate) => {
    setBase(t);
    setDrafts(toTemplateDrafts(t));
    setErrors({});
    setTheirs(null);
    save.reset();
  };

  return (
    <form
      className="flex flex-col gap-4"
      aria-label="Firm checklist items"
      onSubmit={(e) => {
        e.preventDefault();
        submit(base);
      }}
      noValidate
    >
      <p className="text-sm text-ink-muted">{versionText(base, true)}</p>
      {drafts.length === 0 ? (
        <p className="text-sm">No items yet. Add the checks your firm makes on every wall.</p>
      ) : (
        <ol className="flex flex-col gap-3">
          {drafts.map((d, n) => (
            <li
              key={d.key}
              className="grid gap-3 border border-rule bg-paper-raised p-3 sm:grid-cols-[1fr_1fr_auto] sm:items-start"
            >
              <Field label={`Item ${n + 1}`} required error={errors[d.key]?.label}>
                {(c) => (
                  <TextInput
                    {...c}
                    value={d.label}
                    placeholder="e.g. Offcuts and swarf cleared from the panels"
                    onChange={(e) => edit(d.key, { label: e.target.value })}
                  />
                )}
              </Field>
              <Field label="What to look for" hint="Optional" error={errors[d.key]?.designText}>
                {(c) => (
                  <TextInput
                    {...c}
                    value={d.designText}
                    onChange={(e) => edit(d.key, { designText: e.target.value })}
                  />
                )}
              </Field>
              <Button
                variant="quiet"
                className="justify-self-start sm:mt-7"
                aria-label={`Remove item ${n + 1}${d.label ? ` (${d.label})` : ''}`}
                onClick={() => {
                  setSaved(false);
                  setDrafts((list) => list.filter((x) => x.key !== d.key));
                }}
              >
                Remove
              </Button>
            </li>
          ))}
        </ol>
      )}
      {problem ? <Notice tone="caution" title={problem} live /> : null}
      {theirs ? (
        <Notice
          tone="warning"
          live
          title={`Someone saved the checklist template after you opened it (now version ${theirs.version}).`}
        >
          <TemplateItems template={theirs} />
          <div className="mt-3 flex flex-wrap gap-2">
            <Button onClick={() => submit(theirs)} busy={save.isPending} busyLabel="Saving…">
              Save mine over theirs
            </Button>
            <Button variant="quiet" onClick={() => keepTheirs(theirs)}>
              Keep theirs
            </Button>
          </div>
        </Notice>
      ) : save.isError ? (
        <Notice tone="caution" title={errorMessage(save.error)} live />
      ) : null}
      {saved ? (
        <p role="status" className="text-sm font-semibold">
          <span aria-hidden="true">✓ </span>Saved as version {base?.version}.
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button
          disabled={drafts.length >= TEMPLATE_MAX_ITEMS}
          onClick={() => {
            setSaved(false);
            setDrafts((list) => [...list, blankTemplateDraft()]);
          }}
        >
          Add an item
        </Button>
        <Button type="submit" variant="primary" busy={save.isPending && !theirs} busyLabel="Saving…">
          Save the template
        </Button>
      </div>
    </form>
  );
}
