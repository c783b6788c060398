import type { SheetIssuer, SheetVerification } from '@shared/schemas/sheets';
import { formatVerificationCode, ISSUER_NOT_VERIFIED, ISSUER_VERIFIED } from '@shared/sheets/verification';
import type { ReactNode } from 'react';
import { Notice } from '../../../components/ui/Notice';
import { VERDICT_TEXT } from '../../../lib/check-format';
import { formatDate, formatDateTime } from '../../../lib/format';

/**
 * What a verification code confirms, framed by who issued it. A firm's name proves nothing (anyone may make a
 * firm of any name), so the issuer is shown with its unique handle and whether a site administrator has
 * verified it; a sheet or report from an unverified firm is not presented as vouched for. Who made the
 * record, its project and its hash frame `children`, the rows of what else the code confirms (a `<dt>`/`<dd>`
 * pair each); `footer` says how to compare it with the paper.
 */
export function VerifiedBy({
  what,
  code,
  issuer,
  by,
  project,
  hash,
  children,
  footer,
}: {
  what: string;
  code: string;
  issuer: SheetIssuer;
  /** Who made the record under the code ("Checks run by", "Printed by"); `null` once the account is removed. */
  by: { term: string; account: SheetVerification['ranBy'] };
  project: SheetVerification['project'];
  /** The record's hash, the last row, under `term` ("Run hash (SHA-256)"). */
  hash: { term: string; value: string };
  children: ReactNode;
  footer: ReactNode;
}) {
  const verified = issuer.verifiedAt !== null;
  return (
    <section
      aria-labelledby="genuine"
      className="flex flex-col gap-3"
      data-testid="verified"
      data-issuer-verified={verified}
    >
      {verified ? (
        <h2 id="genuine" className="flex items-baseline gap-2 text-xl text-meets">
          <span aria-hidden="true">✓</span> Issued by a verified firm
        </h2>
      ) : (
        <>
          <h2 id="genuine" className="flex items-baseline gap-2 text-xl text-warning">
            <span aria-hidden="true">▲</span> Issued by a firm nobody has verified
          </h2>
          <Notice
            tone="warning"
            title={`${ISSUER_NOT_VERIFIED[0]!.toUpperCase()}${ISSUER_NOT_VERIFIED.slice(1)}.`}
          >
            <p>
              A {what} with this code exists, but anyone can make a firm of any name. Nobody has confirmed
              that <span className="num">{issuer.handle ?? 'this firm'}</span> is “{issuer.name}”. Ask the
              firm for its handle through a channel you already trust before relying on this {what}.
            </p>
          </Notice>
        </>
      )}
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="font-semibold">Code</dt>
        <dd className="num">{formatVerificationCode(code)}</dd>
        <dt className="font-semibold">Issued by</dt>
        <dd data-testid="issuer">
          {issuer.name}
          <br />
          <span className="num break-all">{issuer.handle ?? 'the firm has since been removed'}</span>
          <br />
          {verified ? (
            <span className="text-meets">
              <span aria-hidden="true">✓ </span>
              {ISSUER_VERIFIED} on {formatDate(issuer.verifiedAt!)}
            </span>
          ) : (
            <span className="font-semibold text-warning">
              <span aria-hidden="true">▲ </span>
              {ISSUER_NOT_VERIFIED}
            </span>
          )}
        </dd>
        <dt className="font-semibold">{by.term}</dt>
        <dd>
          {by.account ? (
            <>
              {by.account.name}, e-mail at <span className="break-words">{by.account.emailDomain}</span>
            </>
          ) : (
            'an account since removed'
          )}
        </dd>
        <dt className="font-semibold">Project</dt>
        <dd>
          {project.name}
          {project.number ? ` · No. ${project.number}` : ''}
        </dd>
        {children}
        <dt className="font-semibold">{hash.term}</dt>
        <dd className="num break-all text-xs" data-testid="run-hash">
          {hash.value}
        </dd>
      </dl>
      <p className="text-xs text-ink-muted">{footer}</p>
    </section>
  );
}

/** What a compliance sheet's code confirms: the check run it prints. */
export function SheetVerificationDetails({ sheet }: { sheet: SheetVerification }) {
  const verdict = VERDICT_TEXT[sheet.verdict];
  return (
    <VerifiedBy
      what="sheet"
      code={sheet.code}
      issuer={sheet.issuer}
      by={{ term: 'Checks run by', account: sheet.ranBy }}
      project={sheet.project}
      hash={{ term: 'Run hash (SHA-256)', value: sheet.hash }}
      footer="Compare the handle and the hash with the sheet you were given: a copy may carry the same firm and project names. This confirms that a sheet with this content was issued; it does not approve the design. The licensed professional of record, the local code and the authority having jurisdiction govern."
    >
      <AssemblyRow assembly={sheet.assembly} />
      <dt className="font-semibold">Code table</dt>
      <dd>
        {sheet.criteriaSet.name}, version <span className="num">{sheet.criteriaSet.version}</span>
      </dd>
      <dt className="font-semibold">Date of the run</dt>
      <dd>{formatDateTime(sheet.runAt)}</dd>
      <dt className="font-semibold">Verdict</dt>
      <dd className={`font-semibold ${verdict.cls.split(' ')[0]}`}>
        <span aria-hidden="true">{verdict.glyph} </span>
        <span className="uppercase tracking-wide">{verdict.word}</span>
        <span className="font-normal text-ink"> — {verdict.sentence}</span>
      </dd>
    </VerifiedBy>
  );
}

/** The assembly a verified record is of, by name and revision. */
export function AssemblyRow({ assembly }: { assembly: SheetVerification['assembly'] }) {
  return (
    <>
      <dt className="font-semibold">Assembly</dt>
      <dd>
        {assembly.name}, revision <span className="num">{assembly.revision}</span>
      </dd>
    </>
  );
}
