import type { CheckRunSummary } from '@shared/schemas/check-runs';
import { formatVerificationCode, verificationCode } from '@shared/sheets/verification';
import type { UnitSystem } from '@shared/units';
import { Link } from 'react-router';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDateTime } from '../../../lib/format';
import { SheetActions } from '../../sheets/components/SheetLink';

/** Stored runs of one assembly, newest first; each opens on the same page and links its sheet. */
export function PastRuns({
  projectId,
  runs,
  shownId,
  hrefFor,
  units,
}: {
  projectId: string;
  runs: CheckRunSummary[];
  shownId: string | null;
  hrefFor: (runId: string) => string;
  /** The person's unit system: the PDF is downloaded in it. */
  units: UnitSystem;
}) {
  return (
    <Table
      caption="Past runs (each is stored as issued)"
      head={[
        'When',
        'By',
        'Code table',
        numeric('Assembly rev.'),
        'Verdict',
        'Verification code',
        'Compliance sheet',
      ]}
    >
      <tbody>
        {runs.map((r) => {
          const v = VERDICT_TEXT[r.verdict];
          return (
            <tr key={r.id} className={r.id === shownId ? 'bg-paper-sunk' : undefined}>
              <Td className="whitespace-nowrap">
                {r.id === shownId ? (
                  <span aria-current="true" className="font-semibold">
                    {formatDateTime(r.createdAt)} (shown)
                  </span>
                ) : (
                  <Link to={hrefFor(r.id)}>{formatDateTime(r.createdAt)}</Link>
                )}
              </Td>
              <Td>{r.createdBy ?? '—'}</Td>
              <Td>
                {r.criteriaSetName}, v{r.criteriaSetVersion}
              </Td>
              <Td numeric>{r.assemblyRevision}</Td>
              <Td className={`font-semibold ${v.cls.split(' ')[0]}`}>
                <span aria-hidden="true">{v.glyph} </span>
                <span className="text-ink">{v.word}</span>
                <span className="block text-xs font-normal text-ink-muted">
                  {r.counts.pass} met · {r.counts.fail} failed · {r.counts.notEvaluated} not evaluated
                </span>
              </Td>
              <Td className="num text-xs">{formatVerificationCode(verificationCode(r.hash))}</Td>
              <Td className="whitespace-nowrap">
                <SheetActions
                  projectId={projectId}
                  runId={r.id}
                  units={units}
                  label={formatDateTime(r.createdAt)}
                />
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
