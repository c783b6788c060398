import type { ThermalResult } from '@shared/calc/thermal/schema';
import { formatU } from '@shared/format';
import { Bar, BarChart, CartesianGrid, Cell, LabelList, XAxis, YAxis } from 'recharts';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatShare } from '../units';

const INK = '#1e1c19';
const RULE = '#c8bead';
const MUTED = '#57514a';

const KIND_WORDS = {
  point: 'clips (χ)',
  linear: 'girts/rails (ψ)',
  fastener: 'fasteners (Annex F)',
} as const;

/** The bars: length in per cent, label exactly as the table prints the share (one rounding, one text). */
export const shareBars = (rows: readonly { name: string; share: number }[]) =>
  rows.map((r) => ({ name: r.name, percent: r.share * 100, label: formatShare(r.share) }));

/** Where the heat goes: the clear field against each bridge, as shares of U_eff — a bar chart and its table. */
export function ShareChart({ result }: { result: ThermalResult }) {
  const system = useUnitSystem();
  const rows = [
    { name: 'Clear field', kind: 'clear field', share: result.clearFieldShare, deltaU: result.U0 },
    ...result.bridges.map((b) => ({
      name: b.name,
      kind: KIND_WORDS[b.kind],
      share: b.share,
      deltaU: b.deltaU,
    })),
  ];
  const data = shareBars(rows);
  const summary = rows.map((r) => `${r.name} ${formatShare(r.share)}`).join(', ');

  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
      <figure className="m-0">
        <div role="img" aria-label={`Share of heat loss: ${summary}`}>
          <BarChart
            responsive
            layout="vertical"
            data={data}
            margin={{ top: 4, right: 56, bottom: 4, left: 8 }}
            style={{ width: '100%', height: 44 * data.length + 40 }}
          >
            <CartesianGrid horizontal={false} stroke={RULE} strokeDasharray="2 3" />
            <XAxis
              type="number"
              domain={[0, 100]}
              ticks={[0, 25, 50, 75, 100]}
              unit=" %"
              stroke={MUTED}
              tick={{ fontSize: 11, fontFamily: 'IBM Plex Mono, monospace', fill: MUTED }}
            />
            <YAxis
              type="category"
              dataKey="name"
              width={170}
              stroke={MUTED}
              tick={{ fontSize: 12, fill: INK }}
              tickLine={false}
            />
            <Bar dataKey="percent" isAnimationActive={false} stroke={INK} strokeWidth={1} barSize={18}>
              {data.map((d, i) => (
                <Cell key={d.name + String(i)} fill={i === 0 ? RULE : INK} />
              ))}
              <LabelList
                dataKey="label"
                position="right"
                style={{ fontSize: 11, fontFamily: 'IBM Plex Mono, monospace', fill: INK }}
              />
            </Bar>
          </BarChart>
        </div>
        <figcaption className="mt-1 text-xs text-ink-muted">
          Light bar: the clear field (U₀). Dark bars: the bridges (ΔU). Shares of U_eff; they sum to{' '}
          <span className="num">{formatShare(result.sharesSum)}</span>.
        </figcaption>
      </figure>
      <Table caption="Heat-loss shares" head={['Part', numeric('U or ΔU'), numeric('Share')]}>
        <tbody>
          {rows.map((r, i) => (
            <tr key={r.name + String(i)}>
              <Td>
                {r.name}
                <span className="block text-xs text-ink-muted">{r.kind}</span>
              </Td>
              <Td numeric className="whitespace-nowrap">
                {formatU(r.deltaU, system)}
              </Td>
              <Td numeric>{formatShare(r.share)}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
