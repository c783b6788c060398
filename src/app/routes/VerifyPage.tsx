import { formatVerificationCode, normaliseVerificationCode } from '@shared/sheets/verification';
import { type FormEvent, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Button } from '../../components/ui/Button';
import { Field } from '../../components/ui/Field';
import { Loading } from '../../components/ui/Loading';
import { Notice } from '../../components/ui/Notice';
import { TextInput } from '../../components/ui/TextInput';
import { FieldReportVerificationDetails } from '../../features/inspections/components/FieldReportVerificationDetails';
import { useVerification } from '../../features/sheets/api/get-verification';
import { SheetVerificationDetails } from '../../features/sheets/components/SheetVerificationDetails';
import { errorMessage, isApiRequestError } from '../../lib/api';
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
        hint="As printed on the sheet or report."
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

/**
 * Public: confirms a compliance sheet or a field report by its code — who issued it (name, unique handle,
 * verified or not), for what, when, with what verdict or inspection state.
 */
export function VerifyPage() {
  const { code = '' } = useParams();
  const canonical = normaliseVerificationCode(code);
  const result = useVerification(canonical ?? code);

  return (
    <AuthPageFrame
      title="Check a sheet or field report"
      intro="Every Skinwright compliance sheet and field report carries a verification code. The details below are what the document with this code states, and who issued it; compare them with the paper or file you were given."
    >
      <div className="flex flex-col gap-6">
        {!canonical || (result.isError && isApiRequestError(result.error) && result.error.status === 404) ? (
          <Notice tone="caution" title="No such sheet or report." live>
            <p>
              Nothing was issued with the code <span className="num font-semibold">{code}</span>. It may be
              mistyped, or the document may have been altered.
            </p>
          </Notice>
        ) : result.isPending ? (
          <Loading what="Checking the code" />
        ) : result.isError ? (
          <Notice tone="caution" title={errorMessage(result.error)} live />
        ) : result.data.kind === 'sheet' ? (
          <SheetVerificationDetails sheet={result.data} />
        ) : (
          <FieldReportVerificationDetails report={result.data} />
        )}
        <CodeForm initial={canonical ? formatVerificationCode(canonical) : ''} />
      </div>
    </AuthPageFrame>
  );
}
