import type { UnitSystem } from '@shared/units';
import { Link } from 'react-router';

/** The address of a run's compliance sheet page (preview, download, verification code). */
export const sheetPath = (projectId: string, runId: string) =>
  `/projects/${encodeURIComponent(projectId)}/check-runs/${encodeURIComponent(runId)}/sheet`;

/** The PDF itself, sent as a download (`GET /api/check-runs/:runId/sheet.pdf`). */
export const sheetPdfUrl = (runId: string, units: UnitSystem) =>
  `/api/check-runs/${encodeURIComponent(runId)}/sheet.pdf?units=${units}&disposition=attachment`;

/** A link any page can put beside a stored run: "Compliance sheet (PDF)". */
export function SheetLink({
  projectId,
  runId,
  children,
}: {
  projectId: string;
  runId: string;
  children?: string;
}) {
  return <Link to={sheetPath(projectId, runId)}>{children ?? 'Compliance sheet (PDF)'}</Link>;
}

/** "Open the sheet" and "Download PDF" (in the person's units) for one stored run. */
export function SheetActions({
  projectId,
  runId,
  units,
  label,
}: {
  projectId: string;
  runId: string;
  units: UnitSystem;
  /** Said to screen readers after each link, e.g. the run's date, where several runs are listed. */
  label?: string;
}) {
  const of = label ? <span className="sr-only"> of the run of {label}</span> : null;
  return (
    <span className="flex flex-wrap gap-x-4 gap-y-1">
      <Link to={sheetPath(projectId, runId)}>Open the sheet{of}</Link>
      <a href={sheetPdfUrl(runId, units)} download>
        Download PDF{of}
      </a>
    </span>
  );
}
