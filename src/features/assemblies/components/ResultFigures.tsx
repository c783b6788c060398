import type { ThermalResult } from '@shared/calc/thermal/schema';
import { METHOD_LABELS } from '@shared/calc/thermal/thermal';
import { formatR, formatU } from '@shared/format';
import { fixed } from '@shared/units/rounding';
import type { ReactNode } from 'react';
import {
  notYet,
  ResultSummary,
  type SummaryFigure,
  type SummaryVerdict,
} from '../../../components/ui/ResultSummary';
import { useUnitSystem } from '../../../lib/unit-system';

function Figure({
  label,
  symbol,
  primary,
  secondary,
  testId,
  strong = false,
}: {
  label: string;
  symbol: ReactNode;
  primary: string;
  secondary: string;
  testId: string;
  strong?: boolean;
}) {
  // The figure large, its unit (a long one in IP) smaller beside it, wrapping inside the card if need be.
  const [figure, unit] = primary.split('\u202f');
  return (
    <div className={`flex min-w-0 flex-col gap-0.5 px-4 py-3 ${strong ? 'bg-paper-raised' : 'bg-paper'}`}>
      <dt className="label-caps">
        {label}{' '}
        <span className="font-serif text-sm normal-case italic tracking-normal text-ink">{symbol}</span>
      </dt>
      <dd
        className={`num ${strong ? 'text-2xl font-medium' : 'text-xl'} text-ink [overflow-wrap:anywhere]`}
        data-testid={testId}
      >
        {figure}
        {unit ? <span className="text-sm font-normal">{`\u202f${unit}`}</span> : null}
      </dd>
      <dd className="num text-sm text-ink-muted [overflow-wrap:anywhere]">{secondary}</dd>
    </div>
  );
}

/** The four figures, clear field then effective (stressed), R beside U. */
const FIGURES = [
  { key: 'R0', label: 'Clear field', symbol: 'R₀', format: formatR, strong: false },
  { key: 'U0', label: 'Clear field', symbol: 'U₀', format: formatU, strong: false },
  { key: 'Reff', label: 'Effective', symbol: 'R_eff', format: formatR, strong: true },
  { key: 'Ueff', label: 'Effective', symbol: 'U_eff', format: formatU, strong: true },
] as const;

/** Clear-field and effective R and U, the person's units first, the other system beneath. */
export function ResultFigures({ result }: { result: ThermalResult }) {
  const system = useUnitSystem();
  const other = system === 'SI' ? 'IP' : 'SI';
  const drop = result.Reff / result.R0 - 1;
  return (
    <div className="flex flex-col gap-2">
      <dl className="grid grid-cols-1 gap-px border border-ink bg-rule sm:grid-cols-2 lg:grid-cols-4">
        {FIGURES.map((f) => (
          <Figure
            key={f.key}
            label={f.label}
            symbol={f.symbol}
            primary={f.format(result[f.key], system)}
            secondary={f.format(result[f.key], other)}
            testId={`result-${f.key}`}
            strong={f.strong}
          />
        ))}
      </dl>
      <p className="text-sm">
        {result.bridges.length === 0
          ? 'No bridges entered: the effective value equals the clear-field value.'
          : `The ${result.bridges.length === 1 ? 'bridge lowers' : `${result.bridges.length} bridges lower`} R by ${fixed(Math.abs(drop * 100), 1)} % (R_eff against R₀); they carry ${fixed((1 - result.clearFieldShare) * 100, 1)} % of the heat lost through the wall.`}
      </p>
    </div>
  );
}

/**
 * The build-up page's result first: computed (and by which method) or what it waits for, with effective R and
 * U, the clear-field R₀ and the bridges' share of the heat.
 */
export function ThermalSummary({
  result,
  problems,
  stale,
}: {
  result: ThermalResult | null;
  /** How many values keep the result from being computed. */
  problems: number;
  stale: boolean;
}) {
  const system = useUnitSystem();
  const verdict: SummaryVerdict = result
    ? {
        glyph: '✓',
        word: 'computed',
        detail: `R₀ by the ${METHOD_LABELS[result.defaultMethod]}`,
        tone: 'meets',
      }
    : notYet(
        'no result yet',
        `${problems === 1 ? 'one value needs' : `${problems} values need`} attention (listed under Result)`,
      );
  const figures: SummaryFigure[] = result
    ? [
        { label: 'Effective R_eff', value: formatR(result.Reff, system), testId: 'summary-Reff' },
        { label: 'Effective U_eff', value: formatU(result.Ueff, system), testId: 'summary-Ueff' },
        { label: 'Clear field R₀', value: formatR(result.R0, system) },
        { label: 'Heat through bridges', value: `${fixed((1 - result.clearFieldShare) * 100, 1)} %` },
      ]
    : [];
  return <ResultSummary verdict={verdict} figures={figures} stale={stale} resultId="result-heading" />;
}
