import type { Submittal, SubmittalItem } from '@shared/schemas/submittals';
import { formatVerificationCode } from '@shared/sheets/verification';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDateTime } from '../../../lib/format';
import { sheetPath } from '../../sheets/components/SheetLink';
import { useSubmittalStep } from '../api/mutations';
import { CommentForm, CommentList } from './Comments';

const TYPE_WORD: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/vnd.dwg': 'DWG drawing',
};
const size = (bytes: number) =>
  bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} kB`
    : `${(bytes / 1024 / 1024).toFixed(1)} MB`;

function ItemBody({ s, item }: { s: Submittal; item: SubmittalItem }) {
  if (item.kind === 'sheet') {
    const v = VERDICT_TEXT[item.sheet.verdict];
    return (
      <div className="flex flex-col gap-1">
        <p className="font-semibold">
          Compliance sheet — {item.sheet.assemblyName}, revision {item.sheet.assemblyRevision}
        </p>
        <p className="text-sm">
          {item.sheet.criteriaSetName}, version {item.sheet.criteriaSetVersion} · run{' '}
          {formatDateTime(item.sheet.runAt)} ·{' '}
          <span className={`font-semibold ${v.cls.split(' ')[0]}`}>
            <span aria-hidden="true">{v.glyph} </span>
            <span className="text-ink">{v.word}</span>
          </span>
        </p>
        <p className="text-sm">
          Verification code <span className="num">{formatVerificationCode(item.sheet.verificationCode)}</span>{' '}
          · <Link to={sheetPath(s.projectId, item.sheet.checkRunId)}>Preview the sheet</Link> ·{' '}
          <a href={`/api/check-runs/${item.sheet.checkRunId}/sheet.pdf`} download>
            Download the PDF
          </a>
        </p>
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <p className="font-semibold break-all">{item.file.name}</p>
      <p className="text-sm">
        {TYPE_WORD[item.file.contentType] ?? item.file.contentType} ·{' '}
        <span className="num">{size(item.file.size)}</span> ·{' '}
        <a href={`/api/submittals/${s.id}/items/${item.id}/file`} download={item.file.name}>
          Download
        </a>
      </p>
      <p className="num text-xs text-ink-muted" title="SHA-256 of the stored bytes">
        SHA-256 {item.file.sha256.slice(0, 16)}…
      </p>
    </div>
  );
}

/** The items of a revision, each with its comments; removable while the revision is a draft. */
export function ItemList({
  s,
  mayEdit,
  mayComment,
}: {
  s: Submittal;
  mayEdit: boolean;
  mayComment: boolean;
}) {
  const step = useSubmittalStep(s.id);
  if (s.items.length === 0) return <p className="text-ink-muted">Nothing attached yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-rule border-y border-rule">
      {s.items.map((item, i) => {
        const comments = s.comments.filter((c) => c.itemId === item.id);
        return (
          <li key={item.id} className="grid gap-3 py-3 sm:grid-cols-[2rem_1fr_auto]" data-item={item.kind}>
            <span className="num text-ink-muted">{i + 1}</span>
            <div className="flex flex-col gap-2">
              <ItemBody s={s} item={item} />
              <CommentList comments={comments} />
              {mayComment ? (
                <details>
                  <summary className="cursor-pointer text-sm text-ink-muted">Comment on this item</summary>
                  <div className="mt-2">
                    <CommentForm submittalId={s.id} itemId={item.id} label={`Comment on item ${i + 1}`} />
                  </div>
                </details>
              ) : null}
            </div>
            {mayEdit ? (
              <div>
                <Button
                  variant="quiet"
                  className="px-2 py-1"
                  onClick={() => step.mutate({ kind: 'remove', itemId: item.id })}
                  busy={
                    step.isPending && step.variables?.kind === 'remove' && step.variables.itemId === item.id
                  }
                  busyLabel="Removing…"
                >
                  Remove<span className="sr-only"> item {i + 1}</span>
                </Button>
              </div>
            ) : null}
          </li>
        );
      })}
      {step.isError ? (
        <li className="py-2">
          <Notice tone="caution" title={errorMessage(step.error)} live />
        </li>
      ) : null}
    </ol>
  );
}
