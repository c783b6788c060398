import type { InspectionSummary } from '@shared/inspections/schema';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { areaText, type ElevationState, elevationState } from '../scope';

/** Each state in a fill, a glyph and words — the glyph and words carry it without colour. */
const LOOK: Record<ElevationState, { fill: string; glyph: string; words: string }> = {
  open: { fill: 'var(--color-caution)', glyph: '✕', words: 'open deficiencies' },
  in_progress: { fill: 'var(--color-warning)', glyph: '○', words: 'in progress' },
  passed: { fill: 'var(--color-meets)', glyph: '✓', words: 'passed' },
};

/** Panel joints of the drawing, every 40 units of its 180 high. */
const JOINTS = [40, 80, 120, 160];

/**
 * One elevation as a small drawing: the wall cut into the parts inspected (one panel each, in the order
 * inspected), each filled by its state and labelled with a glyph, the part and the state in words; a list
 * below says the same for screen readers and print.
 */
export function ElevationDrawing({
  elevation,
  inspections,
  projectId,
}: {
  elevation: string;
  inspections: InspectionSummary[];
  projectId: string;
}) {
  const width = 600;
  const height = 180;
  const w = width / Math.max(1, inspections.length);
  return (
    <figure className="flex flex-col gap-2" data-testid="elevation">
      <figcaption className="text-lg font-semibold">{elevation}</figcaption>
      <svg
        viewBox={`0 0 ${width} ${height + 32}`}
        className="h-auto w-full max-w-2xl border border-ink bg-paper-raised"
        role="img"
        aria-label={`${elevation}: ${inspections.map((i) => `${areaText(i.scope.area)} ${LOOK[elevationState(i)].words}`).join('; ')}`}
      >
        {inspections.map((i, n) => {
          const look = LOOK[elevationState(i)];
          const x = n * w;
          return (
            <g key={i.id}>
              <rect
                x={x + 2}
                y={2}
                width={w - 4}
                height={height - 4}
                fill={look.fill}
                fillOpacity={0.22}
                stroke="var(--color-ink)"
              />
              {JOINTS.map((y) => (
                <line key={y} x1={x + 2} x2={x + w - 2} y1={y} y2={y} stroke="var(--color-rule-strong)" />
              ))}
              <CentredText x={x + w / 2} y={height / 2 - 6} size={44}>
                {look.glyph}
              </CentredText>
              <CentredText x={x + w / 2} y={height / 2 + 26} size={w < 150 ? 16 : 24} halo>
                {look.words}
              </CentredText>
              <CentredText x={x + w / 2} y={height + 24} size={w < 150 ? 16 : 24}>
                {areaText(i.scope.area)}
              </CentredText>
            </g>
          );
        })}
      </svg>
      <ul className="flex flex-col gap-1 text-sm">
        {inspections.map((i) => {
          const look = LOOK[elevationState(i)];
          return (
            <li key={i.id} data-state={elevationState(i)}>
              <span aria-hidden="true">{look.glyph} </span>
              <Link
                to={`/projects/${projectId}/inspections/${i.id}`}
              >{`${areaText(i.scope.area)} (No. ${i.number})`}</Link>
              {` — ${look.words}: ${i.counts.pass} passed, ${i.counts.fail} failed, ${i.counts.unseen} not yet seen, ${i.counts.openDeficiencies} open deficiencies`}
            </li>
          );
        })}
      </ul>
    </figure>
  );
}

/** Ink text centred on x; `halo` outlines it in the paper colour so it reads over the state's fill. */
function CentredText({
  x,
  y,
  size,
  halo = false,
  children,
}: {
  x: number;
  y: number;
  size: number;
  halo?: boolean;
  children: ReactNode;
}) {
  return (
    <text
      x={x}
      y={y}
      textAnchor="middle"
      fontSize={size}
      fill="var(--color-ink)"
      {...(halo ? { stroke: 'var(--color-paper-raised)', strokeWidth: 5, paintOrder: 'stroke' } : {})}
    >
      {children}
    </text>
  );
}
