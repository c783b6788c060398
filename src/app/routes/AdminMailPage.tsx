import { Button } from '../../components/ui/Button';
import { Loaded } from '../../components/ui/Loaded';
import { PageHeader } from '../../components/ui/PageHeader';
import { useMail } from '../../features/admin-mail/api/get-mail';
import { Outbox } from '../../features/admin-mail/components/Outbox';

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
      <Loaded query={mail} what="Loading mail">
        {(data) => <Outbox messages={data} />}
      </Loaded>
    </>
  );
}
