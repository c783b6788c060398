import { Link, useParams, useSearchParams } from 'react-router';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { useCriteriaDiff } from '../../features/criteria/api/get-criteria-diff';
import { useCriteriaSet } from '../../features/criteria/api/get-criteria-set';
import { DiffView } from '../../features/criteria/components/DiffView';
import { errorMessage } from '../../lib/api';
import { useUnitSystem } from '../../lib/unit-system';

/** What changed between two versions of a code table (`?from=1&to=2`). */
export function CriteriaDiffPage() {
  const { setId = '' } = useParams();
  const [params] = useSearchParams();
  const from = Number(params.get('from'));
  const to = Number(params.get('to'));
  const valid = Number.isInteger(from) && Number.isInteger(to) && from > 0 && to > 0;
  const set = useCriteriaSet(setId);
  const diff = useCriteriaDiff(setId, valid ? from : 1, valid ? to : 1);
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
