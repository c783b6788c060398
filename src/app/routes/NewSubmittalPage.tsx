import { can } from '@shared/auth/permissions';
import { Link, useNavigate } from 'react-router';
import { Loaded } from '../../components/ui/Loaded';
import { Notice } from '../../components/ui/Notice';
import { useMembers } from '../../features/members/api/get-members';
import { useCreateSubmittal } from '../../features/submittals/api/mutations';
import { SubmittalForm } from '../../features/submittals/components/SubmittalForm';
import { ProjectPage, useRouteProject } from './project-page';

/** Start a submittal: its details and reviewers; items are added on its page. */
export function NewSubmittalPage() {
  const { projectId, project } = useRouteProject();
  const navigate = useNavigate();
  const members = useMembers(projectId);
  const create = useCreateSubmittal(projectId);
  if (!project) return null;
  if (!can(project.myRole, 'submittal.create') || project.archivedAt)
    return <Notice tone="caution" title="Your role on this project does not start submittals." />;

  return (
    <ProjectPage
      project={project}
      title="New submittal"
      breadcrumb={
        <nav aria-label="Breadcrumb" className="-mt-2 text-sm">
          <Link to={`/projects/${project.id}/submittals`}>Submittals</Link> <span aria-hidden="true">/</span>{' '}
          New
        </nav>
      }
    >
      <Loaded query={members} what="Loading the people of the project">
        {(data) => (
          <SubmittalForm
            members={data.members}
            withNumber
            submitLabel="Create the draft"
            busyLabel="Creating…"
            onSubmit={async (values) => {
              const s = await create.mutateAsync(values);
              navigate(`/projects/${project.id}/submittals/${s.id}`);
            }}
            onCancel={() => navigate(`/projects/${project.id}/submittals`)}
          />
        )}
      </Loaded>
    </ProjectPage>
  );
}
