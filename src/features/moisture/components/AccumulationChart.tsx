import type { MoistureResult } from '@shared/calc/moisture/schema';
import type { UnitSystem } from '@shared/units';
import { Bar, BarChart, CartesianGrid, Cell, LabelList, XAxis, YAxis } from 'recharts';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { formatNumber } from '../../../lib/quantities';
import { formatWaterInColumn, monthName, monthShort, toShownWater, waterUnit } from '../units';

const INK = '#1e1c19';
const RULE = '#c8bead';
const MUTED = '#57514a';

/**
 * Water held in the wall at the end of each month, from the start month on: a bar per month (dark while it
 * condenses, light while it dries) and the monthly balance beside it.
 */
export function AccumulationChart({
  result,
  system,
  selected,
  onSelect,
}: {
  result: MoistureResult;
  system: UnitSystem;
  selected: number;
  onSelect?: (month: number) => void;
}) {
  const unit = waterUnit(system);
  const decimals = system === 'IP' ? 3 : 1;
  const data = result.months.map((m) => ({
    month: m.month,
    name: monthShort(m.month),
    held: Number(toShownWater(m.totalAccumulation, system).toFixed(decimals)),
    condensing: m.condensationNodes.length > 0,
  }));
  const max = Math.max(...data.map((d) => d.held));
  const summary = result.interstitial.condensationOccurs
    ? data.map((d) => `${d.name} ${formatNumber(d.held, decimals)} ${unit}`).join(', ')
    : 'no water accumulates in any month';

  const any = result.interstitial.condensationOccurs;
  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
      <figure className="m-0">
        <div
          role="img"
          aria-label={`Water held in the wall at the end of each month, from ${monthName(result.startMonth)}: ${summary}`}
        >
          <BarChart
            responsive
            data={data}
            margin={{ top: 22, right: 12, bottom: 4, left: 8 }}
            style={{ width: '100%', height: any ? 260 : 150 }}
          >
            <CartesianGrid vertical={false} stroke={RULE} strokeDasharray="2 3" />
            <XAxis
              dataKey="name"
              stroke={MUTED}
              tick={{ fontSize: 11, fontFamily: 'IBM Plex Mono, monospace', fill: INK }}
              tickLine={false}
            />
            <YAxis
              stroke={MUTED}
              domain={[0, max > 0 ? 'auto' : 1]}
              width={56}
              tick={{ fontSize: 11, fontFamily: 'IBM Plex Mono, monospace', fill: MUTED }}
              label={{ value: unit, position: 'top', offset: 10, fontSize: 11, fill: INK }}
            />
            <Bar
              dataKey="held"
              isAnimationActive={false}
              stroke={INK}
              strokeWidth={1}
              onClick={(entry: unknown) => {
                const month = (entry as { month?: number; payload?: { month?: number } })?.payload?.month;
                if (month !== undefined) onSelect?.(month);
              }}
              cursor={onSelect ? 'pointer' : undefined}
            >
              {data.map((d) => (
                <Cell
                  key={d.month}
                  fill={d.condensing ? INK : RULE}
                  strokeWidth={d.month === selected ? 2.5 : 1}
                />
              ))}
              <LabelList
                dataKey="held"
                position="top"
                formatter={(v: unknown) =>
                  Number(v) > 0 ? formatNumber(Number(v), system === 'IP' ? 2 : 0) : ''
                }
                style={{ fontSize: 10, fontFamily: 'IBM Plex Mono, monospace', fill: INK }}
              />
            </Bar>
          </BarChart>
        </div>
        <figcaption className="mt-1 text-xs text-ink-muted">
          Water held at the end of each month, {unit}, from the start month ({monthName(result.startMonth)}).
          Dark: the month condenses; light: it dries.{' '}
          {max > 0 ? '' : 'Every bar is zero: nothing accumulates.'}
        </figcaption>
      </figure>
      {any ? (
        <Table
          caption="Monthly water balance (all planes)"
          head={['Month', numeric('Condensed'), numeric('Evaporated'), numeric('Held at month end')]}
        >
          <tbody>
            {result.months.map((m) => (
              <tr key={m.month} className={m.month === selected ? 'bg-paper-raised font-semibold' : ''}>
                <Td>{monthShort(m.month)}</Td>
                <Td numeric>{m.condensed > 0 ? formatWaterInColumn(m.condensed, system) : '—'}</Td>
                <Td numeric>{m.evaporated > 0 ? formatWaterInColumn(m.evaporated, system) : '—'}</Td>
                <Td numeric>{formatWaterInColumn(m.totalAccumulation, system)}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      ) : (
        <p className="self-center text-sm">
          <span aria-hidden="true" className="text-meets">
            ✓{' '}
          </span>
          No water condenses in any month, so none is held: the balance stays at zero all year.
        </p>
      )}
    </div>
  );
}
