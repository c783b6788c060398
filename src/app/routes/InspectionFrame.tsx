import type { Inspection } from '@shared/inspections/schema';
import type { Project } from '@shared/schemas/project';
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useInspection } from '../../features/inspections/api/get-inspection';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';

/** Where a page of one inspection is, from its project's. */
export const inspectionHref = (inspection: Inspection, project: Project) =>
  `/projects/${project.id}/inspections/${inspection.id}`;

/**
 * The frame of the pages of one inspection (the inspection, closing it, a deficiency): the project and the
 * inspection loaded, then a link back — to the project's inspections or to this inspection — above what the
 * page draws.
 */
export function InspectionFrame({
  what,
  backTo,
  children,
}: {
  /** What is loading, in the words of the page. */
  what: string;
  backTo: 'inspections' | 'inspection';
  children: (inspection: Inspection, project: Project) => ReactNode;
}) {
  const { projectId = '', inspectionId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const inspection = useInspection(inspectionId);
  if (!project) return null;
  if (inspection.isPending) return <Loading what={`Loading the ${what}`} />;
  if (inspection.isError) return <Notice tone="caution" title={errorMessage(inspection.error)} live />;
  const i = inspection.data;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        {backTo === 'inspections' ? (
          <Link to={`/projects/${project.id}/inspections`}>← Inspections</Link>
        ) : (
          <Link to={inspectionHref(i, project)}>{`← Inspection ${i.number}`}</Link>
        )}
      </p>
      {children(i, project)}
    </div>
  );
}

/** A page's title (with the project's name) and its heading. */
export function InspectionHeading({
  title,
  project,
  children,
}: {
  title: string;
  project: Project;
  children: string;
}) {
  return (
    <>
      <title>{`${title} · ${project.name} · Skinwright`}</title>
      <h2 className="border-b border-ink pb-2 text-2xl">{children}</h2>
    </>
  );
}
