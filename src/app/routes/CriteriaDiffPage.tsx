import { Link, useParams, useSearchParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useCriteriaDiff } from '../../features/criteria/api/get-criteria-diff';
import { useCriteriaSet } from '../../features/criteria/api/get-criteria-set';
import { DiffView } from '../../features/criteria/components/DiffView';
import { errorMessage } from '../../lib/api';
import { useUnitSystem } from '../../lib/unit-system';
import { diffVersionsOf } from '../route-params';

/** What changed between two versions of a code table (`?from=1&to=2`). */
export function CriteriaDiffPage() {
  const { setId = '' } = useParams();
  const [params] = useSearchParams();
  const versions = diffVersionsOf(params);
  const { from, to } = versions ?? { from: 1, to: 1 };
  const valid = versions !== null;
  const set = useCriteriaSet(setId);
  const diff = useCriteriaDiff(setId, from, to);
  const system = useUnitSystem();

  return (
    <div className="flex flex-col gap-8">
      <title>{`Changes · ${set.data?.name ?? 'Code table'} · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mb-6 text-sm">
        <Link to="/code-tables">Code tables</Link> <span aria-hidden="true">/</span>{' '}
        {set.data ? <Link to={`/code-tables/${set.data.id}`}>{set.data.name}</Link> : '…'}{' '}
        <span aria-hidden="true">/</span> Changes
      </nav>
      <PageHeader
        eyebrow="Code table · changes"
        title={valid ? `Version ${from} → version ${to}` : 'Changes between versions'}
        description={set.data?.name}
      />
      {!valid ? (
        <Notice tone="caution" title="Name two versions, e.g. ?from=1&to=2." />
      ) : diff.isPending ? (
        <Loading what="Comparing the versions" />
      ) : diff.isError ? (
        <Notice tone="caution" title={errorMessage(diff.error)} live />
      ) : (
        <DiffView diff={diff.data} system={system} labels={set.data?.categoryLabels ?? {}} />
      )}
    </div>
  );
}
