import { Link, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useInspection } from '../../features/inspections/api/get-inspection';
import { InspectionView } from '../../features/inspections/components/InspectionView';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';

export function InspectionPage() {
  const { projectId = '', inspectionId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const inspection = useInspection(inspectionId);
  if (!project) return null;
  if (inspection.isPending) return <Loading what="Loading the inspection" />;
  if (inspection.isError) return <Notice tone="caution" title={errorMessage(inspection.error)} live />;
  const i = inspection.data;
  return (
    <div className="flex flex-col gap-4">
      <title>{`Inspection ${i.number} · ${project.name} · Skinwright`}</title>
      <p className="text-sm">
        <Link to={`/projects/${projectId}/inspections`}>← Inspections</Link>
      </p>
      <h2 className="border-b border-ink pb-2 text-2xl">{`Inspection ${i.number}: ${i.title}`}</h2>
      <InspectionView
        inspection={i}
        projectId={projectId}
        role={project.myRole}
        archived={project.archivedAt !== null}
      />
    </div>
  );
}
