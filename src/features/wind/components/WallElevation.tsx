import type { UnitSystem } from '@shared/units';
import { useId } from 'react';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatWind } from '../units';

const INK = '#1e1c19';
const MUTED = '#57514a';
const RULE = '#7c7263';
const PAPER = '#fbf8f1';

const VIEW_W = 960;
const LEFT = 96;
const RIGHT = 96;
const TOP = 56;
const BOTTOM = 112;
const MAX_WALL_H = 260;
const MIN_WALL_H = 60;
/** Girt lines are drawn only while they stay legible. */
const MAX_GIRT_LINES = 60;

interface WallElevationProps {
  /** Wall length drawn (the plan length), m. */
  length: number;
  /** Mean roof height h, m. */
  height: number;
  /** End-zone width a, m. */
  edgeWidth: number;
  girtOrientation: 'horizontal' | 'vertical';
  /** Design girt spacing, m (girt lines drawn when given). */
  girtSpacing?: number;
}

/** A dimension line with architectural ticks and its text; text moves outside when the span is too short. */
function Dim({
  x1,
  x2,
  y,
  text,
  outside,
}: {
  x1: number;
  x2: number;
  y: number;
  text: string;
  outside?: 'left' | 'right';
}) {
  const tick = (x: number) => (
    <line x1={x - 4} y1={y + 4} x2={x + 4} y2={y - 4} stroke={INK} strokeWidth="1.4" />
  );
  const tx = outside === 'left' ? x1 - 8 : outside === 'right' ? x2 + 8 : (x1 + x2) / 2;
  const anchor = outside === 'left' ? 'end' : outside === 'right' ? 'start' : 'middle';
  return (
    <g>
      <line x1={x1} y1={y} x2={x2} y2={y} stroke={INK} strokeWidth="0.9" />
      {tick(x1)}
      {tick(x2)}
      <text x={tx} y={outside ? y + 4 : y - 6} textAnchor={anchor} fontSize="12" fill={INK} className="num">
        {text}
      </text>
    </g>
  );
}

const len = (m: number, system: UnitSystem) => formatWind(m, 'length', system);

/**
 * Elevation of the long wall as a line drawing: zone 5 strips of width a at both corners (hatched), zone 4 between,
 * a dimension chain a | L − 2a | a and the overall length below, the height h at the side, and the girts at the
 * design spacing as fine dashed lines.
 */
export function WallElevation({
  length,
  height,
  edgeWidth,
  girtOrientation,
  girtSpacing,
}: WallElevationProps) {
  const system = useUnitSystem();
  const uid = useId().replace(/[^a-zA-Z0-9]/g, '');
  const wallW = VIEW_W - LEFT - RIGHT;
  const scale = Math.min(wallW / length, MAX_WALL_H / height);
  const w = length * scale;
  const exaggerated = height * scale < MIN_WALL_H;
  const h = exaggerated ? MIN_WALL_H : height * scale;
  const x0 = LEFT + (wallW - w) / 2;
  const y0 = TOP;
  const yb = TOP + h;
  const viewH = TOP + h + BOTTOM;
  const overlap = 2 * edgeWidth >= length;
  const aPx = Math.min(edgeWidth * scale, w / 2);
  const middle = Math.max(length - 2 * edgeWidth, 0);
  const narrow = aPx < 64;

  const girts: number[] = [];
  if (girtSpacing && girtSpacing > 0) {
    const span = girtOrientation === 'horizontal' ? height : length;
    const n = Math.floor(span / girtSpacing + 1e-9);
    if (n <= MAX_GIRT_LINES) for (let k = 0; k <= n; k++) girts.push(k * girtSpacing);
  }
  const girtPx = (m: number) => m * (girtOrientation === 'horizontal' ? h / height : scale);

  const title = overlap
    ? `Elevation of the long wall, ${len(length, system)} long and ${len(height, system)} high: the end zones of width a = ${len(edgeWidth, system)} cover the whole wall, so all of it is zone 5.`
    : `Elevation of the long wall, ${len(length, system)} long and ${len(height, system)} high: zone 5 strips of width a = ${len(edgeWidth, system)} at both corners, zone 4 between them over ${len(middle, system)}.`;

  return (
    <figure className="m-0 flex flex-col gap-2">
      <svg
        viewBox={`0 0 ${VIEW_W} ${viewH}`}
        className="h-auto w-full max-w-full border border-rule bg-paper-raised"
        role="img"
        aria-labelledby={`${uid}-title`}
      >
        <title id={`${uid}-title`}>{title}</title>
        <defs>
          <pattern id={`${uid}-z5`} width="8" height="8" patternUnits="userSpaceOnUse">
            <path d="M0 8 L8 0" stroke={MUTED} strokeWidth="0.7" />
          </pattern>
        </defs>

        {/* Ground line */}
        <line x1={x0 - 24} x2={x0 + w + 24} y1={yb} y2={yb} stroke={INK} strokeWidth="1.6" />
        {/* Zone 5 strips */}
        <rect x={x0} y={y0} width={aPx} height={h} fill={`url(#${uid}-z5)`} />
        <rect x={x0 + w - aPx} y={y0} width={aPx} height={h} fill={`url(#${uid}-z5)`} />
        {/* Girts at the design spacing */}
        {girts.map((g) =>
          girtOrientation === 'horizontal' ? (
            <line
              key={g}
              x1={x0}
              x2={x0 + w}
              y1={yb - girtPx(g)}
              y2={yb - girtPx(g)}
              stroke={RULE}
              strokeWidth="0.8"
              strokeDasharray="5 3"
            />
          ) : (
            <line
              key={g}
              x1={x0 + girtPx(g)}
              x2={x0 + girtPx(g)}
              y1={y0}
              y2={yb}
              stroke={RULE}
              strokeWidth="0.8"
              strokeDasharray="5 3"
            />
          ),
        )}
        {/* Wall outline and zone boundaries */}
        <rect x={x0} y={y0} width={w} height={h} fill="none" stroke={INK} strokeWidth="1.6" />
        {!overlap ? (
          <>
            <line x1={x0 + aPx} x2={x0 + aPx} y1={y0} y2={yb} stroke={INK} strokeWidth="1" />
            <line x1={x0 + w - aPx} x2={x0 + w - aPx} y1={y0} y2={yb} stroke={INK} strokeWidth="1" />
          </>
        ) : null}

        {/* Zone labels above the wall */}
        {[x0 + aPx / 2, x0 + w - aPx / 2].map((cx) => (
          <g key={cx}>
            <circle cx={cx} cy={TOP - 22} r="11" fill={PAPER} stroke={INK} strokeWidth="1" />
            <text x={cx} y={TOP - 18} textAnchor="middle" fontSize="12" fontWeight="600" fill={INK}>
              5
            </text>
          </g>
        ))}
        {!overlap ? (
          <g>
            <circle cx={x0 + w / 2} cy={TOP - 22} r="11" fill={PAPER} stroke={INK} strokeWidth="1" />
            <text x={x0 + w / 2} y={TOP - 18} textAnchor="middle" fontSize="12" fontWeight="600" fill={INK}>
              4
            </text>
            <text x={x0 + w / 2 + 18} y={TOP - 18} fontSize="12" fill={MUTED}>
              zone 4 — wall interior
            </text>
          </g>
        ) : null}

        {/* Extension lines */}
        {(overlap ? [x0, x0 + w] : [x0, x0 + aPx, x0 + w - aPx, x0 + w]).map((x) => (
          <line key={x} x1={x} x2={x} y1={yb + 6} y2={yb + 78} stroke={MUTED} strokeWidth="0.6" />
        ))}
        {!overlap ? (
          <>
            <Dim
              x1={x0}
              x2={x0 + aPx}
              y={yb + 36}
              text={`a = ${len(edgeWidth, system)}`}
              outside={narrow ? 'left' : undefined}
            />
            <Dim x1={x0 + aPx} x2={x0 + w - aPx} y={yb + 36} text={len(middle, system)} />
            <Dim
              x1={x0 + w - aPx}
              x2={x0 + w}
              y={yb + 36}
              text={`a = ${len(edgeWidth, system)}`}
              outside={narrow ? 'right' : undefined}
            />
          </>
        ) : null}
        <Dim x1={x0} x2={x0 + w} y={yb + 72} text={`L = ${len(length, system)}`} />

        {/* Height */}
        <line x1={x0 - 6} x2={x0 - 52} y1={y0} y2={y0} stroke={MUTED} strokeWidth="0.6" />
        <line x1={x0 - 40} x2={x0 - 40} y1={y0} y2={yb} stroke={INK} strokeWidth="0.9" />
        <line x1={x0 - 44} y1={y0 + 4} x2={x0 - 36} y2={y0 - 4} stroke={INK} strokeWidth="1.4" />
        <line x1={x0 - 44} y1={yb + 4} x2={x0 - 36} y2={yb - 4} stroke={INK} strokeWidth="1.4" />
        <text
          x={x0 - 48}
          y={(y0 + yb) / 2}
          fontSize="12"
          fill={INK}
          textAnchor="middle"
          transform={`rotate(-90 ${x0 - 48} ${(y0 + yb) / 2})`}
          className="num"
        >
          {`h = ${len(height, system)}`}
        </text>
      </svg>
      <figcaption className="text-sm text-ink-muted">
        Long wall{exaggerated ? ', height exaggerated to stay legible' : ', to scale'}. Hatched: zone 5, the
        end strip of width <span className="font-serif italic">a</span> at every corner of every wall; open:
        zone 4.
        {girts.length > 0
          ? ` Dashed: ${girtOrientation} girts at the design spacing of ${formatWind(girtSpacing, 'span', system)}.`
          : ''}
      </figcaption>
    </figure>
  );
}
