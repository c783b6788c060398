import type { ThermalResult } from '@shared/calc/thermal/schema';
import { METHOD_LABELS } from '@shared/calc/thermal/thermal';
import { formatR, formatU, rNumber, uNumber } from '@shared/format';
import type { AssemblyInput } from '@shared/schemas/assembly';
import { layerThickness } from '@shared/sheets/layer-class';
import type { UnitSystem } from '@shared/units';
import { fixed, roundDecimal, trimmedFixed } from '@shared/units/rounding';
import type { ReactNode } from 'react';
import { Table, Td, Th } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatMeasure, formatShare, SHARE_DECIMALS, shownPercent, toShown } from '../units';

export interface CompareColumn {
  key: string;
  title: string;
  subtitle: string;
  input: AssemblyInput;
  result: ThermalResult | null;
}

type Better = 'higher' | 'lower' | null;

interface Row {
  label: ReactNode;
  /** The figure per column (null = not present). */
  value: (c: CompareColumn) => number | null;
  show: (v: number, system: UnitSystem) => string;
  /** The figure as printed, as a number: differences are taken between what the reader sees. */
  shown: (v: number, system: UnitSystem) => number;
  /** Which way is better, when there is a better (R up, U down). */
  better: Better;
  /** Shares differ in percentage points, everything else in per cent. */
  points?: boolean;
}

/**
 * How a column differs from A, in words. Taken between the figures as shown, so the words agree with what the
 * reader sees: shares 3.3 % and 5.0 % differ by 1.7 points, whatever the unrounded shares were.
 */
export function difference(
  base: number | null,
  v: number | null,
  row: Pick<Row, 'show' | 'shown' | 'better' | 'points'>,
  system: UnitSystem,
) {
  if (base === null && v === null) return null;
  if (base === null) return { same: false as const, text: 'not in A', glyph: '+' };
  if (v === null) return { same: false as const, text: 'in A, not here', glyph: '−' };
  const a = row.shown(base, system);
  const b = row.shown(v, system);
  if (a === b) return { same: true as const, text: 'same as A', glyph: '=' };
  const delta = b - a;
  const rel = a === 0 ? Number.POSITIVE_INFINITY : delta / Math.abs(a);
  const up = delta > 0;
  const amount = row.points
    ? `${trimmedFixed(Math.abs(delta), SHARE_DECIMALS)} points`
    : Number.isFinite(rel)
      ? `${fixed(Math.abs(rel * 100), 1)} %`
      : row.show(Math.abs(v - base), system);
  const verdict = row.better === null ? '' : (row.better === 'higher') === up ? ' — better' : ' — worse';
  return {
    same: false as const,
    text: `${amount} ${up ? 'higher' : 'lower'} than A${verdict}`,
    glyph: up ? '▲' : '▼',
  };
}

const totalThickness = (c: CompareColumn) =>
  c.input.thermal.layers.reduce((a, l) => a + layerThickness(l), 0);

/**
 * Two or more assemblies (or revisions) side by side. Column A is the baseline; every other cell that
 * differs says so in words and with a glyph (▲ higher, ▼ lower, = same), not by colour alone.
 */
export function CompareTable({ columns }: { columns: readonly CompareColumn[] }) {
  const system = useUnitSystem();
  const bridgeNames = [...new Set(columns.flatMap((c) => c.result?.bridges.map((b) => b.name) ?? []))];
  const rows: Row[] = [
    {
      label: <>Clear-field R₀</>,
      value: (c) => c.result?.R0 ?? null,
      show: (v, s) => formatR(v, s),
      shown: (v, s) => Number(rNumber(v, s)),
      better: 'higher',
    },
    {
      label: <>Effective R_eff</>,
      value: (c) => c.result?.Reff ?? null,
      show: (v, s) => formatR(v, s),
      shown: (v, s) => Number(rNumber(v, s)),
      better: 'higher',
    },
    {
      label: <>Clear-field U₀</>,
      value: (c) => c.result?.U0 ?? null,
      show: (v, s) => formatU(v, s),
      shown: (v, s) => Number(uNumber(v, s)),
      better: 'lower',
    },
    {
      label: <>Effective U_eff</>,
      value: (c) => c.result?.Ueff ?? null,
      show: (v, s) => formatU(v, s),
      shown: (v, s) => Number(uNumber(v, s)),
      better: 'lower',
    },
    {
      label: 'Heat-loss share, clear field',
      value: (c) => c.result?.clearFieldShare ?? null,
      show: (v) => formatShare(v),
      shown: (v) => shownPercent(v),
      better: null,
      points: true,
    },
    ...bridgeNames.map(
      (name): Row => ({
        label: `Heat-loss share, ${name}`,
        value: (c) => {
          const list = c.result?.bridges.filter((b) => b.name === name) ?? [];
          return list.length ? list.reduce((a, b) => a + b.share, 0) : null;
        },
        show: (v) => formatShare(v),
        shown: (v) => shownPercent(v),
        better: null,
        points: true,
      }),
    ),
    {
      label: 'Overall thickness',
      value: totalThickness,
      show: (v, s) => formatMeasure(v, 'thickness', s, 1),
      shown: (v, s) => roundDecimal(toShown(v, 'thickness', s), 1),
      better: null,
    },
  ];
  const letter = (i: number) => String.fromCharCode(65 + i);

  return (
    <Table caption="Assemblies side by side; column A is the baseline">
      <thead>
        <tr>
          <Th>Figure</Th>
          {columns.map((c, i) => (
            <Th key={c.key}>
              <span className="num mr-2 text-ink-muted">{letter(i)}</span>
              {c.title}
              <span className="block text-xs font-normal text-ink-muted">
                {c.subtitle}
                {i === 0 ? ' · baseline' : ''}
              </span>
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        <tr>
          <Th scope="row" className="border-b border-rule align-top!">
            Method used
          </Th>
          {columns.map((c, i) => {
            const m = c.result?.defaultMethod;
            const differs = i > 0 && m !== columns[0]?.result?.defaultMethod;
            return (
              <Td key={c.key} className={differs ? 'border-l-4 border-l-ink bg-paper-sunk' : ''}>
                {m ? METHOD_LABELS[m] : '—'}
                {differs ? (
                  <span className="block text-xs font-semibold">
                    <span aria-hidden="true">≠ </span>differs from A
                  </span>
                ) : null}
              </Td>
            );
          })}
        </tr>
        {rows.map((row, r) => {
          const base = columns[0] ? row.value(columns[0]) : null;
          return (
            // biome-ignore lint/suspicious/noArrayIndexKey: rows are fixed in order
            <tr key={r}>
              <Th scope="row" className="border-b border-rule align-top!">
                {row.label}
              </Th>
              {columns.map((c, i) => {
                const v = row.value(c);
                const d = i > 0 ? difference(base, v, row, system) : null;
                const highlighted = d !== null && !d.same;
                return (
                  <Td
                    key={c.key}
                    className={`num ${highlighted ? 'border-l-4 border-l-ink bg-paper-sunk' : ''}`}
                  >
                    <span className={highlighted ? 'font-semibold' : ''}>
                      {v === null ? '—' : row.show(v, system)}
                    </span>
                    {d ? (
                      <span
                        className={`block font-sans text-xs ${highlighted ? 'font-semibold text-ink' : 'text-ink-muted'}`}
                      >
                        <span aria-hidden="true">{d.glyph} </span>
                        {d.text}
                      </span>
                    ) : null}
                  </Td>
                );
              })}
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
