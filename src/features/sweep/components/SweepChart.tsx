import { memo } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../../../lib/quantities';
import { KIND_LABELS, measureOf } from '../draft';
import { type DrawnCheck, type DrawnSlice, providedOf, shownValue, spread, valueText } from '../present';

const INK = '#1e1c19';
const RULE = '#c8bead';
const MUTED = '#57514a';
const CAUTION = '#a12c2a';
/** Lines differ by dash as well as by shade, so they read without colour. */
const STROKES = [
  { stroke: INK, dash: undefined },
  { stroke: '#97461f', dash: '6 3' },
  { stroke: '#1f4e8c', dash: '2 3' },
  { stroke: '#2c5e3f', dash: '10 3 2 3' },
  { stroke: MUTED, dash: '4 4' },
  { stroke: '#7a5500', dash: '1 2' },
];
const DOTS_MAX = 30;
const MONO = { fontSize: 11, fontFamily: 'IBM Plex Mono, monospace' };

/**
 * A code-table figure (e.g. U-factor) against one numeric parameter, one line per value of another (at most
 * six, spread over its values), the others held; the limit drawn as a line and named.
 */
export const SweepChart = memo(function SweepChart({
  slice,
  check,
}: {
  slice: DrawnSlice;
  check: DrawnCheck;
}) {
  const { grid, kinds, values, across, lines, system } = slice;
  const xKind = kinds[across]!;
  const shownLines = spread(grid.length, STROKES.length);
  const lineName = (l: number) =>
    lines === null ? check.label : valueText(kinds[lines]!, values[lines]![l]!, system);
  const data = values[across]!.map((x, xi) => {
    const point: Record<string, number | null> = { x: shownValue(xKind, x as number, system) };
    for (const l of shownLines) {
      const v = grid[l]?.[xi];
      const provided = v ? providedOf(v, check) : null;
      point[`l${l}`] = provided === null ? null : check.shown(provided);
    }
    return point;
  });
  // A dot per point while they can be told apart; a line of 100 points reads as a line (and draws faster).
  const dense = data.length > DOTS_MAX;
  const limit = check.shown(check.required);
  const xUnit = measureOf(xKind).unit(system);
  const words = `${check.label} (${check.unit}) against ${KIND_LABELS[xKind].toLowerCase()} (${xUnit})${
    lines === null ? '' : `, one line per ${KIND_LABELS[kinds[lines]!].toLowerCase()}`
  }; limit ${check.direction === 'max' ? '≤' : '≥'} ${formatNumber(limit, check.decimals)} ${check.unit}.`;
  return (
    <figure className="m-0 flex flex-col gap-1">
      <div role="img" aria-label={words} data-testid="sweep-chart">
        <LineChart
          responsive
          data={data}
          margin={{ top: 24, right: 16, bottom: 20, left: 8 }}
          style={{ width: '100%', height: 300 }}
        >
          <CartesianGrid stroke={RULE} strokeDasharray="2 3" />
          <XAxis
            dataKey="x"
            type="number"
            domain={['dataMin', 'dataMax']}
            stroke={MUTED}
            tick={{ ...MONO, fill: INK }}
            label={{
              value: `${KIND_LABELS[xKind]} (${xUnit})`,
              position: 'insideBottom',
              offset: -12,
              fontSize: 11,
              fill: INK,
            }}
          />
          <YAxis
            stroke={MUTED}
            width={60}
            domain={['auto', 'auto']}
            tick={{ ...MONO, fill: MUTED }}
            tickFormatter={(v: number) => formatNumber(v, check.decimals)}
            label={{ value: check.unit, position: 'top', offset: 10, fontSize: 11, fill: INK }}
          />
          <Tooltip
            formatter={(v: unknown) => `${formatNumber(Number(v), check.decimals)} ${check.unit}`}
            labelFormatter={(x: unknown) => `${formatNumber(Number(x), 3)} ${xUnit}`}
          />
          <ReferenceLine
            y={limit}
            stroke={CAUTION}
            strokeWidth={2}
            ifOverflow="extendDomain"
            label={{
              value: `limit ${check.direction === 'max' ? '≤' : '≥'} ${formatNumber(limit, check.decimals)}`,
              position: 'insideTopRight',
              fontSize: 11,
              fill: CAUTION,
            }}
          />
          {shownLines.map((l, i) => (
            <Line
              key={l}
              dataKey={`l${l}`}
              name={lineName(l)}
              stroke={STROKES[i]!.stroke}
              strokeDasharray={STROKES[i]!.dash}
              strokeWidth={1.5}
              dot={dense ? false : { r: 2.5 }}
              connectNulls
              isAnimationActive={false}
            />
          ))}
          {lines === null ? null : (
            <Legend verticalAlign="bottom" wrapperStyle={{ fontSize: 12, paddingTop: 12 }} />
          )}
        </LineChart>
      </div>
      <figcaption className="text-xs text-ink-muted" data-testid="sweep-chart-caption">
        {words}
        {lines !== null && shownLines.length < grid.length
          ? ` ${shownLines.length} of its ${grid.length} values are drawn.`
          : ''}
      </figcaption>
    </figure>
  );
});
