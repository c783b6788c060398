import { Link, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useInspection } from '../../features/inspections/api/get-inspection';
import { CloseInspection } from '../../features/inspections/components/CloseInspection';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';

export function CloseInspectionPage() {
  const { projectId = '', inspectionId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const inspection = useInspection(inspectionId);
  if (!project) return null;
  if (inspection.isPending) return <Loading what="Loading the inspection" />;
  if (inspection.isError) return <Notice tone="caution" title={errorMessage(inspection.error)} live />;
  const base = `/projects/${projectId}/inspections/${inspectionId}`;
  return (
    <div className="flex flex-col gap-4">
      <title>{`Close inspection ${inspection.data.number} · ${project.name} · Skinwright`}</title>
      <p className="text-sm">
        <Link to={base}>{`← Inspection ${inspection.data.number}`}</Link>
      </p>
      <h2 className="border-b border-ink pb-2 text-2xl">{`Close inspection ${inspection.data.number}`}</h2>
      <CloseInspection inspection={inspection.data} base={base} />
    </div>
  );
}
