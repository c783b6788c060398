import { dewPoint, saturationPressureIso13788 } from '@shared/calc/moisture/psychrometrics';
import type { MoistureResult, MonthResult } from '@shared/calc/moisture/schema';
import type { DrawClass } from '@shared/sheets/layer-class';
import { celsiusToFahrenheit, type UnitSystem } from '@shared/units';
import { useId } from 'react';
import { formatNumber } from '../../../lib/quantities';
import { fromShownLength, lengthUnit, monthName, toShownLength } from '../units';
import { nodePlace } from '../verdict';

const INK = '#1e1c19';
const MUTED = '#57514a';
const RULE = '#c8bead';
const PAPER = '#fbf8f1';
const SUNK = '#ece5d6';
const CAUTION = '#a12c2a';

/** How a layer is hatched: the material classes of the section drawings (unknown → plain). */
export type Hatch = DrawClass;

export type ProfileMode = 'temperature' | 'pressure';

export interface ProfileLayer {
  name: string;
  /** m; undefined for a declared-resistance layer (drawn as a line). */
  thickness: number | undefined;
  hatch?: Hatch;
}

const W = 920;
const H = 420;
const AXIS = 64;
const AIR = 58;
const RIGHT_PAD = 18;
const TOP = 64;
const BOTTOM = 64;
const PLOT_H = H - TOP - BOTTOM;

/** Round tick step (1, 2, 2.5, 5 × 10ⁿ) for about `count` ticks over `span`. */
function niceStep(span: number, count: number): number {
  const raw = span / Math.max(count, 1);
  const pow = 10 ** Math.floor(Math.log10(raw));
  const steps = [1, 2, 2.5, 5, 10];
  return (steps.find((s) => s * pow >= raw) ?? 10) * pow;
}

function ticks(min: number, max: number, count: number): number[] {
  const step = niceStep(max - min || 1, count);
  const out: number[] = [];
  for (let t = Math.ceil(min / step) * step; t <= max + step * 1e-9; t += step)
    out.push(Number(t.toFixed(10)));
  return out;
}

interface Geometry {
  /** Start and end of each layer, m from the outer face. */
  start: number[];
  end: number[];
  total: number;
  /** Position of each node, m. */
  nodeX: number[];
}

/** Where every node sits through the wall: interfaces at layer faces, sub-layer nodes spread by R. */
export function nodePositions(layers: readonly ProfileLayer[], result: MoistureResult): Geometry {
  const start: number[] = [];
  const end: number[] = [];
  let x = 0;
  for (const l of layers) {
    start.push(x);
    x += l.thickness !== undefined && Number.isFinite(l.thickness) ? l.thickness : 0;
    end.push(x);
  }
  const nodes = result.nodes;
  // R at the outer face of each layer: the node whose inner layer it is, coming from another layer.
  const rAtStart = new Map<number, number>();
  for (const n of nodes)
    if (n.innerLayer !== null && n.outerLayer !== n.innerLayer && !rAtStart.has(n.innerLayer))
      rAtStart.set(n.innerLayer, n.resistance);
  const nodeX = nodes.map((n) => {
    if (n.kind === 'exteriorSurface') return start[n.innerLayer ?? 0] ?? 0;
    if (n.kind === 'interiorSurface' || n.kind === 'interface') return end[n.outerLayer ?? 0] ?? x;
    const i = n.outerLayer ?? 0;
    const R = result.layers[i]?.resistance ?? 0;
    const frac = R > 0 ? (n.resistance - (rAtStart.get(i) ?? n.resistance)) / R : 0;
    return (start[i] ?? 0) + Math.min(Math.max(frac, 0), 1) * ((end[i] ?? 0) - (start[i] ?? 0));
  });
  return { start, end, total: x, nodeX };
}

const toT = (c: number, system: UnitSystem) => (system === 'IP' ? celsiusToFahrenheit(c) : c);
const safeDew = (p: number) => (p > 0 ? dewPoint(p) : Number.NaN);

interface Series {
  solid: [number, number][];
  dashed: [number, number][];
  solidName: string;
  dashedName: string;
  unit: string;
}

/**
 * The profile through the wall for one month, drawn to thickness: the layers shaded, outside on the left;
 * temperature and dew point (or vapour pressure and saturation pressure) from the outside air to the
 * inside air; every plane where water condenses or is still held marked and named.
 */
export function ProfileChart({
  layers,
  result,
  month,
  mode,
  system,
}: {
  layers: readonly ProfileLayer[];
  result: MoistureResult;
  month: MonthResult;
  mode: ProfileMode;
  system: UnitSystem;
}) {
  const uid = useId().replace(/[^a-zA-Z0-9]/g, '');
  const geo = nodePositions(layers, result);
  const wallPx = W - AXIS - 2 * AIR - RIGHT_PAD;
  const equal = !(geo.total > 0);
  const scale = equal ? 0 : wallPx / geo.total;
  const xOf = (m: number) => AXIS + AIR + m * scale;
  const xLeft = AXIS;
  const xRight = AXIS + 2 * AIR + wallPx;
  const n = result.nodes.length;
  const last = n - 1;
  const nx = geo.nodeX.map(xOf);
  const tUnit = system === 'IP' ? '°F' : '°C';

  const series: Series =
    mode === 'temperature'
      ? {
          solid: [
            [xLeft, toT(month.exteriorTemperature, system)],
            [nx[0]!, toT(month.exteriorTemperature, system)],
            ...month.temperature.map((t, k): [number, number] => [nx[k]!, toT(t, system)]),
            [nx[last]!, toT(month.interiorTemperature, system)],
            [xRight, toT(month.interiorTemperature, system)],
          ],
          dashed: [
            [xLeft, toT(safeDew(month.exteriorVapourPressure), system)],
            ...month.vapourPressure.map((p, k): [number, number] => [nx[k]!, toT(safeDew(p), system)]),
            [xRight, toT(safeDew(month.interiorVapourPressure), system)],
          ],
          solidName: 'Temperature θ',
          dashedName: 'Dew point θ_d of the vapour present',
          unit: tUnit,
        }
      : {
          solid: [
            [xLeft, month.exteriorVapourPressure],
            ...month.vapourPressure.map((p, k): [number, number] => [nx[k]!, p]),
            [xRight, month.interiorVapourPressure],
          ],
          dashed: [
            [xLeft, saturationPressureIso13788(month.exteriorTemperature)],
            [nx[0]!, saturationPressureIso13788(month.exteriorTemperature)],
            ...month.saturationPressure.map((p, k): [number, number] => [nx[k]!, p]),
            [nx[last]!, saturationPressureIso13788(month.interiorTemperature)],
            [xRight, saturationPressureIso13788(month.interiorTemperature)],
          ],
          solidName: 'Vapour pressure p',
          dashedName: 'Saturation pressure p_sat',
          unit: 'Pa',
        };

  const values = [...series.solid, ...series.dashed].map(([, v]) => v).filter(Number.isFinite);
  let lo = Math.min(...values);
  let hi = Math.max(...values);
  if (mode === 'pressure') lo = 0;
  // The value axis runs from a round tick below the lowest value to one above the highest.
  const step = niceStep(hi - lo || 1, 6);
  lo = Math.floor(lo / step) * step;
  hi = Math.ceil(hi / step) * step;
  if (hi - Math.max(...values) < step * 0.15) hi += step;
  if (mode === 'temperature' && Math.min(...values) - lo < step * 0.15) lo -= step;
  const yTicks = ticks(lo, hi, Math.round((hi - lo) / step));
  const yOf = (v: number) => TOP + PLOT_H - ((v - lo) / (hi - lo)) * PLOT_H;
  const path = (pts: readonly [number, number][]) =>
    pts
      .filter(([, v]) => Number.isFinite(v))
      .map(([x, v], k) => `${k === 0 ? 'M' : 'L'}${x.toFixed(2)} ${yOf(v).toFixed(2)}`)
      .join(' ');

  const layerNames = layers.map((l) => l.name);
  const placed = layers.map((l, i) => ({ l, i, key: `${i}:${l.name}` }));
  const wet = new Set(month.condensationNodes);
  const marks = result.nodes
    .map((node, k) => ({ node, k }))
    .filter(({ k }) => wet.has(k) || (month.accumulation[k] ?? 0) > 0);

  const xTicks = equal ? [] : ticks(0, toShownLength(geo.total, system), 8);
  const unit = lengthUnit(system);
  const pattern = (h: Hatch | undefined) =>
    h && h !== 'air' && h !== 'glass' ? `url(#${uid}-${h})` : 'none';

  const summary =
    mode === 'temperature'
      ? `${monthName(month.month)}: temperature from ${formatNumber(toT(month.exteriorTemperature, system), 1)} ${tUnit} outside to ${formatNumber(toT(month.interiorTemperature, system), 1)} ${tUnit} inside, with the dew point of the vapour present`
      : `${monthName(month.month)}: vapour pressure from ${month.exteriorVapourPressure.toFixed(0)} Pa outside to ${month.interiorVapourPressure.toFixed(0)} Pa inside, under the saturation pressure`;
  const marked =
    marks.length === 0
      ? 'no condensation this month'
      : marks
          .map(
            ({ node, k }) =>
              `${wet.has(k) ? 'condenses' : 'still wet, drying'} ${nodePlace(node, layerNames)}`,
          )
          .join('; ');

  return (
    <figure className="m-0">
      {/* Below about 640 px the drawing scrolls sideways rather than shrinking its lettering out of reach. */}
      <div className="overflow-x-auto">
        <svg
          viewBox={`0 0 ${W} ${H}`}
          className="h-auto w-full min-w-[640px] border border-rule bg-paper-raised"
          role="img"
          aria-labelledby={`${uid}-title`}
          data-testid="profile-chart"
        >
          <title
            id={`${uid}-title`}
          >{`Profile through the wall, outside on the left. ${summary}; ${marked}.`}</title>
          <defs>
            <pattern id={`${uid}-batt`} width="14" height="10" patternUnits="userSpaceOnUse">
              <path d="M0 5 Q3.5 0 7 5 T14 5" fill="none" stroke={RULE} strokeWidth="0.9" />
            </pattern>
            <pattern id={`${uid}-rigid`} width="8" height="8" patternUnits="userSpaceOnUse">
              <path d="M0 8 L8 0 M0 0 L8 8" stroke={RULE} strokeWidth="0.6" />
            </pattern>
            <pattern id={`${uid}-gypsum`} width="7" height="7" patternUnits="userSpaceOnUse">
              <circle cx="1.5" cy="1.5" r="0.8" fill={RULE} />
              <circle cx="5" cy="4" r="0.8" fill={RULE} />
            </pattern>
            {(['board', 'masonry', 'other', 'membrane', 'metal'] as const).map((h) => (
              <pattern key={h} id={`${uid}-${h}`} width="6" height="6" patternUnits="userSpaceOnUse">
                <path d="M0 6 L6 0" stroke={RULE} strokeWidth={h === 'masonry' ? 1.1 : 0.7} />
              </pattern>
            ))}
          </defs>

          {/* Air on either side */}
          <rect x={xLeft} y={TOP} width={AIR} height={PLOT_H} fill={PAPER} />
          <rect x={xRight - AIR} y={TOP} width={AIR} height={PLOT_H} fill={PAPER} />

          {/* Layers, drawn to thickness */}
          {placed.map(({ l, i, key }) => {
            const x0 = equal ? xOf(0) : xOf(geo.start[i]!);
            const w = equal ? 0 : (geo.end[i]! - geo.start[i]!) * scale;
            const included = result.layers[i]?.included ?? true;
            if (w < 2.5)
              return (
                <line
                  key={key}
                  x1={x0 + w / 2}
                  x2={x0 + w / 2}
                  y1={TOP}
                  y2={TOP + PLOT_H}
                  stroke={INK}
                  strokeWidth={l.hatch === 'metal' ? 2 : 1.2}
                  strokeDasharray={l.hatch === 'metal' ? undefined : '5 3'}
                />
              );
            return (
              <g key={key}>
                <rect x={x0} y={TOP} width={w} height={PLOT_H} fill={i % 2 === 0 ? PAPER : SUNK} />
                <rect
                  x={x0}
                  y={TOP}
                  width={w}
                  height={PLOT_H}
                  fill={included ? pattern(l.hatch) : 'none'}
                  stroke={INK}
                  strokeWidth="0.8"
                />
                {!included && w > 14 ? (
                  <text
                    x={x0 + w / 2}
                    y={TOP + PLOT_H / 2}
                    fontSize="10"
                    fill={MUTED}
                    textAnchor="middle"
                    transform={`rotate(-90 ${x0 + w / 2} ${TOP + PLOT_H / 2})`}
                  >
                    disregarded — ventilated
                  </text>
                ) : null}
              </g>
            );
          })}

          {/* Horizontal grid and the value axis */}
          {yTicks.map((t) => (
            <g key={`y${t}`}>
              <line
                x1={AXIS}
                x2={xRight}
                y1={yOf(t)}
                y2={yOf(t)}
                stroke={MUTED}
                strokeWidth="0.4"
                strokeDasharray="2 4"
              />
              <text
                x={AXIS - 6}
                y={yOf(t) + 3.5}
                fontSize="11"
                textAnchor="end"
                fill={MUTED}
                fontFamily="IBM Plex Mono, monospace"
              >
                {formatNumber(t, 2).replace(/^-/, '\u2212')}
              </text>
            </g>
          ))}
          <text
            x={AXIS - 6}
            y={TOP - 10}
            fontSize="11"
            textAnchor="end"
            fill={INK}
            fontFamily="IBM Plex Mono, monospace"
          >
            {series.unit}
          </text>
          <line x1={AXIS} x2={AXIS} y1={TOP} y2={TOP + PLOT_H} stroke={INK} strokeWidth="0.8" />

          {/* Condensation planes */}
          {marks.map(({ node, k }, j) => {
            const x = nx[k]!;
            const condensing = wet.has(k);
            return (
              <g key={`m${k}`} data-testid="condensation-plane">
                <line
                  x1={x}
                  x2={x}
                  y1={TOP - 34}
                  y2={TOP + PLOT_H}
                  stroke={condensing ? CAUTION : INK}
                  strokeWidth="2"
                  strokeDasharray={condensing ? undefined : '4 3'}
                />
                <text
                  x={x + 5}
                  y={TOP - 48 + (j % 2) * 13}
                  fontSize="11"
                  fill={condensing ? CAUTION : INK}
                  fontWeight="600"
                >
                  {`${condensing ? '✕ condenses' : '▲ still wet, drying'} ${nodePlace(node, layerNames)}`}
                </text>
              </g>
            );
          })}

          {/* The two lines */}
          <path d={path(series.dashed)} fill="none" stroke={INK} strokeWidth="1.6" strokeDasharray="7 4" />
          <path d={path(series.solid)} fill="none" stroke={INK} strokeWidth="2.2" />
          {marks.map(({ k }) => {
            const v = mode === 'temperature' ? toT(month.temperature[k]!, system) : month.vapourPressure[k]!;
            return (
              <circle
                key={`c${k}`}
                cx={nx[k]}
                cy={yOf(v)}
                r="4.5"
                fill={wet.has(k) ? CAUTION : PAPER}
                stroke={INK}
                strokeWidth="1"
              />
            );
          })}

          {/* Layer numbers */}
          {placed.map(({ i, key }) => {
            const cx = equal ? xOf(0) : xOf((geo.start[i]! + geo.end[i]!) / 2);
            return (
              <text
                key={key}
                x={cx}
                y={TOP - 8 - (i % 2) * 11}
                fontSize="10"
                textAnchor="middle"
                fill={MUTED}
                fontFamily="IBM Plex Mono, monospace"
              >
                {i + 1}
              </text>
            );
          })}

          {/* Position through the wall */}
          <line
            x1={xOf(0)}
            x2={xOf(geo.total)}
            y1={TOP + PLOT_H}
            y2={TOP + PLOT_H}
            stroke={INK}
            strokeWidth="0.8"
          />
          {xTicks.map((t) => {
            const x = xOf(fromShownLength(t, system));
            return (
              <g key={`x${t}`}>
                <line x1={x} x2={x} y1={TOP + PLOT_H} y2={TOP + PLOT_H + 5} stroke={INK} strokeWidth="0.8" />
                <text
                  x={x}
                  y={TOP + PLOT_H + 18}
                  fontSize="11"
                  textAnchor="middle"
                  fill={MUTED}
                  fontFamily="IBM Plex Mono, monospace"
                >
                  {formatNumber(t, 2)}
                </text>
              </g>
            );
          })}
          <text x={xOf(geo.total / 2)} y={TOP + PLOT_H + 36} fontSize="11" textAnchor="middle" fill={INK}>
            {`position through the wall from its outer face, ${unit} (to scale)`}
          </text>
          {[
            { x: xLeft + AIR / 2, side: 'OUTSIDE' },
            { x: xRight - AIR / 2, side: 'INSIDE' },
          ].map((a) => (
            <text
              key={a.side}
              x={a.x}
              y={TOP + PLOT_H + 36}
              fontSize="10"
              letterSpacing="1.2"
              textAnchor="middle"
              fill={INK}
            >
              {a.side}
            </text>
          ))}
        </svg>
      </div>
      <figcaption className="mt-1 flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-ink-muted">
        <span className="flex items-center gap-1">
          <svg width="28" height="8" aria-hidden="true">
            <line x1="0" x2="28" y1="4" y2="4" stroke={INK} strokeWidth="2.2" />
          </svg>
          {series.solidName}
        </span>
        <span className="flex items-center gap-1">
          <svg width="28" height="8" aria-hidden="true">
            <line x1="0" x2="28" y1="4" y2="4" stroke={INK} strokeWidth="1.6" strokeDasharray="7 4" />
          </svg>
          {series.dashedName}
        </span>
        <span>
          {mode === 'temperature'
            ? 'Where the two lines meet, the vapour present is at its dew point: water condenses there.'
            : 'Where the vapour line touches the saturation line, water condenses (tangent construction).'}
        </span>
        <span>Air films at the faces are drawn as steps; thin films and declared-R layers as lines.</span>
      </figcaption>
    </figure>
  );
}
