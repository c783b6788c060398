import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Cautions } from '../../components/ui/Cautions';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { TitledSection } from '../../components/ui/TitledSection';
import { useCheckRun } from '../../features/checks/api/get-check-run';
import { useProject } from '../../features/projects/api/get-project';
import { SheetPreview } from '../../features/sheets/components/SheetPreview';
import { errorMessage } from '../../lib/api';
import { VERDICT_TEXT } from '../../lib/check-format';
import { formatDateTime } from '../../lib/format';
import { useUnitSystem } from '../../lib/unit-system';

/** The compliance sheet of one stored check run: produce it, preview it, download it. */
export function CheckRunSheetPage() {
  const { projectId = '', runId = '' } = useParams();
  const { data: project } = useProject(projectId);
  const run = useCheckRun(runId);
  const preferred = useUnitSystem();
  const [units, setUnits] = useState<UnitSystem>(preferred);

  if (!project) return null;
  if (run.isPending) return <Loading what="Loading the check run" />;
  if (run.isError) return <Notice tone="caution" title={errorMessage(run.error)} live />;
  const r = run.data;
  if (r.projectId !== project.id)
    return <Notice tone="caution" title="This run belongs to another project." />;
  const v = VERDICT_TEXT[r.verdict];
  const checks = `/projects/${project.id}/assemblies/${r.assemblyId}/checks?run=${r.id}`;

  return (
    <div className="flex flex-col gap-6">
      <title>{`Compliance sheet · ${r.assemblyName} · Skinwright`}</title>
      <nav aria-label="Breadcrumb" className="-mt-2 text-sm">
        <Link to={`/projects/${project.id}/assemblies`}>Assemblies</Link> <span aria-hidden="true">/</span>{' '}
        <Link to={`/projects/${project.id}/assemblies/${r.assemblyId}`}>{r.assemblyName}</Link>{' '}
        <span aria-hidden="true">/</span> <Link to={checks}>Checks</Link> <span aria-hidden="true">/</span>{' '}
        Compliance sheet
      </nav>
      <TitledSection title="Compliance sheet">
        <dl className="grid gap-x-8 gap-y-1 text-sm sm:grid-cols-[12rem_1fr]">
          <dt className="font-semibold">Assembly</dt>
          <dd>
            {r.assemblyName}, revision <span className="num">{r.assemblyRevision}</span>
          </dd>
          <dt className="font-semibold">Code table</dt>
          <dd>
            {r.criteriaSetName}, version <span className="num">{r.criteriaSetVersion}</span>
          </dd>
          <dt className="font-semibold">Run</dt>
          <dd>
            {formatDateTime(r.createdAt)} by {r.createdBy ?? '—'}
          </dd>
          <dt className="font-semibold">Verdict</dt>
          <dd className={`font-semibold ${v.cls.split(' ')[0]}`} data-testid="sheet-verdict">
            <span aria-hidden="true">{v.glyph} </span>
            <span className="uppercase tracking-wide">{v.word}</span>
            <span className="font-normal text-ink"> — {v.sentence}</span>
          </dd>
        </dl>
        <p className="max-w-prose text-sm text-ink-muted">
          The sheet prints this stored run exactly as it was computed — inputs, the section to scale, every
          module’s results and formulas, the checks and the cautions — with a verification code that anyone
          can confirm without signing in.
        </p>
        <fieldset className="flex flex-wrap items-center gap-4 text-sm">
          <legend className="sr-only">Units on the sheet</legend>
          <span className="font-semibold" aria-hidden="true">
            Units on the sheet
          </span>
          {(['SI', 'IP'] as const).map((u) => (
            <label key={u} className="flex items-center gap-1">
              <input
                type="radio"
                name="sheet-units"
                value={u}
                checked={units === u}
                onChange={() => setUnits(u)}
              />
              {u === 'SI' ? 'SI (metric)' : 'IP (inch-pound)'}
            </label>
          ))}
        </fieldset>
      </TitledSection>
      <SheetPreview runId={r.id} units={units} />
      <Cautions
        items={[
          'Skinwright is an aid to — never a substitute for — the licensed professional of record.',
          'Local codes and the authority having jurisdiction govern; the manufacturer’s tested values govern.',
        ]}
        engineVersion={r.engineVersion}
      />
    </div>
  );
}
