import type { TakeoffInput } from '@shared/calc/takeoff/schema';
import { formatJointDimension, formatPageMeasure } from '@shared/format/page-measures';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { TAKEOFF_TYPE_LABELS } from '../labels';

/** The elevation list and allowances as saved, for people who read but do not edit the assembly. */
export function ElevationTable({ input }: { input: TakeoffInput }) {
  const system = useUnitSystem();
  const len = (m: number | undefined) => formatPageMeasure(m, 'length', system);
  return (
    <div className="flex flex-col gap-4">
      <Table
        caption="Walls as saved"
        head={[
          'Wall',
          numeric('Length × height'),
          numeric('Corners / abutments'),
          'Openings (n × width × height)',
        ]}
      >
        <tbody>
          {input.walls.map((w, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: walls follow the input order
            <tr key={i}>
              <Td className="font-semibold">{w.name}</Td>
              <Td numeric>
                {len(w.length)} × {len(w.height)}
              </Td>
              <Td numeric>
                {w.corners ?? 0} / {w.abutments ?? 0}
              </Td>
              <Td>
                {w.openings.length === 0
                  ? 'none'
                  : w.openings.map((o, j) => (
                      // biome-ignore lint/suspicious/noArrayIndexKey: openings follow the input order
                      <span key={j} className="block">
                        {o.name ?? `Opening ${j + 1}`} ({o.kind ?? 'window'}):{' '}
                        <span className="num">
                          {o.count} × {len(o.width)} × {len(o.height)}
                        </span>
                      </span>
                    ))}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[max-content_1fr]">
        <dt className="font-semibold">Panel module</dt>
        <dd className="num">
          {len(input.module.width)} × {len(input.module.length)}, spanning {input.module.orientation}ly
        </dd>
        <dt className="font-semibold">Beads</dt>
        <dd>
          {Object.entries(input.beads)
            .filter(([, b]) => b)
            .map(([t, b]) => {
              const d = (v: number) => formatJointDimension(v, system);
              const size = !b
                ? ''
                : b.shape === 'round'
                  ? `round d ${d(b.diameter)}`
                  : b.shape === 'fillet'
                    ? `fillet leg ${d(b.leg)}`
                    : `${d(b.width)} × ${d(b.depth)}`;
              return `${TAKEOFF_TYPE_LABELS[t as keyof typeof TAKEOFF_TYPE_LABELS]}: ${size}`;
            })
            .join('; ') || 'none'}
        </dd>
        <dt className="font-semibold">Waste</dt>
        <dd className="num">{formatPageMeasure(input.wasteFactor, 'percent', system)}</dd>
        <dt className="font-semibold">Trims</dt>
        <dd>
          {input.trims.length === 0
            ? 'none'
            : input.trims
                .map(
                  (t) =>
                    `${t.name} (${TAKEOFF_TYPE_LABELS[t.appliesTo].toLowerCase()}): ${len(t.stockLength)} lapped ${formatPageMeasure(t.lapAllowance, 'spacing', system)}`,
                )
                .join('; ')}
        </dd>
        <dt className="font-semibold">Fasteners</dt>
        <dd className="num">
          {input.fasteners
            ? `every ${formatPageMeasure(input.fasteners.spacingAlongGirt, 'spacing', system)} along girts at ${len(input.fasteners.girtSpacing)}`
            : 'not counted'}
        </dd>
        <dt className="font-semibold">Tape</dt>
        <dd>
          {input.tape
            ? `${formatJointDimension(input.tape.width, system)} wide along ${input.tape.appliesTo.map((t) => TAKEOFF_TYPE_LABELS[t].toLowerCase()).join(', ')}${input.tape.rollLength ? `; rolls of ${len(input.tape.rollLength)}` : ''}`
            : 'none'}
        </dd>
      </dl>
    </div>
  );
}
