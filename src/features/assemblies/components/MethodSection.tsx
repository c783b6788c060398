import type { MethodName, ThermalResult } from '@shared/calc/thermal/schema';
import { METHOD_LABELS } from '@shared/calc/thermal/thermal';
import { formatR, messageText } from '@shared/format';
import { fixed } from '@shared/units/rounding';
import { Notice } from '../../../components/ui/Notice';
import { numeric, Table, Td } from '../../../components/ui/Table';

const METHOD_NOTES: Record<MethodName, (r: ThermalResult) => string | undefined> = {
  parallelPath: () => 'heat flows straight through each path',
  isothermalPlanes: () => 'each bridged layer averaged across its sections',
  isoCombined: (r) =>
    r.methods.isoError != null
      ? `maximum relative error e = ${fixed(r.methods.isoError * 100, 1)} %`
      : undefined,
  zone: () => 'zone around each metal member taken by isothermal planes',
  energyCode: (r) => r.energyCode?.text,
};

/** Which method gave R₀ and why (the engine's own sentence), every method offered, and how far they spread. */
export function MethodSection({ result }: { result: ThermalResult }) {
  const rows = result.offeredMethods.map((m) => ({
    key: m,
    label: METHOD_LABELS[m],
    value: result.methods[m],
    used: result.defaultMethod === m,
    note: METHOD_NOTES[m](result),
  }));
  const refused = result.energyCode?.status === 'refused' ? result.energyCode : null;

  const metal = result.methods.zone !== null;
  return (
    <div className="flex flex-col gap-4">
      <p>
        <span className="font-semibold">Used: {METHOD_LABELS[result.defaultMethod]}.</span>{' '}
        <span>{sentence(result.basis.text)}</span>
      </p>
      {refused ? (
        <p className="text-sm text-ink-muted">Energy-code path not applied: {sentence(refused.text)}</p>
      ) : null}
      <Table
        caption="Clear-field total resistance R_T by each method offered"
        head={['Method', numeric('R_T (SI)'), numeric('R_T (IP)'), 'Note']}
      >
        <tbody>
          {rows.map((r) => (
            <tr key={r.key} className={r.used ? 'bg-paper-raised font-semibold' : ''}>
              <Td>
                {r.used ? (
                  <>
                    <span aria-hidden="true">● </span>
                    <span className="sr-only">Used: </span>
                  </>
                ) : (
                  <span aria-hidden="true" className="text-ink-muted">
                    ○{' '}
                  </span>
                )}
                {r.label}
              </Td>
              <Td numeric>{formatR(r.value, 'SI')}</Td>
              <Td numeric>{formatR(r.value, 'IP')}</Td>
              <Td className="text-ink-muted">{r.note ?? ''}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-sm">
        The methods offered differ by{' '}
        <span className="num font-semibold">{fixed(result.methodSpread * 100, 1)} %</span> of their mean
        {result.methodSpread < 0.005
          ? ' — in effect they agree.'
          : result.methodSpread > 0.15
            ? ' — a wide spread: the bridged layers dominate, and the choice of method matters.'
            : '.'}
      </p>
      {metal ? (
        <Notice tone="info" title="ISO 6946 and metal framing.">
          <p>
            ISO 6946:2017 does not cover layers bridged by metal other than fasteners, so its combined method
            is not offered here. A code check of this wall uses the method named above: the energy code’s own
            table where it covers the studs, otherwise the lowest R of the methods shown. Where a certified
            figure is needed, use a three-dimensional numerical calculation (ISO 10211) or a guarded hot-box
            test of the wall.
          </p>
        </Notice>
      ) : null}
      {result.warnings.map((w) => (
        <Notice key={JSON.stringify(w)} tone="warning" title={sentence(messageText(w))} />
      ))}
    </div>
  );
}

const sentence = (t: string) => {
  const s = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
};
