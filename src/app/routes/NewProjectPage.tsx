import { useNavigate } from 'react-router';
import { PageHeader } from '../../components/ui/PageHeader';
import { useMe } from '../../features/me/api/get-me';
import { FirmSetup } from '../../features/me/components/FirmSetup';
import { useCreateProject } from '../../features/projects/api/create-project';
import { ProjectForm } from '../../features/projects/components/ProjectForm';

export function NewProjectPage() {
  const navigate = useNavigate();
  const create = useCreateProject();
  const me = useMe();
  const hasFirm = (me.data?.organisations.length ?? 0) > 0;
  return (
    <div className="max-w-form">
      <title>New project · Skinwright</title>
      <PageHeader
        eyebrow="New project"
        title="Project and site data"
        description="Your firm owns the project and you become its owner. Every later check reads these values."
      />
      {me.data && !hasFirm ? <FirmSetup /> : null}
      {hasFirm ? (
        <ProjectForm
          defaultValues={{ name: '', number: '', description: '', siteAddress: '', elevationM: 0 }}
          submitLabel="Create project"
          busyLabel="Creating…"
          onSubmit={async (values) => {
            const project = await create.mutateAsync(values);
            navigate(`/projects/${project.id}`);
          }}
          onCancel={() => navigate('/projects')}
        />
      ) : null}
    </div>
  );
}
