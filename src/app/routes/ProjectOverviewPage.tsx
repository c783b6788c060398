import { can } from '@shared/auth/permissions';
import { TitledSection } from '../../components/ui/TitledSection';
import { AssembliesOverview } from '../../features/assemblies/components/AssembliesOverview';
import { ArchiveControl } from '../../features/projects/components/ArchiveControl';
import { DuplicateProject } from '../../features/projects/components/DuplicateProject';
import { ProjectEditor } from '../../features/projects/components/ProjectEditor';
import { ProjectTitleBlock } from '../../features/projects/components/ProjectTitleBlock';
import { EditableHeading, useEditableProject } from './editable-project';

export function ProjectOverviewPage() {
  const page = useEditableProject('project.update');
  if (!page) return null;
  const { project, archived, editing, setEditing } = page;

  return (
    <div className="flex flex-col gap-10">
      <section aria-labelledby="site-heading" className="flex flex-col gap-4">
        <EditableHeading
          id="site-heading"
          title="Site data"
          editLabel="Edit site data"
          page={page}
          ruled={false}
        />
        {editing ? (
          <div className="max-w-form">
            <ProjectEditor project={project} onDone={() => setEditing(false)} />
          </div>
        ) : (
          <ProjectTitleBlock project={project} />
        )}
      </section>

      <TitledSection title="Assemblies">
        <AssembliesOverview
          projectId={project.id}
          mayWrite={can(project.myRole, 'assembly.write') && !archived}
        />
      </TitledSection>

      {can(project.myRole, 'project.update') && !archived && !editing ? (
        <section
          aria-labelledby="duplicate-heading"
          className="flex flex-col gap-3 border-t border-rule pt-6"
        >
          <h2 id="duplicate-heading" className="text-lg">
            Duplicate
          </h2>
          <DuplicateProject project={project} />
        </section>
      ) : null}

      {can(project.myRole, 'project.archive') && !editing ? (
        <section aria-labelledby="archive-heading" className="flex flex-col gap-3 border-t border-rule pt-6">
          <h2 id="archive-heading" className="text-lg">
            {archived ? 'Restore' : 'Archive'}
          </h2>
          <ArchiveControl project={project} />
        </section>
      ) : null}
    </div>
  );
}
