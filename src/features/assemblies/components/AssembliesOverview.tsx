import { type AssemblySummary, WALL_CATEGORY_LABELS } from '@shared/schemas/assembly';
import { useState } from 'react';
import { ButtonLink } from '../../../components/ui/Button';
import { Dialog } from '../../../components/ui/Dialog';
import { FilterBar, FilterSelect, SearchBox } from '../../../components/ui/FilterBar';
import { Loading } from '../../../components/ui/Loading';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { matchesQuery, useListFilters } from '../../../lib/list-filter';
import { useAssemblies } from '../api/get-assemblies';
import { AssemblyTable } from './AssemblyTable';
import { DuplicateAssemblyForm } from './DuplicateAssembly';

const FILTERS = ['q', 'category', 'verdict'] as const;
/** The `verdict` filter's “never checked”. */
const UNCHECKED = 'none';

/**
 * The project's assemblies: the table, and for those who may write, the ways to start a new one
 * (from a template, or blank). Used on the overview and, `searchable` (name, wall category,
 * last check's verdict, kept in the address), on the Assemblies tab. Given the projects a copy may go to
 * (`duplicateTargets`, filtered by the page), each row offers "Duplicate…" in a dialog.
 */
export function AssembliesOverview({
  projectId,
  mayWrite,
  searchable = false,
  duplicateTargets = [],
}: {
  projectId: string;
  mayWrite: boolean;
  searchable?: boolean;
  duplicateTargets?: { id: string; name: string }[];
}) {
  const list = useAssemblies(projectId);
  const [copying, setCopying] = useState<AssemblySummary | null>(null);
  const onDuplicate = duplicateTargets.length > 0 ? setCopying : undefined;
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
      ) : searchable ? (
        <SearchableTable projectId={projectId} assemblies={list.data} onDuplicate={onDuplicate} />
      ) : (
        <AssemblyTable projectId={projectId} assemblies={list.data} onDuplicate={onDuplicate} />
      )}
      <Dialog
        open={copying !== null}
        title={copying ? `Duplicate “${copying.name}”` : ''}
        onClose={() => setCopying(null)}
      >
        {copying ? (
          <DuplicateAssemblyForm
            key={copying.id}
            assembly={copying}
            projectId={projectId}
            targets={duplicateTargets}
            onCancel={() => setCopying(null)}
          />
        ) : null}
      </Dialog>
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
          “New assembly” starts from a template — an insulated metal panel on girts, a metal rainscreen on
          clips and girts, or a steel-stud backup with exterior insulation — with generic values; change every
          value to suit the project.
        </p>
      ) : null}
    </div>
  );
}

function SearchableTable({
  projectId,
  assemblies,
  onDuplicate,
}: {
  projectId: string;
  assemblies: readonly AssemblySummary[];
  onDuplicate?: (assembly: AssemblySummary) => void;
}) {
  const filters = useListFilters(FILTERS);
  const { q, category, verdict } = filters.values;
  const categories = [...new Set(assemblies.map((a) => a.wallCategory))];
  const shown = assemblies.filter(
    (a) =>
      (category === '' || a.wallCategory === category) &&
      (verdict === '' || (a.lastRun?.verdict ?? UNCHECKED) === verdict) &&
      matchesQuery(q, [a.name, WALL_CATEGORY_LABELS[a.wallCategory]]),
  );
  return (
    <>
      <FilterBar label="Find assemblies" active={filters.active} onClear={filters.clear}>
        <SearchBox hint="Name or wall category." value={q} onChange={(t) => filters.set('q', t, true)} />
        <FilterSelect
          label="Wall category"
          className="w-56"
          value={category}
          onChange={(k) => filters.set('category', k)}
          options={categories.map((k) => ({ value: k, label: WALL_CATEGORY_LABELS[k] }))}
        />
        <FilterSelect
          label="Last check"
          className="w-44"
          value={verdict}
          onChange={(v) => filters.set('verdict', v)}
          options={[
            ...(['pass', 'fail', 'incomplete'] as const).map((v) => ({
              value: v,
              label: VERDICT_TEXT[v].word,
            })),
            { value: UNCHECKED, label: 'Not checked' },
          ]}
        />
      </FilterBar>
      <p role="status" className="text-sm text-ink-muted">
        {filters.active ? `${shown.length} of ${assemblies.length} assemblies match.` : ''}
      </p>
      {shown.length > 0 ? (
        <AssemblyTable projectId={projectId} assemblies={shown} onDuplicate={onDuplicate} />
      ) : (
        <p className="border-y border-rule py-8 text-center">No assembly matches the search.</p>
      )}
    </>
  );
}
