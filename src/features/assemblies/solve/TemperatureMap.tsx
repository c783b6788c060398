import { bandRects, isotherms, PALETTE, type Section } from '@shared/calc/bridge/section';
import type { UnitSystem } from '@shared/units';
import { formatQuantity } from '../../../lib/quantities';

/** A rectangle in model metres, drawn as an outline (the metal). */
export interface Outline {
  min: number[];
  max: number[];
}

/**
 * The section's cells coloured by temperature band (runs of one band along a row merged into one rectangle),
 * outside at the top, inside at the bottom, the metal outlined and the coldest inside point marked; a legend
 * gives the band edges in the person's units.
 */
export function TemperatureMap({
  section,
  warm,
  cold,
  metal,
  coldest,
  system,
  title,
  orientation = 'Outside at the top, inside at the bottom',
  flipY = false,
}: {
  section: Section;
  warm: number;
  cold: number;
  metal: Outline[];
  coldest: { at: number[]; temperature: number } | null;
  system: UnitSystem;
  title: string;
  /** Where outside and inside are, in words. */
  orientation?: string;
  /** Draw y upwards (a model whose y axis points up, e.g. a slab edge). */
  flipY?: boolean;
}) {
  const { x, y } = section;
  const nx = x.length - 1;
  const [x0, x1, y0, y1] = [x[0]!, x[nx]!, y[0]!, y[y.length - 1]!];
  const w = x1 - x0;
  const h = y1 - y0;
  const rects = bandRects(section, warm, cold);
  const lines = isotherms(section, warm, cold);
  const step = (warm - cold) / PALETTE.length;
  const cx = coldest?.at[0];
  const cy = coldest?.at[1];
  return (
    <figure className="flex flex-col gap-2">
      <svg
        role="img"
        aria-label={`${title}: temperature bands from ${formatQuantity(warm, 'temperature', system)} inside to ${formatQuantity(cold, 'temperature', system)} outside${coldest ? `; coldest inside point ${formatQuantity(coldest.temperature, 'temperature', system)}` : ''}`}
        viewBox={`${x0} ${y0 - h * 0.12} ${w} ${h * 1.24}`}
        preserveAspectRatio="xMidYMid meet"
        className="h-auto max-h-72 w-full border border-rule bg-paper-raised"
        data-testid="temperature-map"
      >
        <g transform={flipY ? `translate(0 ${y0 + y1}) scale(1 -1)` : undefined}>
          {rects.map((r) => (
            <rect
              key={`${r.x}-${r.y}`}
              x={r.x}
              y={r.y}
              width={r.w}
              height={r.h}
              fill={PALETTE[r.band]}
              shapeRendering="crispEdges"
            />
          ))}
          <g data-testid="isotherms" fill="none" stroke="#1E1C19" strokeOpacity={0.55}>
            {lines.map((l) => (
              <path
                key={l.level}
                d={l.segments.map(([a, b, c, d]) => `M${a} ${b}L${c} ${d}`).join('')}
                strokeWidth={0.75}
                vectorEffect="non-scaling-stroke"
              />
            ))}
          </g>
          {metal.map((m) => (
            <rect
              key={`${m.min.join()}-${m.max.join()}`}
              x={m.min[0]}
              y={m.min[1]}
              width={m.max[0]! - m.min[0]!}
              height={m.max[1]! - m.min[1]!}
              fill="none"
              stroke="#111"
              strokeWidth={1.5}
              vectorEffect="non-scaling-stroke"
            />
          ))}
          {cx !== undefined && cy !== undefined ? (
            <g data-testid="coldest-point">
              {/* A white ring under a dark one: the mark reads on any colour of the map. */}
              {[
                { stroke: '#fff', width: 4 },
                { stroke: '#111', width: 2 },
              ].map((ring) => (
                <circle
                  key={ring.stroke}
                  cx={cx}
                  cy={cy}
                  r={h * 0.05}
                  fill="none"
                  stroke={ring.stroke}
                  strokeWidth={ring.width}
                  vectorEffect="non-scaling-stroke"
                />
              ))}
            </g>
          ) : null}
        </g>
      </svg>
      <figcaption className="flex flex-col gap-1 text-xs text-ink-muted">
        <span>
          {orientation}; conductive parts outlined; thin lines are isotherms at the band edges; ◯ the coldest
          inside point
          {coldest ? ` (${formatQuantity(coldest.temperature, 'temperature', system)})` : ''}.
        </span>
        <ol className="flex flex-wrap gap-x-2 gap-y-1" aria-label="Temperature bands">
          {PALETTE.map((colour, b) => (
            <li key={colour} className="flex items-center gap-1">
              <span
                aria-hidden="true"
                className="inline-block h-3 w-4 border border-rule"
                style={{ background: colour }}
              />
              <span className="num">
                {formatQuantity(warm - b * step, 'temperature', system)}–
                {formatQuantity(warm - (b + 1) * step, 'temperature', system)}
              </span>
            </li>
          ))}
        </ol>
      </figcaption>
    </figure>
  );
}
