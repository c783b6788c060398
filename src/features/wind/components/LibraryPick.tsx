import {
  type AttachmentProduct,
  type AttachmentProductInput,
  attachmentProductInputSchema,
  type ClipProduct,
  type PanelProduct,
} from '@shared/schemas/attachment-library';
import { useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { LabelledSelect } from '../../../components/ui/LabelledSelect';
import { NamedOptions } from '../../../components/ui/Options';
import { TextInput } from '../../../components/ui/TextInput';
import { isApiRequestError } from '../../../lib/api';
import { issueLines } from '../../../lib/issue-words';
import {
  type AttachmentFormValues,
  libraryEntryFrom,
  toFormPath,
  windFieldId,
  withClipProduct,
  withPanelProduct,
} from '../form';

/** The firm library as the page hands it in (features do not import each other). */
export interface AttachmentLibrary {
  orgId: string;
  firmName: string;
  products: readonly AttachmentProduct[];
  /** Where an entry's data sheet downloads from. */
  dataSheetHref: (productId: string) => string;
  /** Saves an entry to the library; absent when the person's firm role only reads it. */
  save?: (input: AttachmentProductInput) => Promise<AttachmentProduct>;
  errorText: (error: unknown) => string;
}

interface Props {
  kind: 'panel' | 'clip';
  form: UseFormReturn<AttachmentFormValues>;
  values: AttachmentFormValues;
  errors: Record<string, string>;
  disabled: boolean;
  library: AttachmentLibrary | null;
}

const WORDS = {
  panel: { what: 'load–span table', source: 'tableSource', id: 'tableProductId' },
  clip: { what: 'clip capacity', source: 'clipSource', id: 'clipProductId' },
} as const;

/**
 * Where the table (or the clip value) came from: take an entry from the firm library — its values and its
 * source go into the page — or type the source; and save what is entered as a new library entry.
 */
export function LibraryPick({ kind, form, values, errors, disabled, library }: Props) {
  const w = WORDS[kind];
  const [naming, setNaming] = useState(false);
  const [name, setName] = useState('');
  const [saving, setSaving] = useState(false);
  const [message, setMessage] = useState<{ tone: 'ok' | 'problem'; lines: string[] } | null>(null);
  const offered = (library?.products ?? []).filter((p) => p.kind === kind);
  const takenId = values[w.id];
  const taken = offered.find((p) => p.id === takenId);

  function take(id: string) {
    const p = offered.find((x) => x.id === id);
    if (!p) return;
    const next =
      p.kind === 'panel'
        ? withPanelProduct(values, p as PanelProduct)
        : withClipProduct(values, p as ClipProduct);
    form.reset(next, { keepDefaultValues: true });
    setMessage({ tone: 'ok', lines: [`Took the ${w.what} of “${p.name}” and its source.`] });
  }

  async function save() {
    if (!library?.save) return;
    const parsed = attachmentProductInputSchema.safeParse(libraryEntryFrom(values, kind, name.trim()));
    if (!parsed.success) {
      setMessage({
        tone: 'problem',
        lines: issueLines(parsed.error.issues),
      });
      return;
    }
    setSaving(true);
    try {
      const saved = await library.save(parsed.data);
      form.setValue(w.id, saved.id, { shouldDirty: true });
      setNaming(false);
      setName('');
      setMessage({ tone: 'ok', lines: [`Saved to ${library.firmName}’s library as “${saved.name}”.`] });
    } catch (e) {
      const fields = isApiRequestError(e) && e.fields ? Object.entries(e.fields) : [];
      setMessage({
        tone: 'problem',
        lines: fields.length > 0 ? fields.map(([k, v]) => `${toFormPath(k)}: ${v}`) : [library.errorText(e)],
      });
    } finally {
      setSaving(false);
    }
  }

  return (
    <div className="flex flex-col gap-3 rounded-sm border border-rule bg-paper-sunk/40 p-3">
      <div className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
        {library && !disabled ? (
          <LabelledSelect
            label={`Take from ${library.firmName}’s library`}
            hint={
              offered.length === 0
                ? `No ${w.what}s in the library yet${library.save ? ' — enter one below and save it there' : ''}.`
                : 'Copies the values and their source into this page; the library entry may change later, this revision will not.'
            }
            value=""
            onChange={(e) => take(e.target.value)}
            disabled={offered.length === 0}
          >
            <option value="">Choose an entry…</option>
            <NamedOptions items={offered} />
          </LabelledSelect>
        ) : null}
        <Field
          label={`Source of the ${w.what}`}
          hint="The maker’s data sheet or test report, with its date or revision."
          error={errors[w.source]}
          id={windFieldId(w.source)}
        >
          {(c) => (
            <TextInput
              {...c}
              {...form.register(w.source)}
              disabled={disabled}
              autoComplete="off"
              className="py-1.5 text-sm"
            />
          )}
        </Field>
      </div>
      {taken ? (
        <p className="text-sm">
          From the library entry <strong>{taken.name}</strong>
          {taken.dataSheet && library ? (
            <>
              {' · '}
              <a href={library.dataSheetHref(taken.id)} target="_blank" rel="noreferrer">
                data sheet ({taken.dataSheet.name})
              </a>
            </>
          ) : (
            ' · no data sheet uploaded'
          )}
        </p>
      ) : takenId ? (
        <p className="text-sm text-ink-muted">Taken from a library entry that has since been removed.</p>
      ) : null}
      {library?.save && !disabled ? (
        naming ? (
          <div className="flex flex-wrap items-end gap-3">
            <Field label="Product name for the library" className="min-w-64 flex-1">
              {(c) => (
                <TextInput
                  {...c}
                  value={name}
                  onChange={(e) => setName(e.target.value)}
                  autoComplete="off"
                  className="py-1.5 text-sm"
                />
              )}
            </Field>
            <Button variant="primary" onClick={save} busy={saving} busyLabel="Saving…">
              Save the {w.what}
            </Button>
            <Button variant="quiet" onClick={() => setNaming(false)}>
              Cancel
            </Button>
          </div>
        ) : (
          <div>
            <Button variant="secondary" className="px-3 py-1" onClick={() => setNaming(true)}>
              Save this {w.what} to {library.firmName}’s library
            </Button>
          </div>
        )
      ) : null}
      {message ? (
        <div
          role="status"
          className={`text-sm ${message.tone === 'problem' ? 'font-medium text-caution' : 'text-ink-muted'}`}
        >
          {message.lines.map((l) => (
            <p key={l}>
              {message.tone === 'problem' ? '✕ ' : '✓ '}
              {l}
            </p>
          ))}
        </div>
      ) : null}
    </div>
  );
}
