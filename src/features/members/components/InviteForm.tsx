import { zodResolver } from '@hookform/resolvers/zod';
import { grantableRoles, PROJECT_ROLE_LABELS, type ProjectRole } from '@shared/auth/permissions';
import { type InvitationInput, invitationInputSchema } from '@shared/schemas/members';
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
import { useInviteMember } from '../api/invite-member';

type Values = z.input<typeof invitationInputSchema>;

/**
 * Invite someone by e-mail with a role; they get a link that works once they sign in with that address. Only
 * the roles the inviter may grant are offered (`grantableRoles`, the rule the server enforces).
 */
export function InviteForm({ projectId, myRole }: { projectId: string; myRole: ProjectRole }) {
  const invite = useInviteMember(projectId);
  const [sent, setSent] = useState<string | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Values, unknown, InvitationInput>({
    resolver: zodResolver(invitationInputSchema, {
      error: (iss) => (iss.path?.[0] === 'email' ? 'Enter a valid e-mail address.' : undefined),
    }),
    defaultValues: { email: '', role: 'viewer' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    setSent(null);
    try {
      const invitation = await invite.mutateAsync(values);
      setSent(invitation.email);
      reset({ email: '', role: values.role });
    } catch (e) {
      const unmatched = applyServerFieldErrors(e, setError, ['email', 'role']);
      const markedOnFields = isApiRequestError(e) && e.fields && unmatched.length === 0;
      if (!markedOnFields) setFailure([errorMessage(e), ...unmatched].join(' '));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-labelledby="invite-heading">
      <h2 id="invite-heading" className="text-xl">
        Invite someone
      </h2>
      {sent ? <Notice tone="info" title={`Invitation sent to ${sent}.`} live /> : null}
      {failure ? <Notice tone="caution" title={failure} live /> : null}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr_auto] sm:items-start">
        <Field label="E-mail" error={errors.email?.message} required>
          {(c) => <TextInput {...c} {...register('email')} type="email" autoComplete="off" />}
        </Field>
        <Field label="Role on this project" error={errors.role?.message} required>
          {(c) => (
            <Select {...c} {...register('role')}>
              <Options values={grantableRoles(myRole)} labels={PROJECT_ROLE_LABELS} />
            </Select>
          )}
        </Field>
        <div className="sm:pt-7">
          <Button type="submit" variant="primary" busy={isSubmitting} busyLabel="Sending…">
            Send invitation
          </Button>
        </div>
      </div>
    </form>
  );
}
