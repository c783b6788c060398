import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { useCreateCriteriaSet } from '../api/create-criteria-set';

/** Starts an empty code table for a firm; its rows are entered in the grid or imported. */
export function NewCriteriaSetForm({ orgId }: { orgId: string }) {
  const [name, setName] = useState('');
  const [jurisdiction, setJurisdiction] = useState('');
  const [edition, setEdition] = useState('');
  const create = useCreateCriteriaSet();
  const navigate = useNavigate();
  const fields = isApiRequestError(create.error) ? (create.error.fields ?? {}) : {};
  return (
    <form
      className="flex max-w-form flex-col gap-4"
      onSubmit={async (e) => {
        e.preventDefault();
        try {
          const set = await create.mutateAsync({ orgId, input: { name, jurisdiction, edition } });
          navigate(`/code-tables/${set.id}`);
        } catch {
          // shown below
        }
      }}
    >
      <Field label="Name" required error={fields.name}>
        {(c) => <TextInput {...c} value={name} onChange={(e) => setName(e.target.value)} />}
      </Field>
      <Field label="Jurisdiction" hint="Where the adopted code applies, in your words.">
        {(c) => <TextInput {...c} value={jurisdiction} onChange={(e) => setJurisdiction(e.target.value)} />}
      </Field>
      <Field label="Edition and amendments">
        {(c) => <TextInput {...c} value={edition} onChange={(e) => setEdition(e.target.value)} />}
      </Field>
      {create.isError ? <Notice tone="caution" title={errorMessage(create.error)} live /> : null}
      <div>
        <Button type="submit" variant="primary" busy={create.isPending} busyLabel="Creating…">
          Create code table
        </Button>
      </div>
    </form>
  );
}
