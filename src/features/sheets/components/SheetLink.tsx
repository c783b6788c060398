import { Link } from 'react-router';

/** The address of a run's compliance sheet page (preview, download, verification code). */
export const sheetPath = (projectId: string, runId: string) =>
  `/projects/${encodeURIComponent(projectId)}/check-runs/${encodeURIComponent(runId)}/sheet`;

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
