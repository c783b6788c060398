import { can } from '@shared/auth/permissions';
import { ButtonLink } from '../../components/ui/Button';
import { Loaded } from '../../components/ui/Loaded';
import { Notice } from '../../components/ui/Notice';
import { useInspections } from '../../features/inspections/api/get-inspections';
import { ElevationDrawing } from '../../features/inspections/components/ElevationDrawing';
import { InspectionList } from '../../features/inspections/components/InspectionList';
import { WaitingToSend } from '../../features/inspections/components/WaitingToSend';
import { byElevation } from '../../features/inspections/scope';
import { ProjectPage, useRouteProject } from './project-page';

/** The project's field inspections: each elevation drawn by state, then the list. */
export function ProjectInspectionsPage() {
  const { projectId, project } = useRouteProject();
  const list = useInspections(projectId);
  if (!project) return null;
  const mayCreate = can(project.myRole, 'inspection.create') && project.archivedAt === null;

  return (
    <ProjectPage
      project={project}
      title="Inspections"
      action={
        mayCreate ? (
          <ButtonLink variant="primary" className="min-h-11" to={`/projects/${project.id}/inspections/new`}>
            New inspection
          </ButtonLink>
        ) : null
      }
    >
      <p className="max-w-prose text-sm text-ink-muted">
        The wall as built, walked against what was proved: a checklist generated from an assembly revision for
        an elevation and a range of grid lines or a wind zone. An inspection opened once on a phone keeps
        working with no signal; answers and photos are sent when the connection returns.
      </p>
      <Notice tone="warning" title="Attachment, fire and moisture details hold people and the building up.">
        <p>
          A failed attachment item (girts, clips, fasteners) is a safety matter: stop work on that part of the
          wall and tell the engineer of record before it is loaded or closed in.
        </p>
      </Notice>
      <WaitingToSend inspectionId="" />
      <Loaded
        query={list}
        what="Loading the inspections"
        empty={<p className="text-ink-muted">No inspection yet.</p>}
      >
        {(data) => (
          <>
            <section aria-labelledby="by-elevation" className="flex flex-col gap-4">
              <h3 id="by-elevation" className="text-xl">
                By elevation
              </h3>
              {byElevation(data).map((g) => (
                <ElevationDrawing key={g.elevation} projectId={project.id} {...g} />
              ))}
            </section>
            <section aria-labelledby="all-inspections" className="flex flex-col gap-2">
              <h3 id="all-inspections" className="text-xl">
                Every inspection
              </h3>
              <InspectionList projectId={project.id} inspections={data} />
            </section>
          </>
        )}
      </Loaded>
    </ProjectPage>
  );
}
