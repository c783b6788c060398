import { can } from '@shared/auth/permissions';
import { useParams } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { TitledSection } from '../../components/ui/TitledSection';
import { useMe } from '../../features/me/api/get-me';
import { useMembers } from '../../features/members/api/get-members';
import { InviteForm } from '../../features/members/components/InviteForm';
import { MembersTable } from '../../features/members/components/MembersTable';
import { PendingInvitations } from '../../features/members/components/PendingInvitations';
import { useProject } from '../../features/projects/api/get-project';

export function ProjectMembersPage() {
  const { projectId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const me = useMe();
  const members = useMembers(projectId);
  if (!project) return null;

  const mayInvite = can(project.myRole, 'members.invite') && project.archivedAt === null;

  return (
    <div className="flex flex-col gap-10">
      <title>{`People · ${project.name} · Skinwright`}</title>
      <TitledSection title="People and roles" heading="text-2xl">
        <Loaded query={members} what="Loading people">
          {(data) => (
            <MembersTable
              projectId={projectId}
              members={data.members}
              myRole={project.myRole}
              myUserId={me.data?.id}
            />
          )}
        </Loaded>
      </TitledSection>

      {mayInvite ? (
        <>
          <section className="border-t border-ink pt-6">
            <InviteForm projectId={projectId} myRole={project.myRole} />
          </section>
          <TitledSection title="Waiting for an answer" heading="text-xl">
            {members.data ? <PendingInvitations invitations={members.data.invitations} /> : null}
          </TitledSection>
        </>
      ) : null}
    </div>
  );
}
