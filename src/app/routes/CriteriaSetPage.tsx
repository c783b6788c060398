import { criteriaZoneSchema } from '@shared/checks/criteria';
import { wallCategorySchema } from '@shared/schemas/assembly';
import type { CriteriaSave } from '@shared/schemas/criteria';
import { useState } from 'react';
import { Link, useLocation, useNavigate, useParams, useSearchParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { PageHeader } from '../../components/ui/PageHeader';
import { TitledSection } from '../../components/ui/TitledSection';
import { useDeleteCriteriaSet } from '../../features/criteria/api/delete-criteria-set';
import { useCriteriaSet } from '../../features/criteria/api/get-criteria-set';
import { useCriteriaVersions } from '../../features/criteria/api/get-criteria-versions';
import { CriteriaMetaForm } from '../../features/criteria/components/CriteriaMetaForm';
import { CriteriaRowsEditor } from '../../features/criteria/components/CriteriaRowsEditor';
import { CriterionKinds } from '../../features/criteria/components/CriterionKinds';
import { CsvImport } from '../../features/criteria/components/CsvImport';
import { VersionList } from '../../features/criteria/components/VersionList';
import { errorMessage } from '../../lib/api';
import { formatDate } from '../../lib/format';
import { useUnitSystem } from '../../lib/unit-system';

type Flash = { savedAs?: { version: number; from: number } };

/** A `?back=` link only within the site (a path, never another origin). */
const safeBack = (back: string | null) => (back?.startsWith('/') && !back.startsWith('//') ? back : null);

/** One version of a code table: details, the editable grid, CSV import and export, versions. */
export function CriteriaSetPage() {
  const { setId = '' } = useParams();
  const [params] = useSearchParams();
  const back = safeBack(params.get('back'));
  const zone = criteriaZoneSchema.safeParse(params.get('zone'));
  const category = wallCategorySchema.safeParse(params.get('category'));
  const starter = zone.success && category.success ? { zone: zone.data, category: category.data } : null;
  const set = useCriteriaSet(setId);
  const versions = useCriteriaVersions(setId);
  const system = useUnitSystem();
  const navigate = useNavigate();
  const location = useLocation();
  const flash = (location.state as Flash | null) ?? {};
  const [editingMeta, setEditingMeta] = useState(false);
  const remove = useDeleteCriteriaSet();

  if (set.isPending) return <Loading what="Loading the code table" />;
  if (set.isError) return <Notice tone="caution" title={errorMessage(set.error)} live />;
  const s = set.data;
  const mayWrite = s.myAccess !== 'read' && s.isLatest;
  const latest = versions.data?.find((v) => v.isLatest);

  const onSaved = (saved: CriteriaSave) => {
    setEditingMeta(false);
    if (saved.id !== s.id)
      navigate(`/code-tables/${saved.id}`, {
        state: saved.versionCreated ? { savedAs: { version: saved.version, from: s.version } } : {},
      });
  };
  const exportHref = (units: 'SI' | 'IP') =>
    `/api/criteria-sets/${encodeURIComponent(s.id)}/export.csv?units=${units}`;

  return (
    <div className="flex flex-col gap-10">
      <title>{`${s.name} · Code tables · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mb-6 text-sm">
        <Link to="/code-tables">Code tables</Link> <span aria-hidden="true">/</span> {s.name}
        {back ? (
          <>
            {' · '}
            <Link to={back}>Back to the checks</Link>
          </>
        ) : null}
      </nav>
      <PageHeader
        eyebrow={`${s.organisationName} · version ${s.version}${s.frozenAt ? ' · frozen' : ''}`}
        title={s.name}
        description={[s.jurisdiction, s.edition].filter(Boolean).join(' · ') || undefined}
        actions={
          <>
            <a href={exportHref('SI')} download className="text-sm font-semibold">
              Download CSV (SI)
            </a>
            <a href={exportHref('IP')} download className="text-sm font-semibold">
              Download CSV (IP)
            </a>
          </>
        }
      />

      {flash.savedAs && flash.savedAs.version === s.version ? (
        <Notice tone="info" title={`Saved as version ${s.version}.`} live>
          <p>
            Version {flash.savedAs.from} was used by a stored check run, so it stays exactly as issued.{' '}
            <Link to={`/code-tables/${s.id}/diff?from=${flash.savedAs.from}&to=${s.version}`}>
              See what changed
            </Link>
            .
          </p>
        </Notice>
      ) : null}
      {!s.isLatest && latest ? (
        <Notice
          tone="warning"
          title={`This is version ${s.version}; the latest is version ${latest.version}.`}
        >
          <p>
            An older version is kept as it was issued and cannot be edited.{' '}
            <Link to={`/code-tables/${latest.id}`}>Open version {latest.version}</Link>.
          </p>
        </Notice>
      ) : null}
      {s.myAccess === 'read' ? (
        <Notice tone="info" title="You may read this firm’s table; your role does not allow editing it." />
      ) : null}

      <section aria-labelledby="details-heading" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-3 border-b border-ink pb-2">
          <h2 id="details-heading" className="text-2xl">
            Details
          </h2>
          {mayWrite && !editingMeta ? (
            <Button variant="secondary" onClick={() => setEditingMeta(true)}>
              Edit details
            </Button>
          ) : null}
        </div>
        {editingMeta ? (
          <CriteriaMetaForm set={s} onSaved={onSaved} onCancel={() => setEditingMeta(false)} />
        ) : (
          <dl className="grid grid-cols-1 gap-x-8 gap-y-2 text-sm sm:grid-cols-[12rem_1fr]">
            <dt className="label-caps">Jurisdiction</dt>
            <dd>{s.jurisdiction || '—'}</dd>
            <dt className="label-caps">Edition and amendments</dt>
            <dd>{s.edition || '—'}</dd>
            <dt className="label-caps">Effective date</dt>
            <dd className="num">{s.effectiveDate ? formatDate(s.effectiveDate) : '—'}</dd>
            <dt className="label-caps">Source reference</dt>
            <dd>{s.sourceReference || '—'}</dd>
            <dt className="label-caps">Notes</dt>
            <dd className="max-w-prose whitespace-pre-line">{s.notes || '—'}</dd>
          </dl>
        )}
      </section>

      <TitledSection title="Criteria">
        <p className="max-w-prose text-sm text-ink-muted">
          One row per criterion for a climate zone (or all zones) and a wall category; a row naming the zone
          wins over an all-zones row. Values are shown in {system === 'IP' ? 'IP' : 'SI'} units and stored in
          SI.
        </p>
        {starter && s.rows.length === 0 && mayWrite ? (
          <Notice tone="info" title="Fill in the values your code requires, then save the rows.">
            <p>
              One empty row per criterion a check reads, for climate zone {starter.zone}. Remove the rows your
              code does not set: a check compares only the rows the table holds.
            </p>
            <details className="pt-2">
              <summary className="cursor-pointer font-semibold">What each row limits</summary>
              <div className="pt-3">
                <CriterionKinds system={system} />
              </div>
            </details>
          </Notice>
        ) : null}
        <CriteriaRowsEditor set={s} system={system} onSaved={onSaved} starter={starter} />
      </TitledSection>

      {mayWrite ? (
        <TitledSection title="Import from CSV">
          <CsvImport set={s} onSaved={onSaved} />
        </TitledSection>
      ) : null}

      <TitledSection title="Versions">
        <p className="max-w-prose text-sm text-ink-muted">
          A version that a stored check run used is frozen: it never changes again, and editing it creates the
          next version.
        </p>
        {versions.data ? (
          <VersionList versions={versions.data} currentId={s.id} />
        ) : (
          <Loading what="Loading the versions" />
        )}
      </TitledSection>

      {s.myAccess === 'admin' && !s.frozenAt && s.isLatest ? (
        <TitledSection
          title="Delete this version"
          heading="text-lg"
          className="flex flex-col gap-3 border-t border-rule pt-6"
        >
          <p className="text-sm">No check run has used version {s.version}, so it may be deleted.</p>
          {remove.isError ? <Notice tone="caution" title={errorMessage(remove.error)} live /> : null}
          <div>
            <Button
              variant="danger"
              busy={remove.isPending}
              busyLabel="Deleting…"
              onClick={async () => {
                if (!window.confirm(`Delete version ${s.version} of “${s.name}”?`)) return;
                await remove.mutateAsync(s.id);
                navigate(s.previousVersionId ? `/code-tables/${s.previousVersionId}` : '/code-tables');
              }}
            >
              Delete version {s.version}
            </Button>
          </div>
        </TitledSection>
      ) : null}
    </div>
  );
}
