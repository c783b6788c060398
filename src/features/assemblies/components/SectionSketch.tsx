import type { Bridge, Layer, ThermalInput } from '@shared/calc/thermal/schema';
import { type DrawClass, drawClass, isInsulation } from '@shared/sheets/layer-class';
import type { UnitSystem } from '@shared/units';
import { INCH } from '@shared/units';
import { type ReactNode, useId } from 'react';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatMeasure } from '../units';

const INK = '#1e1c19';
const MUTED = '#57514a';
const PAPER = '#fbf8f1';

/** Width (px, in viewBox units) given to the wall itself; the scale follows from the wall's thickness. */
const WALL_PX = 600;
/** Largest scale, px per m (4 px/mm): a thin wall is drawn smaller rather than blown up. */
const MAX_SCALE = 4000;
const HEIGHT_PX = 340;
const LEFT = 86;
const TOP = 84;
const RIGHT = 330;
const BOTTOM = 96;

const thicknessOf = (l: Layer) =>
  l.thickness !== undefined && Number.isFinite(l.thickness) ? l.thickness : 0;

interface Placed {
  index: number;
  layer: Layer;
  x: number;
  w: number;
  cls: DrawClass;
}

/** Pick a round scale-bar length near a quarter of the drawn wall. */
function scaleBar(system: UnitSystem, pxPerM: number, wallPx: number): { m: number; label: string } {
  const target = wallPx / 4 / pxPerM;
  const choices =
    system === 'IP'
      ? [0.5, 1, 2, 3, 4, 6, 12].map((i) => ({ m: i * INCH, label: `${i} in` }))
      : [10, 20, 25, 50, 100, 200, 500].map((mm) => ({ m: mm / 1000, label: `${mm} mm` }));
  return choices.reduce((best, c) => (Math.abs(c.m - target) < Math.abs(best.m - target) ? c : best));
}

function bridgeLabel(b: Bridge, system: UnitSystem): string {
  switch (b.kind) {
    case 'point': {
      const chi = formatMeasure(b.chi, 'chi', system);
      return 'spacingHorizontal' in b
        ? `χ ${chi} @ ${formatMeasure(b.spacingHorizontal, 'spacing', system, 0)} × ${formatMeasure(b.spacingVertical, 'spacing', system, 0)}`
        : `χ ${chi}, ${formatMeasure(b.countPerArea, 'countPerArea', system)}`;
    }
    case 'linear': {
      const psi = formatMeasure(b.psi, 'psi', system);
      return 'spacing' in b
        ? `ψ ${psi} @ ${formatMeasure(b.spacing, 'spacing', system, 0)}`
        : `ψ ${psi}, ${formatMeasure(b.lengthPerArea, 'lengthPerArea', system)}`;
    }
    case 'fastener':
      return `⌀ ${formatMeasure(b.diameter, 'diameter', system, 1)}, ${formatMeasure(b.countPerArea, 'countPerArea', system)}`;
  }
}

/**
 * A to-scale section through the wall, outside on the left: each layer drawn to its thickness with the
 * hatch of its material class, and one of each bridge drawn where it crosses the insulation (clips as
 * brackets, girts as Z profiles, fasteners as lines), lettered as in the attachments list.
 */
export function SectionSketch({
  thermal,
  girtOrientation,
}: {
  thermal: ThermalInput;
  girtOrientation: 'horizontal' | 'vertical';
}) {
  const system = useUnitSystem();
  const uid = useId().replace(/[^a-zA-Z0-9]/g, '');
  const layers = thermal.layers;
  const total = layers.reduce((a, l) => a + thicknessOf(l), 0);
  if (layers.length === 0 || !(total > 0))
    return (
      <p className="border border-dashed border-rule px-4 py-8 text-center text-ink-muted">
        The section appears once a layer has a thickness.
      </p>
    );

  const s = Math.min(WALL_PX / total, MAX_SCALE);
  const wallPx = total * s;
  const y0 = TOP;
  const y1 = TOP + HEIGHT_PX;
  const width = LEFT + wallPx + RIGHT;
  const height = TOP + HEIGHT_PX + BOTTOM;

  let x = LEFT;
  const placed: Placed[] = layers.map((layer, index) => {
    const w = thicknessOf(layer) * s;
    const p = { index, layer, x, w, cls: drawClass(layer) };
    x += w;
    return p;
  });

  // Number callouts above the wall, staggered where thin layers crowd together.
  const rows: number[] = [];
  const callouts = placed.map((p) => {
    const cx = p.x + p.w / 2;
    let row = 0;
    while (rows[row] !== undefined && cx - rows[row]! < 20) row++;
    rows[row] = cx;
    return { cx, cy: TOP - 18 - row * 20, index: p.index };
  });

  // Where clips and girts cross: the first insulation layer, else the first framed layer.
  const ciIndex = (() => {
    const ins = layers.findIndex((l) => isInsulation(l));
    return ins >= 0 ? ins : layers.findIndex((l) => l.kind === 'framed');
  })();

  const drawn = thermal.bridges
    .map((b, j) => ({ b, j }))
    .filter(({ b }) => (b.kind === 'fastener' ? placed[b.layerIndex] !== undefined : ciIndex >= 0));
  const slot = HEIGHT_PX / (drawn.length + 1);
  const mm = (m: number) => m * s;
  const px = (millimetres: number) => Math.max(mm(millimetres / 1000), 4);

  const bar = scaleBar(system, s, wallPx);
  const pattern = (c: DrawClass) => `url(#${uid}-${c})`;

  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        className="h-auto w-full max-w-full border border-rule bg-paper-raised"
        role="img"
        aria-labelledby={`${uid}-title`}
      >
        <title id={`${uid}-title`}>
          {`Section through the wall, outside on the left, ${formatMeasure(total, 'thickness', system, 1)} thick, ${layers.length} layers`}
        </title>
        <defs>
          <pattern id={`${uid}-batt`} width="14" height="10" patternUnits="userSpaceOnUse">
            <path d="M0 5 Q3.5 0 7 5 T14 5" fill="none" stroke={INK} strokeWidth="0.8" />
          </pattern>
          <pattern id={`${uid}-rigid`} width="7" height="7" patternUnits="userSpaceOnUse">
            <path d="M0 7 L7 0 M0 0 L7 7" stroke={INK} strokeWidth="0.5" />
          </pattern>
          <pattern id={`${uid}-gypsum`} width="7" height="7" patternUnits="userSpaceOnUse">
            <circle cx="1.5" cy="1.5" r="0.7" fill={INK} />
            <circle cx="5" cy="4" r="0.7" fill={INK} />
            <circle cx="2.5" cy="6" r="0.5" fill={INK} />
          </pattern>
          <pattern id={`${uid}-board`} width="6" height="6" patternUnits="userSpaceOnUse">
            <path d="M0 6 L6 0" stroke={INK} strokeWidth="0.6" />
          </pattern>
          <pattern id={`${uid}-masonry`} width="5" height="5" patternUnits="userSpaceOnUse">
            <path d="M0 5 L5 0" stroke={INK} strokeWidth="0.9" />
          </pattern>
          <pattern id={`${uid}-other`} width="6" height="6" patternUnits="userSpaceOnUse">
            <path d="M0 6 L6 0" stroke={INK} strokeWidth="0.6" />
          </pattern>
        </defs>

        {/* Layers */}
        {placed.map((p) => {
          if (p.layer.kind === 'resistance' || p.cls === 'membrane' || p.w < 2.5) {
            const solid = p.cls === 'metal';
            return (
              <line
                key={p.index}
                x1={p.x + p.w / 2}
                x2={p.x + p.w / 2}
                y1={y0}
                y2={y1}
                stroke={INK}
                strokeWidth={solid ? 2.2 : 1.4}
                strokeDasharray={solid ? undefined : '6 3'}
              />
            );
          }
          const fill =
            p.cls === 'metal'
              ? INK
              : p.cls === 'air' || p.cls === 'glass'
                ? 'none'
                : pattern(
                    p.cls === 'batt' || p.cls === 'rigid' || p.cls === 'gypsum' || p.cls === 'masonry'
                      ? p.cls
                      : 'board',
                  );
          return (
            <g key={p.index}>
              <rect
                x={p.x}
                y={y0}
                width={p.w}
                height={HEIGHT_PX}
                fill={fill}
                stroke={INK}
                strokeWidth="0.9"
              />
              {p.layer.kind === 'framed' ? (
                <>
                  <line
                    x1={p.x + 1.5}
                    x2={p.x + 1.5}
                    y1={y0}
                    y2={y1}
                    stroke={INK}
                    strokeWidth="1.2"
                    strokeDasharray="10 3 2 3"
                  />
                  <line
                    x1={p.x + p.w - 1.5}
                    x2={p.x + p.w - 1.5}
                    y1={y0}
                    y2={y1}
                    stroke={INK}
                    strokeWidth="1.2"
                    strokeDasharray="10 3 2 3"
                  />
                </>
              ) : null}
              {p.layer.kind === 'air' ? (
                <text
                  x={p.x + p.w / 2}
                  y={y0 + HEIGHT_PX / 2}
                  fontSize="9"
                  fill={MUTED}
                  textAnchor="middle"
                  transform={`rotate(-90 ${p.x + p.w / 2} ${y0 + HEIGHT_PX / 2})`}
                >
                  {p.w > 10
                    ? p.layer.ventilation === 'unventilated'
                      ? 'air'
                      : `air, ${p.layer.ventilation} vent.`
                    : ''}
                </text>
              ) : null}
            </g>
          );
        })}

        {/* Break lines top and bottom: the wall continues. */}
        {[y0, y1].map((y) => (
          <path
            key={y}
            d={`M${LEFT - 14} ${y} H${LEFT + wallPx / 2 - 8} l4 -7 l8 14 l4 -7 H${LEFT + wallPx + 14}`}
            fill="none"
            stroke={INK}
            strokeWidth="0.8"
          />
        ))}

        {/* Bridges, one of each drawn where it crosses. */}
        {drawn.map(({ b, j }, n) => {
          const y = y0 + slot * (n + 1);
          const letter = String.fromCharCode(65 + (j % 26));
          const target = b.kind === 'fastener' ? placed[b.layerIndex]! : placed[ciIndex]!;
          const xo = target.x;
          const xi = target.x + target.w;
          let shape: ReactNode;
          if (b.kind === 'point') {
            // Bracket: base plate on the inner face, arm across the insulation, a short tab beyond it.
            const plate = px(50);
            const tab = px(25);
            shape = (
              <path
                d={`M${xi} ${y - plate / 2} V${y + plate / 2} M${xi} ${y} H${xo - px(12)} V${y - tab}`}
                fill="none"
                stroke={INK}
                strokeWidth="2.6"
                strokeLinejoin="miter"
              />
            );
          } else if (b.kind === 'linear') {
            // Z profile: inner flange, web across the insulation, outer flange.
            const flange = px(45);
            shape = (
              <path
                d={`M${xi} ${y + flange} V${y} H${xo} V${y - flange}`}
                fill="none"
                stroke={INK}
                strokeWidth="2"
                strokeLinejoin="miter"
              />
            );
          } else {
            const recess =
              b.penetration === 'recessed' && Number.isFinite(b.recessDepth) ? mm(b.recessDepth ?? 0) : 0;
            const start = xo + recess;
            const end = Math.min(xi + px(25), LEFT + wallPx);
            const head = px(14);
            shape = (
              <g stroke={INK}>
                <line x1={start} x2={end} y1={y} y2={y} strokeWidth="1.4" />
                <line x1={start} x2={start} y1={y - head / 2} y2={y + head / 2} strokeWidth="2.4" />
              </g>
            );
          }
          const endX = b.kind === 'fastener' ? Math.min(xi + px(25), LEFT + wallPx) : xi;
          const labelX = LEFT + wallPx + 34;
          return (
            <g key={j}>
              {shape}
              <line
                x1={endX + 3}
                x2={labelX - 4}
                y1={y}
                y2={y}
                stroke={MUTED}
                strokeWidth="0.6"
                strokeDasharray="3 2"
              />
              <text x={labelX} y={y - 3} fontSize="12" fill={INK} fontWeight="600">
                {letter} {b.name.length > 34 ? `${b.name.slice(0, 33)}…` : b.name}
              </text>
              <text x={labelX} y={y + 12} fontSize="11" fill={MUTED} fontFamily="IBM Plex Mono, monospace">
                {bridgeLabel(b, system)}
              </text>
            </g>
          );
        })}

        {/* Layer numbers */}
        {callouts.map((c) => (
          <g key={c.index}>
            <line x1={c.cx} x2={c.cx} y1={c.cy + 8} y2={y0} stroke={MUTED} strokeWidth="0.6" />
            <circle cx={c.cx} cy={c.cy} r="8" fill={PAPER} stroke={INK} strokeWidth="0.8" />
            <text
              x={c.cx}
              y={c.cy + 3.5}
              fontSize="10"
              textAnchor="middle"
              fill={INK}
              fontFamily="IBM Plex Mono, monospace"
            >
              {c.index + 1}
            </text>
          </g>
        ))}

        {/* Outside / inside */}
        <text
          x={LEFT - 24}
          y={y0 + HEIGHT_PX / 2}
          fontSize="11"
          letterSpacing="1.5"
          fill={INK}
          textAnchor="middle"
          transform={`rotate(-90 ${LEFT - 24} ${y0 + HEIGHT_PX / 2})`}
        >
          OUTSIDE
        </text>
        <text x={LEFT + wallPx + 14} y={y1 + 4} fontSize="11" letterSpacing="1.5" fill={INK}>
          INSIDE ▸
        </text>

        {/* Overall dimension */}
        <g stroke={INK} strokeWidth="0.8">
          <line x1={LEFT} x2={LEFT} y1={y1 + 12} y2={y1 + 34} />
          <line x1={LEFT + wallPx} x2={LEFT + wallPx} y1={y1 + 12} y2={y1 + 34} />
          <line x1={LEFT} x2={LEFT + wallPx} y1={y1 + 28} y2={y1 + 28} />
          <line x1={LEFT - 4} x2={LEFT + 4} y1={y1 + 32} y2={y1 + 24} />
          <line x1={LEFT + wallPx - 4} x2={LEFT + wallPx + 4} y1={y1 + 32} y2={y1 + 24} />
        </g>
        <text
          x={LEFT + wallPx / 2}
          y={y1 + 23}
          fontSize="11"
          textAnchor="middle"
          fill={INK}
          fontFamily="IBM Plex Mono, monospace"
        >
          {formatMeasure(total, 'thickness', system, 1)}
        </text>

        {/* Scale bar */}
        <g transform={`translate(${LEFT} ${y1 + 62})`}>
          <rect x="0" y="0" width={(bar.m * s) / 2} height="5" fill={INK} />
          <rect
            x={(bar.m * s) / 2}
            y="0"
            width={(bar.m * s) / 2}
            height="5"
            fill={PAPER}
            stroke={INK}
            strokeWidth="0.8"
          />
          <text x="0" y="18" fontSize="10" fill={MUTED} fontFamily="IBM Plex Mono, monospace">
            0
          </text>
          <text
            x={bar.m * s}
            y="18"
            fontSize="10"
            fill={MUTED}
            textAnchor="middle"
            fontFamily="IBM Plex Mono, monospace"
          >
            {bar.label}
          </text>
          <text x={bar.m * s + 40} y="7" fontSize="10" fill={MUTED}>
            to scale across the wall; one of each bridge shown, spacing as labelled
          </text>
        </g>
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-5 gap-y-1 text-xs text-ink-muted">
        <span>
          Section across the girts (
          {girtOrientation === 'horizontal'
            ? 'girts run horizontally: a vertical cut'
            : 'girts run vertically: a horizontal cut'}
          ).
        </span>
        <span>
          Hatches: wavy — fibrous insulation; cross — rigid insulation; dots — gypsum; diagonal — board or
          masonry; solid — metal; blank — air; dashed line — membrane or declared R.
        </span>
      </figcaption>
    </figure>
  );
}
