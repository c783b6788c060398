import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { Me } from '@shared/schemas/me';
import type { InvitationPreview } from '@shared/schemas/members';
import { Link, useNavigate } from 'react-router';
import { Button, ButtonLink } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useAcceptInvitation } from '../api/accept-invitation';

interface InvitationCardProps {
  token: string;
  preview: InvitationPreview;
  /** The signed-in person, or null when signed out. */
  me: Me | null;
  onSignOut: () => void;
}

export function InvitationCard({ token, preview, me, onSignOut }: InvitationCardProps) {
  const navigate = useNavigate();
  const accept = useAcceptInvitation(token);
  const here = `/invite/${token}`;
  const next = encodeURIComponent(here);
  const email = encodeURIComponent(preview.email);
  const sameAddress = me !== null && me.email.toLowerCase() === preview.email.toLowerCase();

  return (
    <div className="flex flex-col gap-6">
      <dl className="grid grid-cols-1 gap-px border border-ink bg-rule sm:grid-cols-2">
        <div className="bg-paper-raised px-3 py-2 sm:col-span-2">
          <dt className="label-caps">Project</dt>
          <dd className="font-serif text-xl font-semibold">{preview.projectName}</dd>
        </div>
        <div className="bg-paper-raised px-3 py-2">
          <dt className="label-caps">Invited by</dt>
          <dd>{preview.invitedBy}</dd>
        </div>
        <div className="bg-paper-raised px-3 py-2">
          <dt className="label-caps">Role offered</dt>
          <dd>{PROJECT_ROLE_LABELS[preview.role]}</dd>
        </div>
        <div className="bg-paper-raised px-3 py-2 sm:col-span-2">
          <dt className="label-caps">For the e-mail address</dt>
          <dd className="break-all">{preview.email}</dd>
        </div>
      </dl>

      {preview.accepted ? (
        <Notice tone="info" title="This invitation has already been accepted.">
          <p>
            <Link to="/projects">Go to your projects</Link>
          </p>
        </Notice>
      ) : preview.expired ? (
        <Notice tone="warning" title="This invitation has expired.">
          <p>Ask {preview.invitedBy} to send a new one.</p>
        </Notice>
      ) : me === null ? (
        <div className="flex flex-col gap-3">
          <p>
            Sign in as <strong className="break-all">{preview.email}</strong> to join, or create an account
            with that address.
          </p>
          <div className="flex flex-wrap gap-3">
            <ButtonLink variant="primary" to={`/sign-in?next=${next}&email=${email}`}>
              Sign in to accept
            </ButtonLink>
            <ButtonLink variant="secondary" to={`/sign-up?next=${next}&email=${email}`}>
              Create an account
            </ButtonLink>
          </div>
        </div>
      ) : !sameAddress ? (
        <Notice tone="warning" title="This invitation is for a different e-mail address.">
          <p>
            You are signed in as <strong className="break-all">{me.email}</strong>. Sign out, then sign in as{' '}
            <strong className="break-all">{preview.email}</strong> to accept.
          </p>
          <p>
            <Button variant="secondary" onClick={onSignOut}>
              Sign out
            </Button>
          </p>
        </Notice>
      ) : (
        <div className="flex flex-col items-start gap-3">
          <Button
            variant="primary"
            busy={accept.isPending}
            busyLabel="Joining…"
            onClick={() =>
              accept.mutate(undefined, { onSuccess: ({ projectId }) => navigate(`/projects/${projectId}`) })
            }
          >
            Join {preview.projectName}
          </Button>
          {accept.isError ? <Notice tone="caution" title={errorMessage(accept.error)} live /> : null}
        </div>
      )}
    </div>
  );
}
