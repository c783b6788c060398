import { ITEM_STATE_TEXT } from '@shared/inspections/schema';
import type { FieldReportVerification } from '@shared/schemas/sheets';
import { formatDateTime } from '../../../lib/format';
import { AssemblyRow, VerifiedBy } from '../../sheets/components/SheetVerificationDetails';
import { areaText } from '../scope';

/**
 * What a field report's code confirms: the inspection as that report printed it. A report is a snapshot, so
 * the page says so — a later report of the same inspection has a code of its own.
 */
export function FieldReportVerificationDetails({ report }: { report: FieldReportVerification }) {
  const { inspection, issuedBy } = report;
  const { counts } = inspection;
  const tally = (['pass', 'fail', 'na', 'unseen'] as const).map((s) => (
    <li key={s}>
      <span aria-hidden="true">{ITEM_STATE_TEXT[s].glyph} </span>
      {ITEM_STATE_TEXT[s].label}: <span className="num">{counts[s]}</span>
    </li>
  ));
  return (
    <VerifiedBy
      what="field report"
      code={report.code}
      issuer={report.issuer}
      by={{ term: 'Printed by', account: issuedBy }}
      project={report.project}
      hash={{ term: 'Report hash (SHA-256)', value: report.hash }}
      footer="Compare the handle and the hash with the report you were given: a copy may carry the same firm and project names. This confirms that a report with this content was issued as of the date above; the wall may have changed since. It is an inspection record, not an approval: the licensed professional of record, the local code and the authority having jurisdiction govern."
    >
      <dt className="font-semibold">Inspection</dt>
      <dd data-testid="report-inspection">
        No. <span className="num">{inspection.number}</span> — {inspection.title}
        <br />
        {inspection.elevation} · {areaText(inspection.area)}
      </dd>
      <AssemblyRow assembly={report.assembly} />
      <dt className="font-semibold">State in the report</dt>
      <dd>
        <span className="font-semibold">{inspection.status === 'closed' ? 'Closed' : 'In progress'}</span>
        {' · '}
        <span className="num">{counts.items}</span> items
        <ul className="mt-1 flex flex-wrap gap-x-4">{tally}</ul>
        Open deficiencies: <span className="num font-semibold">{counts.openDeficiencies}</span>
      </dd>
      <dt className="font-semibold">As of</dt>
      <dd>{formatDateTime(report.asOf)}</dd>
      <dt className="font-semibold">First printed</dt>
      <dd>{formatDateTime(report.issuedAt)}</dd>
    </VerifiedBy>
  );
}
