import type { BridgeDetailInput } from '@shared/calc/bridge/computed';
import { type DetailDrawing, detailDrawing } from '@shared/sheets/bridge-drawing';
import type { DrawClass } from '@shared/sheets/layer-class';
import { useMemo } from 'react';
import { useUnitSystem } from '../../../lib/unit-system';
import { formatMeasure } from '../units';

/** Hatch of each material class (the compliance sheet's, in SVG): metal solid, insulation zigzag or cross-hatch. */
const HATCH: Record<DrawClass, string> = {
  metal: 'url(#dh-metal)',
  batt: 'url(#dh-batt)',
  rigid: 'url(#dh-rigid)',
  gypsum: 'url(#dh-gypsum)',
  board: 'url(#dh-board)',
  masonry: 'url(#dh-masonry)',
  membrane: 'none',
  air: 'none',
  glass: 'none',
  other: '#f3efe6',
};

/** A scale bar length that reads well: 10, 20, 50, 100, 200, 500 mm or 1 m, about a fifth of the width. */
const barOf = (width: number) => [0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1].find((b) => b >= width / 6) ?? 1;

/**
 * The detail being solved, drawn to scale from the model the solver gets (a 3-D detail cut at its mid-plane):
 * each box hatched by its material class, with a scale bar. Redrawn as the inputs change; nothing when the
 * inputs cannot make a model yet.
 */
export function DetailSection({ detail, label }: { detail: BridgeDetailInput | null; label: string }) {
  const system = useUnitSystem();
  const drawing = useMemo<DetailDrawing | null>(() => {
    if (!detail) return null;
    try {
      return detailDrawing(detail);
    } catch {
      return null;
    }
  }, [detail]);
  if (!drawing) return null;
  const [x0, y0] = drawing.min;
  const [w, h] = [drawing.max[0] - x0, drawing.max[1] - y0];
  const bar = barOf(w);
  const pad = Math.max(w, h) * 0.04;
  const y = (v: number) => (drawing.yDown ? v : y0 + (drawing.max[1] - v));
  const u = Math.max(w, h) / 120; // hatch pitch in model metres: about 120 strokes across
  return (
    <figure className="flex flex-col gap-1">
      <svg
        role="img"
        aria-label={`${label}, to scale: ${drawing.boxes.length} parts`}
        viewBox={`${x0 - pad} ${y0 - pad} ${w + 2 * pad} ${h + 2 * pad + 6 * u}`}
        className="h-auto max-h-56 w-full border border-rule bg-paper-raised"
        data-testid="detail-section"
      >
        <defs>
          <pattern id="dh-metal" width={u} height={u} patternUnits="userSpaceOnUse">
            <rect width={u} height={u} fill="#1E1C19" />
          </pattern>
          <pattern id="dh-batt" width={2 * u} height={2 * u} patternUnits="userSpaceOnUse">
            <path
              d={`M0 ${2 * u} L${u} 0 L${2 * u} ${2 * u}`}
              fill="none"
              stroke="#57514A"
              strokeWidth={u / 6}
            />
          </pattern>
          <pattern id="dh-rigid" width={1.5 * u} height={1.5 * u} patternUnits="userSpaceOnUse">
            <path
              d={`M0 0 L${1.5 * u} ${1.5 * u} M${1.5 * u} 0 L0 ${1.5 * u}`}
              stroke="#57514A"
              strokeWidth={u / 8}
            />
          </pattern>
          <pattern id="dh-gypsum" width={u} height={u} patternUnits="userSpaceOnUse">
            <circle cx={u / 2} cy={u / 2} r={u / 8} fill="#57514A" />
          </pattern>
          <pattern id="dh-board" width={2 * u} height={2 * u} patternUnits="userSpaceOnUse">
            <path d={`M0 ${2 * u} L${2 * u} 0`} stroke="#57514A" strokeWidth={u / 8} />
          </pattern>
          <pattern id="dh-masonry" width={u} height={u} patternUnits="userSpaceOnUse">
            <path d={`M0 ${u} L${u} 0`} stroke="#57514A" strokeWidth={u / 6} />
          </pattern>
        </defs>
        {drawing.boxes.map((b) => {
          const [ya, yb] = [y(b.min[1]), y(b.max[1])];
          return (
            <rect
              key={`${b.name}-${b.min.join()}-${b.max.join()}`}
              x={b.min[0]}
              y={Math.min(ya, yb)}
              width={b.max[0] - b.min[0]}
              height={Math.abs(yb - ya)}
              fill={HATCH[b.cls]}
              stroke="#1E1C19"
              strokeWidth={0.5}
              vectorEffect="non-scaling-stroke"
            >
              <title>{`${b.name}, λ ${b.lambda}`}</title>
            </rect>
          );
        })}
        <g>
          <rect x={x0} y={y0 + h + pad} width={bar} height={u} fill="#1E1C19" />
          <text x={x0 + bar + u} y={y0 + h + pad + u} fontSize={3 * u} fill="#57514A">
            {formatMeasure(bar, 'spacing', system)}
          </text>
        </g>
      </svg>
      <figcaption className="text-xs text-ink-muted">
        {label}, to scale (the bar below it); hatched by material: solid metal, zigzag fibrous insulation,
        cross-hatch rigid insulation, diagonals board and concrete.
      </figcaption>
    </figure>
  );
}
