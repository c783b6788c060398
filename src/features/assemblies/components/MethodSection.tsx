import type { MethodName, ThermalResult } from '@shared/calc/thermal/schema';
import { Notice } from '../../../components/ui/Notice';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatR } from '../units';

export const METHOD_LABELS: Record<MethodName, string> = {
  parallelPath: 'Parallel path (ASHRAE)',
  isothermalPlanes: 'Isothermal planes (ASHRAE)',
  isoCombined: 'ISO 6946 combined, (R′T + R″T)/2',
  zone: 'Zone method for metal framing (ASHRAE)',
};

/** Which method gave R₀, why (from the engine's own trace note), and how far the methods spread. */
export function MethodSection({ result }: { result: ThermalResult }) {
  const why = result.trace.find((s) => s.id === 'thermal.R0')?.note;
  const m = result.methods;
  const rows: { key: string; label: string; value: number | null; used: boolean; note?: string }[] = [
    {
      key: 'pp',
      label: METHOD_LABELS.parallelPath,
      value: m.parallelPath,
      used: false,
      note: 'heat flows straight through each path',
    },
    {
      key: 'ip',
      label: METHOD_LABELS.isothermalPlanes,
      value: m.isothermalPlanes,
      used: false,
      note: 'each bridged layer averaged across its sections',
    },
  ];
  if (result.offeredMethods.includes('isoCombined'))
    rows.push({
      key: 'iso',
      label: METHOD_LABELS.isoCombined,
      value: m.isoCombined,
      used: result.defaultMethod === 'isoCombined',
      note: m.isoError != null ? `maximum relative error e = ${(m.isoError * 100).toFixed(1)} %` : undefined,
    });
  if (result.offeredMethods.includes('zone'))
    rows.push({
      key: 'zone',
      label: METHOD_LABELS.zone,
      value: m.zone,
      used: result.defaultMethod === 'zone',
      note: 'zone around each metal member taken by isothermal planes',
    });

  const metal = result.defaultMethod === 'zone';
  return (
    <div className="flex flex-col gap-4">
      <p>
        <span className="font-semibold">Used: {METHOD_LABELS[result.defaultMethod]}.</span>{' '}
        {why ? <span>{sentence(why)}</span> : null}
      </p>
      <Table caption="Clear-field total resistance R_T by each method offered">
        <thead>
          <tr>
            <Th>Method</Th>
            <Th numeric>R_T (SI)</Th>
            <Th numeric>R_T (IP)</Th>
            <Th>Note</Th>
          </tr>
        </thead>
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
        <span className="num font-semibold">{(result.methodSpread * 100).toFixed(1)} %</span> of their mean
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
            is not offered here. Parallel path and isothermal planes are listed for comparison only: across
            metal framing they bracket the answer loosely. Where a certified figure is needed, use a
            three-dimensional numerical calculation (ISO 10211) or a guarded hot-box test of the wall.
          </p>
        </Notice>
      ) : null}
      {result.warnings.map((w) => (
        <Notice key={w} tone="warning" title={sentence(w)} />
      ))}
    </div>
  );
}

const sentence = (t: string) => {
  const s = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
};
