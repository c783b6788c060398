import { Link, useParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { useInspection } from '../../features/inspections/api/get-inspection';
import { DeficiencyView } from '../../features/inspections/components/DeficiencyView';
import { useProject } from '../../features/projects/api/get-project';
import { errorMessage } from '../../lib/api';

export function DeficiencyPage() {
  const { projectId = '', inspectionId = '', deficiencyId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const inspection = useInspection(inspectionId);
  if (!project) return null;
  if (inspection.isPending) return <Loading what="Loading the deficiency" />;
  if (inspection.isError) return <Notice tone="caution" title={errorMessage(inspection.error)} live />;
  const d = inspection.data.deficiencies.find((x) => x.id === deficiencyId);
  const back = `/projects/${projectId}/inspections/${inspectionId}`;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm">
        <Link to={back}>{`← Inspection ${inspection.data.number}`}</Link>
      </p>
      {d ? (
        <>
          <title>{`Deficiency D-${d.number} · ${project.name} · Skinwright`}</title>
          <h2 className="border-b border-ink pb-2 text-2xl">{`Deficiency D-${d.number}: ${d.itemLabel}`}</h2>
          <DeficiencyView
            inspection={inspection.data}
            deficiency={d}
            role={project.myRole}
            readOnly={project.archivedAt !== null}
          />
        </>
      ) : (
        <Notice tone="caution" title="No such deficiency on this inspection." />
      )}
    </div>
  );
}
