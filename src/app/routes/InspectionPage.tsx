import { InspectionView } from '../../features/inspections/components/InspectionView';
import { InspectionFrame, InspectionHeading } from './InspectionFrame';

export function InspectionPage() {
  return (
    <InspectionFrame what="inspection" backTo="inspections">
      {(i, project) => (
        <>
          <InspectionHeading title={`Inspection ${i.number}`} project={project}>
            {`Inspection ${i.number}: ${i.title}`}
          </InspectionHeading>
          <InspectionView
            inspection={i}
            projectId={project.id}
            role={project.myRole}
            archived={project.archivedAt !== null}
          />
        </>
      )}
    </InspectionFrame>
  );
}
