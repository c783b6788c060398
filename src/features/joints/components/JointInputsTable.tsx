import { findExpansionMaterial } from '@shared/calc/joints/expansion';
import type { JointInput, JointSide } from '@shared/calc/joints/schema';
import { formatJointDimension, formatPageMeasure, formatPageRange } from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { useUnitSystem } from '../../../lib/unit-system';
import { BACKER_LABELS, JOINT_TYPE_LABELS, MOVEMENT_CLASS_LABELS } from '../labels';

function sideText(s: JointSide, system: UnitSystem) {
  const row = 'material' in s ? findExpansionMaterial(s.material) : undefined;
  const what = 'material' in s ? (row?.name ?? s.material) : (s.label ?? 'custom α');
  const alpha = 'material' in s ? row?.alpha : s.alpha;
  return {
    what,
    alpha: alpha === undefined ? '—' : formatPageMeasure(alpha, 'alpha', system),
    source: row?.source,
  };
}

const t = (c: number, system: UnitSystem) => formatPageMeasure(c, 'temperature', system);

/** The schedule's inputs as a table, for people who read but do not edit the assembly. */
export function JointInputsTable({ joints }: { joints: readonly JointInput[] }) {
  const system = useUnitSystem();
  return (
    <Table
      caption="Joint inputs as saved"
      head={[
        'Joint',
        numeric('Design width / depth'),
        'Moving sides (α × L)',
        numeric('Surface range'),
        numeric('Installed at'),
        numeric('Other movement'),
        'Sealant, tolerance, backer',
      ]}
    >
      <tbody>
        {joints.map((j, i) => {
          const install = j.installationTemperature;
          return (
            // biome-ignore lint/suspicious/noArrayIndexKey: rows follow the schedule order
            <tr key={i}>
              <Td>
                <span className="font-semibold">{j.name}</span>
                <span className="block text-xs text-ink-muted">{JOINT_TYPE_LABELS[j.type]}</span>
              </Td>
              <Td numeric>
                {formatJointDimension(j.designWidth, system)}
                <span className="block">
                  {j.designDepth !== undefined ? formatJointDimension(j.designDepth, system) : '—'}
                </span>
              </Td>
              <Td>
                {j.sides.map((s, k) => {
                  const d = sideText(s, system);
                  return (
                    // biome-ignore lint/suspicious/noArrayIndexKey: at most two sides
                    <span key={k} className="block">
                      {d.what}: <span className="num">{d.alpha}</span> ×{' '}
                      <span className="num">{formatPageMeasure(s.length, 'length', system)}</span>
                      {d.source ? <span className="block text-xs text-ink-muted">{d.source}</span> : null}
                    </span>
                  );
                })}
              </Td>
              <Td numeric>
                {formatPageRange(
                  j.surfaceTemperatureRange.min,
                  j.surfaceTemperatureRange.max,
                  'temperature',
                  system,
                )}
              </Td>
              <Td numeric>
                {typeof install === 'number'
                  ? t(install, system)
                  : `${t(install.min, system)} to ${t(install.max, system)}`}
              </Td>
              <Td numeric>
                {j.otherMovement
                  ? `+${formatPageMeasure(j.otherMovement.extension, 'joint', system)} / −${formatPageMeasure(j.otherMovement.compression, 'joint', system)}`
                  : 'none'}
              </Td>
              <Td>
                {MOVEMENT_CLASS_LABELS[j.sealant.movementClass]}
                <span className="block text-xs">
                  tolerance{' '}
                  <span className="num">{formatPageMeasure(j.constructionTolerance, 'joint', system)}</span>
                  {' · '}
                  {BACKER_LABELS[j.backer ?? 'closed_cell']}
                  {j.openingDepth !== undefined ? (
                    <>
                      {' · '}opening{' '}
                      <span className="num">{formatJointDimension(j.openingDepth, system)}</span> deep
                    </>
                  ) : null}
                </span>
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
