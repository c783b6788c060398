import type { TraceStep } from '@shared/calc/trace';
import { categoryLabel, zoneLabel } from '@shared/checks/criteria';
import { type Check, methodDetail, type Verdict } from '@shared/checks/report';
import { storedMessageText } from '@shared/format';
import type { CheckRun } from '@shared/schemas/check-runs';
import type { UnitSystem } from '@shared/units';
import { Table, Td, Th } from '../../../components/ui/Table';
import { checkFigures, formatSiValue, STATUS_WORD, VERDICT_TEXT } from '../../../lib/check-format';
import { formatDateTime } from '../../../lib/format';

function VerdictLine({
  label,
  verdict,
  detail,
  testId,
}: {
  label: string;
  verdict: Verdict;
  detail: string;
  testId: string;
}) {
  const v = VERDICT_TEXT[verdict];
  return (
    <div
      className="grid grid-cols-1 items-baseline gap-x-4 gap-y-1 border-b border-rule py-2 sm:grid-cols-[18rem_1fr]"
      data-testid={testId}
    >
      <dt className="text-sm font-semibold">{label}</dt>
      <dd className={`font-semibold ${v.cls.split(' ')[0]}`}>
        <span aria-hidden="true" className="mr-1">
          {v.glyph}
        </span>
        <span className="uppercase tracking-wide">{v.word}</span>
        <span className="font-normal text-ink"> — {detail}</span>
      </dd>
    </div>
  );
}

const counts = (checks: Check[]) => {
  const n = (s: Check['status']) => checks.filter((c) => c.status === s).length;
  const parts = [
    `${n('pass')} met`,
    n('fail') > 0 ? `${n('fail')} failed` : '',
    n('not_evaluated') > 0 ? `${n('not_evaluated')} not evaluated` : '',
  ];
  return parts.filter(Boolean).join(', ');
};

function Steps({ ids, steps, system }: { ids: string[]; steps: Map<string, TraceStep>; system: UnitSystem }) {
  const found = ids.map((id) => steps.get(id)).filter((s): s is TraceStep => Boolean(s));
  if (found.length === 0) return null;
  return (
    <details className="mt-1 text-xs">
      <summary className="cursor-pointer text-ink-muted">Show the work</summary>
      <ul className="mt-1 flex flex-col gap-1">
        {found.map((s) => (
          <li key={s.id}>
            <span className="font-semibold">{s.label}</span>: <span className="num">{s.formula}</span> ={' '}
            <span className="num">{formatSiValue(s.value, s.unit, system)}</span>
            <span className="block text-ink-muted">{s.source}</span>
            {s.note ? <span className="block text-ink-muted">{s.note}</span> : null}
          </li>
        ))}
      </ul>
    </details>
  );
}

function CheckTable({
  caption,
  checks,
  labels,
  system,
  steps,
}: {
  caption: string;
  checks: Check[];
  labels: Record<string, string>;
  system: UnitSystem;
  steps: Map<string, TraceStep>;
}) {
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Check</Th>
          <Th numeric>Required</Th>
          <Th numeric>Provided</Th>
          <Th className="min-w-52">Result</Th>
        </tr>
      </thead>
      <tbody>
        {checks.map((c) => {
          const s = STATUS_WORD[c.status];
          const figures = checkFigures(c, system);
          return (
            <tr key={c.id} data-check={c.id} data-status={c.status}>
              <Td className="min-w-60">
                <span className="font-semibold">{c.label}</span>
                {c.row ? (
                  <span className="block text-xs text-ink-muted">
                    {zoneLabel(c.row.climateZone)} · {categoryLabel(labels, c.row.wallCategory)}
                  </span>
                ) : null}
                {figures.reason ? (
                  <span className="block text-xs text-ink-muted">{figures.reason}</span>
                ) : null}
                {c.method ? (
                  <details className="mt-1 text-xs" data-testid="check-method">
                    <summary className="cursor-pointer">
                      <span className="font-semibold">Method:</span> {c.method.label}
                    </summary>
                    <span className="block text-ink-muted">
                      {methodDetail(c.method, (R) => formatSiValue(R, 'm²·K/W', system))}
                    </span>
                  </details>
                ) : null}
                <Steps ids={c.traceStepIds} steps={steps} system={system} />
              </Td>
              <Td numeric className="whitespace-nowrap">
                {figures.required}
              </Td>
              <Td numeric className="whitespace-nowrap">
                {figures.provided}
              </Td>
              <Td className={`font-semibold ${s.cls}`}>
                <span aria-hidden="true" className="mr-1">
                  {s.glyph}
                </span>
                <span className="text-ink">{figures.result}</span>
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

/** One stored run read top to bottom like the sheet: what was checked, the verdict, every check, cautions. */
export function CheckReportView({ run, system }: { run: CheckRun; system: UnitSystem }) {
  const report = run.outputs;
  const set = run.inputs.criteriaSet;
  const labels = set.categoryLabels as Record<string, string>;
  // The report's two halves, each a verdict line and a table: against the code table, the modules' design checks.
  const part = (id: string, source: Check['source'], verdict: Verdict, label: string, caption: string) => ({
    id,
    verdict,
    label,
    caption,
    checks: report.checks.filter((c) => c.source === source),
  });
  const parts = [
    part('criteria', 'criteria', report.criteriaVerdict, 'Against the code table', 'Against the code table'),
    part(
      'modules',
      'module',
      report.moduleVerdict,
      'Design checks (wind, joints, surface)',
      'Design checks of the modules',
    ),
  ];
  const steps = new Map(report.steps.map((s) => [s.id, s]));
  return (
    <article aria-labelledby={`run-${run.id}`} className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <p className="label-caps">
          Check run · {formatDateTime(run.createdAt)}
          {run.createdBy ? ` · ${run.createdBy}` : ''}
        </p>
        <h3 id={`run-${run.id}`} className="text-2xl">
          {run.assemblyName}, revision {run.assemblyRevision} — against “{set.name}”, version {set.version}
        </h3>
        <p className="text-sm text-ink-muted">
          Climate zone {report.climateZone} · {categoryLabel(labels, report.wallCategory)} ·{' '}
          {report.matchedRows} row
          {report.matchedRows === 1 ? '' : 's'} of the table apply
          {set.edition ? ` · ${set.edition}` : ''}
        </p>
      </header>

      <dl aria-label="Verdict" className="border-t-2 border-ink">
        <VerdictLine
          testId="verdict-overall"
          label="Overall verdict"
          verdict={report.verdict}
          detail={`${VERDICT_TEXT[report.verdict].sentence} (${counts(report.checks)})`}
        />
        {parts.map((p) => (
          <VerdictLine
            key={p.id}
            testId={`verdict-${p.id}`}
            label={p.label}
            verdict={p.verdict}
            detail={counts(p.checks)}
          />
        ))}
      </dl>

      {parts.map((p) => (
        <CheckTable
          key={p.id}
          caption={p.caption}
          checks={p.checks}
          labels={labels}
          system={system}
          steps={steps}
        />
      ))}

      <section
        aria-labelledby={`cautions-${run.id}`}
        className="flex flex-col gap-2 border-t border-ink pt-4"
      >
        <h4 id={`cautions-${run.id}`} className="text-lg">
          Cautions
        </h4>
        <ul className="list-disc pl-5 text-sm">
          {report.cautions.map((c) => (
            <li key={JSON.stringify(c)}>{storedMessageText(c, system)}</li>
          ))}
        </ul>
      </section>

      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 border-t border-rule pt-3 text-xs text-ink-muted sm:grid-cols-2">
        <div>
          <dt className="inline">Engine version: </dt>
          <dd className="num inline">{run.engineVersion}</dd>
        </div>
        <div>
          <dt className="inline">Verification code (SHA-256): </dt>
          <dd className="num inline break-all" title={run.hash}>
            {run.hash.slice(0, 16)}…
          </dd>
        </div>
      </dl>
    </article>
  );
}
