import { Button } from '../../components/ui/Button';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useMail } from '../../features/admin-mail/api/get-mail';
import { Outbox } from '../../features/admin-mail/components/Outbox';
import { errorMessage } from '../../lib/api';

export function AdminMailPage() {
  const mail = useMail();
  return (
    <>
      <title>Outbox · Skinwright</title>
      <PageHeader
        eyebrow="Site administration"
        title="Outbox"
        description="Every e-mail this installation has sent while no SMTP server is set (the newest 200): project and firm invitations, address confirmations, sign-up attempts on a registered address, password resets, and submittals sent for review and decided."
        actions={
          <Button
            variant="secondary"
            onClick={() => mail.refetch()}
            busy={mail.isFetching}
            busyLabel="Checking…"
          >
            Check for new mail
          </Button>
        }
      />
      {mail.isPending ? (
        <Loading what="Loading mail" />
      ) : mail.isError ? (
        <Notice tone="caution" title={errorMessage(mail.error)} live />
      ) : (
        <Outbox messages={mail.data} />
      )}
    </>
  );
}
