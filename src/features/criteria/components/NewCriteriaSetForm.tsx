import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { submitting } from '../../../lib/form-submit';
import { useCreateCriteriaSet } from '../api/create-criteria-set';
import { CriteriaTextFields } from './CriteriaTextFields';

/** Starts an empty code table for a firm; its rows are entered in the grid or imported. */
export function NewCriteriaSetForm({ orgId }: { orgId: string }) {
  const [input, setInput] = useState({ name: '', jurisdiction: '', edition: '' });
  const create = useCreateCriteriaSet();
  const navigate = useNavigate();
  const fields = isApiRequestError(create.error) ? (create.error.fields ?? {}) : {};
  return (
    <form
      className="flex max-w-form flex-col gap-4"
      onSubmit={submitting(async () => {
        const set = await create.mutateAsync({ orgId, input });
        navigate(`/code-tables/${set.id}`);
      })}
    >
      <CriteriaTextFields
        keys={['name', 'jurisdiction', 'edition']}
        values={input}
        onChange={(patch) => setInput({ ...input, ...patch })}
        errorOf={(k) => fields[k]}
      />
      {create.isError ? <Notice tone="caution" title={errorMessage(create.error)} live /> : null}
      <div>
        <Button type="submit" variant="primary" busy={create.isPending} busyLabel="Creating…">
          Create code table
        </Button>
      </div>
    </form>
  );
}
