import { Link, useSearchParams } from 'react-router';
import { ButtonLink } from '../../components/ui/Button';
import { FilterBar, FilterSelect, SearchBox } from '../../components/ui/FilterBar';
import { Loaded } from '../../components/ui/Loaded';
import { PageHeader } from '../../components/ui/PageHeader';
import { useProjects } from '../../features/projects/api/get-projects';
import { ProjectTable } from '../../features/projects/components/ProjectTable';
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

      <Loaded
        query={projects}
        what="Loading projects"
        empty={
          <div className="border-y border-rule py-10 text-center">
            <p className="font-serif text-xl">{archived ? 'No archived projects.' : 'No projects yet.'}</p>
            {!archived ? (
              <p className="mt-2 text-ink-muted">
                Start one with <Link to="/projects/new">New project</Link>, or accept an invitation sent to
                you.
              </p>
            ) : null}
          </div>
        }
      >
        {() => (
          <>
            <FilterBar label="Find projects" active={filters.active} onClear={filters.clear} className="mb-4">
              <SearchBox hint="Name, number or firm." value={q} onChange={(t) => filters.set('q', t, true)} />
              <FilterSelect
                label="Climate zone"
                className="w-40"
                value={zone}
                onChange={(z) => filters.set('zone', z)}
                options={zones.map((z) => ({ value: z, label: z }))}
              />
            </FilterBar>
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
      </Loaded>
    </>
  );
}
