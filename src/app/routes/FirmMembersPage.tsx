import { canInFirm, FIRM_ROLE_LABELS, FIRM_ROLES, type FirmRole } from '@shared/auth/permissions';
import { useSearchParams } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { TitledSection } from '../../components/ui/TitledSection';
import { useFirmMembers } from '../../features/firm-members/api/get-firm-members';
import { AddFirmMemberForm } from '../../features/firm-members/components/AddFirmMemberForm';
import { FirmMembersTable } from '../../features/firm-members/components/FirmMembersTable';
import { useMe } from '../../features/me/api/get-me';
import { FirmPicker } from '../../features/me/components/FirmPicker';
import { firmOf } from '../../features/me/firm';

/** What each firm role may do, in the firm's own data (shared/auth `FIRM_PERMISSIONS`). */
const ROLE_WORDS: Record<FirmRole, string> = {
  admin:
    'everything an editor does, plus adding people, changing their firm roles, and deleting entries and code tables',
  editor:
    'enters and edits code tables, library entries (materials, χ/ψ values, panel tables, clips) and data sheets',
  reader: 'reads the firm’s code tables and library and uses them in checks, but changes nothing',
};

/** The people of the signed-in person's firm (`/settings/firm?org=<id>`) and their firm roles. */
export function FirmMembersPage() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const orgs = me.data?.organisations ?? [];
  const org = firmOf(me.data, params.get('org'));
  const members = useFirmMembers(org?.id);
  const isAdmin = canInFirm(org?.role, 'firm.admin');

  return (
    <div className="flex flex-col gap-8">
      <title>{`Firm members${org ? ` · ${org.name}` : ''} · Skinwright`}</title>
      <PageHeader
        eyebrow="Settings"
        title="Firm members"
        description="A firm's code tables and library are shared by all its projects, so the firm decides who writes them: its firm roles, separate from the roles on each project."
      />
      {me.isPending ? (
        <Loading what="Loading your firms" />
      ) : !org ? (
        <Notice tone="info" title="You are not a member of a firm." />
      ) : (
        <>
          <FirmPicker firms={orgs} value={org.id} onChange={(id) => setParams({ org: id })} />
          <TitledSection title="Firm roles" heading="text-xl" className="flex flex-col gap-2">
            <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
              {FIRM_ROLES.map((r) => (
                <div key={r} className="contents">
                  <dt className="font-semibold">{FIRM_ROLE_LABELS[r]}</dt>
                  <dd className="mb-2 text-ink-muted sm:mb-0">{ROLE_WORDS[r]}</dd>
                </div>
              ))}
            </dl>
            <p className="text-sm">
              Your role in {org.name}: <strong>{FIRM_ROLE_LABELS[org.role]}</strong>
              {isAdmin ? '.' : '. A firm administrator changes roles.'}
            </p>
          </TitledSection>
          <TitledSection title="People" heading="sr-only">
            <Loaded query={members} what="Loading the firm's people">
              {(data) => (
                <FirmMembersTable
                  orgId={org.id}
                  firmName={org.name}
                  members={data}
                  isAdmin={isAdmin}
                  myUserId={me.data?.id}
                />
              )}
            </Loaded>
          </TitledSection>
          {isAdmin ? (
            <section className="border-t border-ink pt-6">
              <AddFirmMemberForm key={org.id} orgId={org.id} firmName={org.name} />
            </section>
          ) : null}
        </>
      )}
    </div>
  );
}
