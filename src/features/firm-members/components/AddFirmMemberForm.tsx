import { zodResolver } from '@hookform/resolvers/zod';
import { FIRM_ROLE_LABELS, FIRM_ROLES } from '@shared/auth/permissions';
import { type FirmMemberAdd, firmMemberAddSchema } from '@shared/schemas/firm-members';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Options } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { useAddFirmMember } from '../api/add-firm-member';

type Values = z.input<typeof firmMemberAddSchema>;

/** Add someone who already has an account to the firm, by their e-mail address; they are told by e-mail. */
export function AddFirmMemberForm({ orgId, firmName }: { orgId: string; firmName: string }) {
  const add = useAddFirmMember(orgId);
  const [added, setAdded] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Values, unknown, FirmMemberAdd>({
    resolver: zodResolver(firmMemberAddSchema, {
      error: (iss) => (iss.path?.[0] === 'email' ? 'Enter a valid e-mail address.' : undefined),
    }),
    defaultValues: { email: '', role: 'reader' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    setAdded(null);
    try {
      const member = await add.mutateAsync(values);
      setAdded(`${member.name} (${member.email}) is in ${firmName} as ${FIRM_ROLE_LABELS[member.role]}.`);
      reset({ email: '', role: values.role });
    } catch (e) {
      const unmatched = applyServerFieldErrors(e, setError, ['email', 'role']);
      const markedOnFields = isApiRequestError(e) && e.fields && unmatched.length === 0;
      if (!markedOnFields) setFailure([errorMessage(e), ...unmatched].join(' '));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-labelledby="add-member-heading">
      <div>
        <h2 id="add-member-heading" className="text-xl">
          Add someone to {firmName}
        </h2>
        <p className="text-sm text-ink-muted">
          They need a Skinwright account first (they sign up with this address); they get an e-mail saying
          they were added.
        </p>
      </div>
      {added ? <Notice tone="info" title={added} live /> : null}
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr_auto] sm:items-start">
        <Field label="E-mail" error={errors.email?.message} required>
          {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="off" />}
        </Field>
        <Field label="Firm role" error={errors.role?.message} required>
          {(c) => (
            <Select {...c} {...register('role')}>
              <Options values={FIRM_ROLES} labels={FIRM_ROLE_LABELS} />
            </Select>
          )}
        </Field>
        <div className="sm:pt-7">
          <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Adding…">
            Add to firm
          </Button>
        </div>
      </div>
    </form>
  );
}
