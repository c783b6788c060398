import { Link, useSearchParams } from 'react-router';
import { Button, ButtonLink } from '../../components/ui/Button';
import { Field } from '../../components/ui/Field';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { Select } from '../../components/ui/Select';
import { TextInput } from '../../components/ui/TextInput';
import { useProjects } from '../../features/projects/api/get-projects';
import { ProjectTable } from '../../features/projects/components/ProjectTable';
import { errorMessage } from '../../lib/api';
import { matchesQuery, useListFilters } from '../../lib/list-filter';

const filterClass = (active: boolean) =>
  `border border-ink px-3 py-1 text-sm font-medium no-underline ${active ? 'bg-ink text-paper' : 'hover:bg-paper-sunk'}`;

export function ProjectsPage() {
  const [params] = useSearchParams();
  const archived = params.get('archived') === 'true';
  const projects = useProjects({ archived });
  const filters = useListFilters(['q', 'zone'] as const);
  const { q, zone } = filters.values;
  const all = projects.data ?? [];
  const zones = [...new Set(all.map((p) => p.climateZone))].sort();
  const shown = all.filter(
    (p) =>
      (zone === '' || p.climateZone === zone) &&
      matchesQuery(q, [p.name, p.number, p.organisationName, p.siteAddress]),
  );

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
        <>
          <search aria-label="Find projects" className="mb-4 flex flex-wrap items-start gap-x-4 gap-y-3">
            <Field label="Search" hint="Name, number or firm." className="min-w-56 flex-1 sm:max-w-sm">
              {(c) => (
                <TextInput
                  {...c}
                  type="search"
                  value={q}
                  onChange={(e) => filters.set('q', e.target.value, true)}
                  className="py-1.5"
                />
              )}
            </Field>
            <Field label="Climate zone" className="w-40">
              {(c) => (
                <Select
                  {...c}
                  value={zone}
                  onChange={(e) => filters.set('zone', e.target.value)}
                  className="py-1.5"
                >
                  <option value="">Any</option>
                  {zones.map((z) => (
                    <option key={z} value={z}>
                      {z}
                    </option>
                  ))}
                </Select>
              )}
            </Field>
            {filters.active ? (
              <Button variant="quiet" onClick={filters.clear} className="sm:mt-6">
                Show all
              </Button>
            ) : null}
          </search>
          <p role="status" className="mb-2 text-sm text-ink-muted">
            {filters.active ? `${shown.length} of ${all.length} projects match.` : ''}
          </p>
          {shown.length > 0 ? (
            <ProjectTable projects={shown} caption={archived ? 'Archived projects' : 'Current projects'} />
          ) : (
            <p className="border-y border-rule py-8 text-center">No project matches the search.</p>
          )}
        </>
      )}
    </>
  );
}
