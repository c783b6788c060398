import type { Backer, JointInput, JointResult } from '@shared/calc/joints/schema';
import { messageText } from '@shared/format';
import { formatJointDimension, formatPageMeasure, nextSixteenth } from '@shared/format/page-measures';
import type { UnitSystem } from '@shared/units';
import { ShowTheWork } from '../../../components/ui/ShowTheWork';
import { Table, Td, Th } from '../../../components/ui/Table';
import { sentence } from '../../../lib/field-problems';
import { useUnitSystem } from '../../../lib/unit-system';
import { type JointsEvaluation, problemsOfJoint } from '../evaluate';
import { GOVERNING_LABELS, JOINT_TYPE_LABELS } from '../labels';
import { jointVerdict } from '../verdict';

const dim = (si: number, system: UnitSystem) => formatPageMeasure(si, 'joint', system);

/** "Closed-cell rod, Ø 25–26.6 mm" or "Bond-breaker tape, 19 mm wide". */
export function backerText(b: Backer, system: UnitSystem): string {
  if (b.kind === 'bond_breaker_tape') return `Bond-breaker tape, ${dim(b.width, system)} wide`;
  const cell = b.cell === 'closed_cell' ? 'Closed-cell' : 'Open-cell';
  return `${cell} rod, Ø ${formatPageMeasure(b.minDiameter, 'joint', system).replace(/\s\S+$/, '')}–${dim(b.maxDiameter, system)}`;
}

/** The verdict cell: glyph, word and margin (colour last). */
export function VerdictText({ result }: { result: JointResult }) {
  const system = useUnitSystem();
  const v = jointVerdict(result, system);
  return (
    <span className={`font-semibold ${v.cls}`} data-verdict={v.verdict}>
      <span aria-hidden="true" className="mr-1">
        {v.glyph}
      </span>
      {v.text}
    </span>
  );
}

interface ScheduleTableProps {
  joints: readonly JointInput[];
  evaluation: JointsEvaluation;
  /** Open a joint in the editor (editors only). */
  onEdit?: (index: number) => void;
}

/** The joint schedule: movement, required width and depth, backer and the verdict of every joint. */
export function ScheduleTable({ joints, evaluation, onEdit }: ScheduleTableProps) {
  const system = useUnitSystem();
  const { results, passCount, failCount } = evaluation;
  const waiting = results.filter((r) => r === null).length;
  const warnings = results.flatMap((r) =>
    r ? r.warnings.map((w) => ({ joint: r.name, text: messageText(w, system) })) : [],
  );

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm" data-testid="schedule-summary">
        <span className="num">{joints.length}</span> {joints.length === 1 ? 'joint' : 'joints'}:{' '}
        <span className="text-meets">
          <span aria-hidden="true">✓ </span>
          <span className="num">{passCount}</span> meet
        </span>
        {failCount > 0 ? (
          <>
            ,{' '}
            <span className="text-caution">
              <span aria-hidden="true">✕ </span>
              <span className="num">{failCount}</span> short
            </span>
          </>
        ) : null}
        {waiting > 0 ? (
          <>
            , <span className="num">{waiting}</span> waiting for values
          </>
        ) : null}
        .
      </p>
      <Table caption="Joint schedule — widths and depths in the sealant's terms">
        <thead>
          <tr>
            <Th>Joint</Th>
            <Th numeric>
              Opening / closing
              <span className="block text-xs font-normal text-ink-muted">movement</span>
            </Th>
            <Th numeric>Required width</Th>
            <Th numeric>Design width</Th>
            <Th numeric>
              Sealant depth
              <span className="block text-xs font-normal text-ink-muted">by the depth rule</span>
            </Th>
            <Th>Backer</Th>
            <Th>Result</Th>
          </tr>
        </thead>
        <tbody>
          {joints.map((j, i) => {
            const r = results[i];
            const mark = (
              <>
                {onEdit ? (
                  <button
                    type="button"
                    className="text-left font-semibold underline underline-offset-4"
                    onClick={() => onEdit(i)}
                  >
                    {j.name || `Joint ${i + 1}`}
                  </button>
                ) : (
                  <span className="font-semibold">{j.name || `Joint ${i + 1}`}</span>
                )}
                <span className="block text-xs text-ink-muted">{JOINT_TYPE_LABELS[j.type] ?? j.type}</span>
              </>
            );
            if (!r) {
              const n = problemsOfJoint(evaluation.problems, i).length;
              return (
                // biome-ignore lint/suspicious/noArrayIndexKey: rows follow the schedule order
                <tr key={i} data-joint={i}>
                  <Td>{mark}</Td>
                  <Td colSpan={6} className="text-caution">
                    <span aria-hidden="true">✕ </span>
                    cannot be sized yet — {n === 1 ? 'one value needs' : `${n} values need`} attention
                  </Td>
                </tr>
              );
            }
            const next = nextSixteenth(r.requiredWidth, system);
            return (
              // biome-ignore lint/suspicious/noArrayIndexKey: rows follow the schedule order
              <tr key={i} data-joint={i}>
                <Td>{mark}</Td>
                <Td numeric>
                  +{dim(r.movementExtension, system)}
                  <span className="block">−{dim(r.movementCompression, system)}</span>
                </Td>
                <Td numeric>
                  <span className="font-semibold">{dim(r.requiredWidth, system)}</span>
                  <span className="block font-sans text-xs text-ink-muted">
                    {GOVERNING_LABELS[r.governing]}
                  </span>
                  {next ? (
                    <span className="block whitespace-nowrap font-sans text-xs text-ink-muted">
                      next 1/16: {next}
                    </span>
                  ) : null}
                </Td>
                <Td numeric>{formatJointDimension(r.designWidth, system)}</Td>
                <Td numeric>
                  {dim(r.requiredDepth, system)}
                  {j.designDepth !== undefined ? (
                    <span className="block font-sans text-xs text-ink-muted">
                      drawn {formatJointDimension(j.designDepth, system)}
                    </span>
                  ) : null}
                </Td>
                <Td className="num">{backerText(r.backer, system)}</Td>
                <Td>
                  <VerdictText result={r} />
                </Td>
              </tr>
            );
          })}
        </tbody>
      </Table>
      {warnings.length > 0 ? (
        <div className="flex flex-col gap-1 border-l-4 border-warning bg-warning-wash px-4 py-3 text-sm">
          <p className="font-semibold">
            <span aria-hidden="true" className="mr-2">
              ▲
            </span>
            <span className="label-caps mr-2 text-ink">Warning</span>
            {warnings.length === 1 ? 'One point to check' : `${warnings.length} points to check`}
          </p>
          <ul className="list-disc pl-5">
            {warnings.map((w) => (
              <li key={`${w.joint}-${w.text}`}>
                <span className="font-semibold">{w.joint}:</span> {sentence(w.text)}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <div className="flex flex-col">
        {results.map((r, i) =>
          r ? (
            <ShowTheWork
              // biome-ignore lint/suspicious/noArrayIndexKey: one per joint, in schedule order
              key={i}
              steps={r.trace}
              title={r.name}
              className="border-b border-rule first:border-t-2 first:border-t-ink"
            />
          ) : null,
        )}
      </div>
    </div>
  );
}
