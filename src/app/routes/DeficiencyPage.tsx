import { useParams } from 'react-router';
import { Notice } from '../../components/ui/Notice';
import { DeficiencyView } from '../../features/inspections/components/DeficiencyView';
import { InspectionFrame, InspectionHeading } from './InspectionFrame';

export function DeficiencyPage() {
  const { deficiencyId = '' } = useParams();
  return (
    <InspectionFrame what="deficiency" backTo="inspection">
      {(inspection, project) => {
        const d = inspection.deficiencies.find((x) => x.id === deficiencyId);
        return d ? (
          <>
            <InspectionHeading title={`Deficiency D-${d.number}`} project={project}>
              {`Deficiency D-${d.number}: ${d.itemLabel}`}
            </InspectionHeading>
            <DeficiencyView
              inspection={inspection}
              deficiency={d}
              role={project.myRole}
              readOnly={project.archivedAt !== null}
            />
          </>
        ) : (
          <Notice tone="caution" title="No such deficiency on this inspection." />
        );
      }}
    </InspectionFrame>
  );
}
