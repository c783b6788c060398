import { Link, useSearchParams } from 'react-router';
import { ButtonLink } from '../../components/ui/Button';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useProjects } from '../../features/projects/api/get-projects';
import { ProjectTable } from '../../features/projects/components/ProjectTable';
import { errorMessage } from '../../lib/api';

const filterClass = (active: boolean) =>
  `border border-ink px-3 py-1 text-sm font-medium no-underline ${active ? 'bg-ink text-paper' : 'hover:bg-paper-sunk'}`;

export function ProjectsPage() {
  const [params] = useSearchParams();
  const archived = params.get('archived') === 'true';
  const projects = useProjects({ archived });

  return (
    <>
      <title>Projects · Skinwright</title>
      <PageHeader
        title="Projects"
        description="Each project holds a building's site data and the wall build-ups proved for it."
        actions={
          <ButtonLink to="/projects/new" variant="primary">
            New project
          </ButtonLink>
        }
      />
      <nav aria-label="Which projects" className="mb-6 flex">
        <Link
          to="/projects"
          aria-current={!archived ? 'page' : undefined}
          className={`${filterClass(!archived)} rounded-l-sm`}
        >
          Current
        </Link>
        <Link
          to="/projects?archived=true"
          aria-current={archived ? 'page' : undefined}
          className={`${filterClass(archived)} -ml-px rounded-r-sm`}
        >
          Archived
        </Link>
      </nav>

      {projects.isPending ? (
        <Loading what="Loading projects" />
      ) : projects.isError ? (
        <Notice tone="caution" title={errorMessage(projects.error)} live />
      ) : projects.data.length === 0 ? (
        <div className="border-y border-rule py-10 text-center">
          <p className="font-serif text-xl">{archived ? 'No archived projects.' : 'No projects yet.'}</p>
          {!archived ? (
            <p className="mt-2 text-ink-muted">
              Start one with <Link to="/projects/new">New project</Link>, or accept an invitation sent to you.
            </p>
          ) : null}
        </div>
      ) : (
        <ProjectTable
          projects={projects.data}
          caption={archived ? 'Archived projects' : 'Current projects'}
        />
      )}
    </>
  );
}
