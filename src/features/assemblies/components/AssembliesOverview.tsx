import { ButtonLink } from '../../../components/ui/Button';
import { Loading } from '../../../components/ui/Loading';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useAssemblies } from '../api/get-assemblies';
import { AssemblyTable } from './AssemblyTable';

/**
 * The project's assemblies: the table, and for those who may write, the ways to start a new one
 * (from the sample metal-panel wall, or blank). Used on the overview and on the Assemblies tab.
 */
export function AssembliesOverview({ projectId, mayWrite }: { projectId: string; mayWrite: boolean }) {
  const list = useAssemblies(projectId);
  const base = `/projects/${projectId}/assemblies`;
  const count = list.data?.length ?? 0;

  return (
    <div className="flex flex-col gap-4">
      {list.isPending ? (
        <Loading what="Loading the assemblies" />
      ) : list.isError ? (
        <Notice tone="caution" title={errorMessage(list.error)} />
      ) : count === 0 ? (
        <p className="text-ink-muted">
          No assemblies yet. An assembly is one wall build-up — its layers, girts, clips and fasteners — with
          its effective R-value worked out.
        </p>
      ) : (
        <AssemblyTable projectId={projectId} assemblies={list.data} />
      )}
      <div className="flex flex-wrap items-center gap-3">
        {mayWrite ? (
          <>
            <ButtonLink variant="primary" to={`${base}/new`}>
              New assembly
            </ButtonLink>
            <ButtonLink variant="secondary" to={`${base}/new?start=blank`}>
              Start blank
            </ButtonLink>
          </>
        ) : null}
        {count >= 2 && list.data ? (
          <ButtonLink
            variant="quiet"
            to={`${base}/compare?ids=${list.data
              .slice(0, 2)
              .map((a) => a.id)
              .join(',')}`}
          >
            Compare assemblies
          </ButtonLink>
        ) : null}
      </div>
      {mayWrite ? (
        <p className="text-xs text-ink-muted">
          “New assembly” starts from a sample metal-panel rainscreen on steel studs with clips, girts and
          fasteners; change every value to suit the project.
        </p>
      ) : null}
    </div>
  );
}
