import { can } from '@shared/auth/permissions';
import { useSearchParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { TitledSection } from '../../components/ui/TitledSection';
import { useCheckRun } from '../../features/checks/api/get-check-run';
import { useCheckRuns } from '../../features/checks/api/get-check-runs';
import { CheckReportView } from '../../features/checks/components/CheckReportView';
import { PastRuns } from '../../features/checks/components/PastRuns';
import { RunCheckForm } from '../../features/checks/components/RunCheckForm';
import { StartCodeTableForm } from '../../features/checks/components/StartCodeTableForm';
import { useProjectCriteriaSets } from '../../features/criteria/api/get-project-criteria-sets';
import { SheetActions } from '../../features/sheets/components/SheetLink';
import { errorMessage } from '../../lib/api';
import { useUnitSystem } from '../../lib/unit-system';
import { useAssemblyFrame } from '../layout/AssemblyLayout';

/** Checks of one assembly: run it against a code table, read the stored run, see the runs before. */
export function AssemblyChecksPage() {
  const { project, assembly: a } = useAssemblyFrame();
  const [params, setParams] = useSearchParams();
  const sets = useProjectCriteriaSets(project.id);
  const runs = useCheckRuns(project.id, a.id);
  const shownId = params.get('run') ?? runs.data?.[0]?.id ?? null;
  const run = useCheckRun(shownId);
  const system = useUnitSystem();
  const mayRun = can(project.myRole, 'checkrun.create') && project.archivedAt === null;

  return (
    <>
      <title>{`Checks · ${a.name} · Skinwright`}</title>

      <section aria-labelledby="run-heading" className="flex flex-col gap-3">
        <h2 id="run-heading" className="border-b border-ink pb-2 text-2xl">
          Checks of “{a.name}”
        </h2>
        <p className="max-w-prose text-sm text-ink-muted">
          A run checks revision {a.revision} of the assembly with every module — thermal, moisture, wind
          attachment, sealant joints — against one version of a code table, and is stored as issued: its
          inputs, results and a verification code. The version of the table it used is frozen from then on.
        </p>
        {mayRun ? (
          sets.isPending ? (
            <Loading what="Loading the code tables" />
          ) : sets.isError ? (
            <Notice tone="caution" title={errorMessage(sets.error)} live />
          ) : sets.data.length === 0 ? (
            <StartCodeTableForm
              zone={project.climateZone}
              category={a.wallCategory}
              system={system}
              back={`/projects/${project.id}/assemblies/${a.id}/checks`}
            />
          ) : (
            <RunCheckForm assemblyId={a.id} sets={sets.data} onRun={(runId) => setParams({ run: runId })} />
          )
        ) : (
          <p className="text-sm">
            {project.archivedAt
              ? 'The project is archived: its stored runs are shown, and no new run can be made.'
              : 'Your role on this project shows the stored runs; it does not run new checks.'}
          </p>
        )}
      </section>

      <section aria-label="Check run" className="flex flex-col gap-3">
        {shownId === null ? (
          runs.isPending ? (
            <Loading what="Loading the runs" />
          ) : (
            <p className="text-ink-muted">No check has been run on this assembly yet.</p>
          )
        ) : run.isPending ? (
          <Loading what="Loading the run" />
        ) : run.isError ? (
          <Notice tone="caution" title={errorMessage(run.error)} live />
        ) : (
          <>
            <p className="flex flex-wrap items-baseline gap-x-4 gap-y-1 text-sm">
              <span className="font-semibold">Compliance sheet of this run:</span>
              <SheetActions projectId={project.id} runId={run.data.id} units={system} />
            </p>
            <CheckReportView run={run.data} system={system} />
          </>
        )}
      </section>

      {runs.data && runs.data.length > 0 ? (
        <TitledSection title="Runs of this assembly">
          <PastRuns
            projectId={project.id}
            runs={runs.data}
            shownId={shownId}
            hrefFor={(runId) => `?run=${runId}`}
            units={system}
          />
        </TitledSection>
      ) : null}
    </>
  );
}
