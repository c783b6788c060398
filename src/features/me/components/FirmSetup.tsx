import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useCreateFirm } from '../api/create-firm';

/** A project belongs to a firm: someone who signed up on their own names theirs first. */
export function FirmSetup() {
  const create = useCreateFirm();
  const [name, setName] = useState('');
  const [error, setError] = useState<string>();
  return (
    <form
      className="flex flex-col gap-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        if (name.trim().length < 2) return setError('Enter the firm’s name (at least 2 characters).');
        setError(undefined);
        create.mutate(name.trim(), { onError: (err) => setError(errorMessage(err)) });
      }}
    >
      <Notice title="First, name your firm.">
        <p>
          Projects belong to a firm (the architect’s office, the engineer’s, the cladding contractor’s). You
          become its administrator.
        </p>
      </Notice>
      <Field label="Firm name" error={error} required>
        {(control) => (
          <TextInput
            {...control}
            value={name}
            onChange={(e) => setName(e.target.value)}
            autoComplete="organization"
          />
        )}
      </Field>
      <div>
        <Button type="submit" variant="primary" disabled={create.isPending}>
          {create.isPending ? 'Saving…' : 'Save firm'}
        </Button>
      </div>
    </form>
  );
}
