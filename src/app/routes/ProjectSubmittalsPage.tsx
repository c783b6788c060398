import { can } from '@shared/auth/permissions';
import { SUBMITTAL_STATUS_TEXT, SUBMITTAL_STATUSES } from '@shared/schemas/submittals';
import { useId } from 'react';
import { useSearchParams } from 'react-router';
import { ButtonLink } from '../../components/ui/Button';
import { Loaded } from '../../components/ui/Loaded';
import { Select } from '../../components/ui/Select';
import { useSubmittals } from '../../features/submittals/api/get-submittals';
import { SubmittalTable } from '../../features/submittals/components/SubmittalTable';
import { submittalStatusOf } from '../route-params';
import { ProjectPage, useRouteProject } from './project-page';

/** The project's submittals, filtered by status (kept in the address so it can be shared). */
export function ProjectSubmittalsPage() {
  const filterId = useId();
  const [params, setParams] = useSearchParams();
  const status = submittalStatusOf(params);
  const { projectId, project } = useRouteProject();
  const list = useSubmittals(projectId, status);
  if (!project) return null;
  const mayCreate = can(project.myRole, 'submittal.create') && project.archivedAt === null;

  return (
    <ProjectPage
      project={project}
      title="Submittals"
      action={
        mayCreate ? (
          <ButtonLink variant="primary" to={`/projects/${project.id}/submittals/new`}>
            New submittal
          </ButtonLink>
        ) : null
      }
    >
      <p className="max-w-prose text-sm text-ink-muted">
        Packages sent by the cladding subcontractor for the design team’s review: compliance sheets of stored
        check runs and uploaded product data, test reports and shop drawings, each under a specification
        section and a revision.
      </p>
      <div className="flex items-center gap-3">
        <label htmlFor={filterId} className="text-sm font-semibold">
          Show
        </label>
        <div className="w-64">
          <Select
            id={filterId}
            value={status ?? ''}
            onChange={(e) => setParams(e.target.value ? { status: e.target.value } : {})}
          >
            <option value="">Every status</option>
            {SUBMITTAL_STATUSES.map((s) => (
              <option key={s} value={s}>
                {SUBMITTAL_STATUS_TEXT[s].label}
              </option>
            ))}
          </Select>
        </div>
      </div>
      <Loaded
        query={list}
        what="Loading the submittals"
        empty={
          <p className="text-ink-muted">
            {status
              ? `No submittal is ${SUBMITTAL_STATUS_TEXT[status].label.toLowerCase()}.`
              : 'No submittal yet.'}
          </p>
        }
      >
        {(data) => <SubmittalTable projectId={project.id} submittals={data} />}
      </Loaded>
    </ProjectPage>
  );
}
