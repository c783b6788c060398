import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { useCreateAssembly } from '../../assemblies/api/create-assembly';
import { useUpdateAssembly } from '../../assemblies/api/update-assembly';

/** Longest revision note the API takes (TEXT_MAX.line). */
const NOTE_MAX = 500;

/**
 * "Make this an assembly": the chosen variant as a new assembly of the project, or as a new revision of this
 * one, with a note naming the sweep and the variant. Saved only on a click.
 */
export function MakeAssembly({
  assembly,
  input,
  describe,
  sweptRevision,
}: {
  assembly: Assembly;
  /** The variant's document. */
  input: AssemblyInput;
  /** "Sweep of … against …: variant 12 of 24 (…)". */
  describe: string;
  /** The revision the sweep ran on. */
  sweptRevision: number;
}) {
  const [as, setAs] = useState<'new' | 'revision'>('new');
  const [name, setName] = useState(`${assembly.name} — ${describe.match(/variant \d+/)?.[0] ?? 'variant'}`);
  const [note, setNote] = useState(`From the ${describe}`.slice(0, NOTE_MAX));
  const create = useCreateAssembly();
  const update = useUpdateAssembly();
  const navigate = useNavigate();
  const stale = assembly.revision !== sweptRevision;
  const failed = create.error ?? update.error;
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={submitting(async () => {
        if (as === 'new') {
          const made = await create.mutateAsync({
            projectId: assembly.projectId,
            input: { ...input, name: name.trim() },
          });
          // The same input with a note puts the note on revision 1 (a note-only save makes no revision).
          await update.mutateAsync({
            assemblyId: made.id,
            version: made.version,
            note,
            input: made.current.input,
          });
          navigate(`/projects/${made.projectId}/assemblies/${made.id}`);
        } else {
          await update.mutateAsync({
            assemblyId: assembly.id,
            version: assembly.version,
            note,
            input: { ...input, name: assembly.name },
          });
        }
      })}
    >
      <fieldset className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
        <legend className="sr-only">Save the variant as</legend>
        <label className="flex items-center gap-1">
          <input type="radio" name="make-as" checked={as === 'new'} onChange={() => setAs('new')} />A new
          assembly
        </label>
        <label className="flex items-center gap-1">
          <input type="radio" name="make-as" checked={as === 'revision'} onChange={() => setAs('revision')} />
          A new revision of this one (revision {assembly.revision + 1})
        </label>
      </fieldset>
      {as === 'new' ? (
        <Field label="Name of the new assembly" className="max-w-xl">
          {(c) => <TextInput {...c} value={name} maxLength={200} onChange={(e) => setName(e.target.value)} />}
        </Field>
      ) : null}
      <Field label="Revision note" className="max-w-3xl">
        {(c) => (
          <TextInput {...c} value={note} maxLength={NOTE_MAX} onChange={(e) => setNote(e.target.value)} />
        )}
      </Field>
      {stale && as === 'revision' ? (
        <Notice
          tone="warning"
          title={`The sweep ran on revision ${sweptRevision}; the assembly is now at revision ${assembly.revision}.`}
        >
          Saving makes the variant (of revision {sweptRevision}) the newest revision and replaces the edits
          made since. Run the sweep again to vary the newest revision.
        </Notice>
      ) : null}
      {update.isSuccess && as === 'revision' ? (
        <Notice tone="info" title={`Saved as revision ${update.data.revision}.`} live />
      ) : null}
      {failed ? <Notice tone="caution" title={errorMessage(failed)} live /> : null}
      <Button
        type="submit"
        variant="primary"
        className="self-start"
        busy={create.isPending || update.isPending}
        busyLabel="Saving…"
        disabled={as === 'new' && name.trim() === ''}
      >
        {as === 'new' ? 'Make a new assembly' : `Save as revision ${assembly.revision + 1}`}
      </Button>
    </form>
  );
}
