import { formatVerificationCode, normaliseVerificationCode } from '@shared/sheets/verification';
import { type FormEvent, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Field } from '../../components/ui/Field';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { TextInput } from '../../components/ui/TextInput';
import { useVerification } from '../../features/sheets/api/get-verification';
import { errorMessage, isApiRequestError } from '../../lib/api';
import { VERDICT_TEXT } from '../../lib/check-format';
import { formatDateTime } from '../../lib/format';
import { AuthPageFrame } from './AuthPageFrame';

function CodeForm({ initial }: { initial: string }) {
  const navigate = useNavigate();
  const [value, setValue] = useState(initial);
  const [error, setError] = useState<string | undefined>();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const code = normaliseVerificationCode(value);
    if (!code) {
      setError('A code has 10 letters and digits 2–7, e.g. K3QF7-ZC2MA.');
      return;
    }
    setError(undefined);
    navigate(`/verify/${code}`);
  };
  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-end gap-3">
      <Field
        label="Verification code"
        hint="As printed on the sheet."
        error={error}
        className="min-w-56 flex-1"
      >
        {(c) => (
          <TextInput {...c} value={value} onChange={(e) => setValue(e.target.value)} autoComplete="off" />
        )}
      </Field>
      <Button type="submit">Check</Button>
    </form>
  );
}

/** Public: confirms a compliance sheet by its code — who issued it, for what, when, with what verdict. */
export function VerifyPage() {
  const { code = '' } = useParams();
  const canonical = normaliseVerificationCode(code);
  const result = useVerification(canonical ?? code);

  return (
    <AuthPageFrame
      title="Check a compliance sheet"
      intro="Every Skinwright compliance sheet carries a verification code. The details below are what the sheet with this code states; compare them with the paper or file you were given."
    >
      <div className="flex flex-col gap-6">
        {!canonical || (result.isError && isApiRequestError(result.error) && result.error.status === 404) ? (
          <Notice tone="caution" title="No such sheet." live>
            <p>
              No sheet was issued with the code <span className="num font-semibold">{code}</span>. It may be
              mistyped, or the sheet may have been altered.
            </p>
          </Notice>
        ) : result.isPending ? (
          <Loading what="Checking the code" />
        ) : result.isError ? (
          <Notice tone="caution" title={errorMessage(result.error)} live />
        ) : (
          <section aria-labelledby="genuine" className="flex flex-col gap-3" data-testid="verified">
            <h2 id="genuine" className="flex items-baseline gap-2 text-xl text-meets">
              <span aria-hidden="true">✓</span> Issued by Skinwright
            </h2>
            <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[10rem_1fr]">
              <dt className="font-semibold">Code</dt>
              <dd className="num">{formatVerificationCode(result.data.code)}</dd>
              <dt className="font-semibold">Issued by</dt>
              <dd>{result.data.issuer}</dd>
              <dt className="font-semibold">Project</dt>
              <dd>
                {result.data.project.name}
                {result.data.project.number ? ` · No. ${result.data.project.number}` : ''}
              </dd>
              <dt className="font-semibold">Assembly</dt>
              <dd>
                {result.data.assembly.name}, revision{' '}
                <span className="num">{result.data.assembly.revision}</span>
              </dd>
              <dt className="font-semibold">Code table</dt>
              <dd>
                {result.data.criteriaSet.name}, version{' '}
                <span className="num">{result.data.criteriaSet.version}</span>
              </dd>
              <dt className="font-semibold">Date of the run</dt>
              <dd>{formatDateTime(result.data.runAt)}</dd>
              <dt className="font-semibold">Verdict</dt>
              <dd className={`font-semibold ${VERDICT_TEXT[result.data.verdict].cls.split(' ')[0]}`}>
                <span aria-hidden="true">{VERDICT_TEXT[result.data.verdict].glyph} </span>
                <span className="uppercase tracking-wide">{VERDICT_TEXT[result.data.verdict].word}</span>
                <span className="font-normal text-ink"> — {VERDICT_TEXT[result.data.verdict].sentence}</span>
              </dd>
              <dt className="font-semibold">Run hash</dt>
              <dd className="num break-all text-xs">{result.data.hashPrefix}…</dd>
            </dl>
            <p className="text-xs text-ink-muted">
              This confirms that a sheet with this content was issued; it does not approve the design. The
              licensed professional of record, the local code and the authority having jurisdiction govern.
            </p>
          </section>
        )}
        <CodeForm initial={canonical ? formatVerificationCode(canonical) : ''} />
      </div>
    </AuthPageFrame>
  );
}
