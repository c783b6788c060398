import type { InspectionSummary } from '@shared/inspections/schema';
import { Link } from 'react-router';
import { scopeText } from '../scope';

/** The project's inspections: number, scope, assembly, progress and open deficiencies, in words. */
export function InspectionList({
  inspections,
  projectId,
}: {
  inspections: InspectionSummary[];
  projectId: string;
}) {
  return (
    <ul className="flex flex-col divide-y divide-rule border-y border-rule" aria-label="Inspections">
      {inspections.map((i) => {
        const answered = i.counts.items - i.counts.unseen;
        return (
          <li key={i.id} className="flex flex-col gap-1 py-3">
            <Link
              to={`/projects/${projectId}/inspections/${i.id}`}
              className="min-h-11 content-center text-lg font-semibold"
            >
              {`No. ${i.number} · ${i.title}`}
            </Link>
            <p className="text-sm">{`${scopeText(i.scope)} · ${i.assemblyName} rev ${i.scope.revision}`}</p>
            <p className="flex flex-wrap gap-x-4 text-sm text-ink-muted">
              <span>{i.status === 'closed' ? 'Closed' : `${answered} of ${i.counts.items} answered`}</span>
              <span>{`✓ ${i.counts.pass} pass`}</span>
              <span>{`✕ ${i.counts.fail} fail`}</span>
              <span>{`! ${i.counts.openDeficiencies} open deficiencies`}</span>
            </p>
          </li>
        );
      })}
    </ul>
  );
}
