import { CloseInspection } from '../../features/inspections/components/CloseInspection';
import { InspectionFrame, InspectionHeading, inspectionHref } from './InspectionFrame';

export function CloseInspectionPage() {
  return (
    <InspectionFrame what="inspection" backTo="inspection">
      {(i, project) => (
        <>
          <InspectionHeading title={`Close inspection ${i.number}`} project={project}>
            {`Close inspection ${i.number}`}
          </InspectionHeading>
          <CloseInspection inspection={i} base={inspectionHref(i, project)} />
        </>
      )}
    </InspectionFrame>
  );
}
