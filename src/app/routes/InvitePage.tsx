import { useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useSignOut } from '../../features/auth/api/sign-out';
import { useInvitation } from '../../features/invitations/api/get-invitation';
import { InvitationCard } from '../../features/invitations/components/InvitationCard';
import { useMe } from '../../features/me/api/get-me';
import { errorMessage, isApiRequestError } from '../../lib/api';
import { AuthPageFrame } from './AuthPageFrame';

export function InvitePage() {
  const { token = '' } = useParams();
  const preview = useInvitation(token);
  const me = useMe();
  const signOut = useSignOut();

  return (
    <AuthPageFrame title="Invitation to a project">
      {preview.isPending || me.isPending ? (
        <Loading what="Reading the invitation" />
      ) : preview.isError ? (
        <Notice tone="caution" title="This invitation cannot be opened." live>
          <p>
            {isApiRequestError(preview.error) &&
            (preview.error.status === 404 || preview.error.status === 400)
              ? 'The link may be mistyped, or the invitation was withdrawn.'
              : errorMessage(preview.error)}
          </p>
        </Notice>
      ) : (
        <InvitationCard
          token={token}
          preview={preview.data}
          me={me.data ?? null}
          onSignOut={() =>
            signOut.mutate({
              to: `/sign-in?next=${encodeURIComponent(`/invite/${token}`)}&email=${encodeURIComponent(preview.data.email)}`,
            })
          }
        />
      )}
    </AuthPageFrame>
  );
}
