import type { JointInput } from '@shared/calc/joints/schema';
import { formatPageMeasure, type PageMeasure } from '@shared/format/page-measures';
import { Button } from '../../../components/ui/Button';
import { FieldLink } from '../../../components/ui/FieldLink';
import { Notice } from '../../../components/ui/Notice';
import { problemText } from '../../../lib/field-problems';
import { useUnitSystem } from '../../../lib/unit-system';
import { type AirDesign, copyJoint, newJoint, removeAt, replaceAt } from '../draft';
import { type JointsEvaluation, MAX_JOINTS, problemsOfJoint } from '../evaluate';
import { GOVERNING_LABELS } from '../labels';
import { jointVerdict } from '../verdict';
import { JointEditor } from './JointEditor';

/** Plain words for a path inside a joint, for the list of what a joint is waiting for. */
const FIELD_WORDS: Record<string, string> = {
  name: 'joint mark',
  designWidth: 'design width',
  designDepth: 'design depth',
  constructionTolerance: 'construction tolerance',
  minimumPracticalWidth: 'smallest workable width',
  openingDepth: 'opening depth',
  'sealant.movementClass': 'sealant class',
  surfaceTemperatureRange: 'surface temperature range',
  'surfaceTemperatureRange.min': 'lowest surface temperature',
  'surfaceTemperatureRange.max': 'highest surface temperature',
  installationTemperature: 'installation temperature',
  'installationTemperature.min': 'coolest installation temperature',
  'installationTemperature.max': 'warmest installation temperature',
  'otherMovement.extension': 'other opening',
  'otherMovement.compression': 'other closing',
  sides: 'moving sides',
};

export function describeJointPath(rest: string): string {
  const side = /^sides\.(\d+)\.(\w+)$/.exec(rest);
  if (side) {
    const what = { material: 'material', alpha: 'declared α', length: 'moving length', label: 'whose α' }[
      side[2] ?? ''
    ];
    return `side ${Number(side[1]) + 1} ${what ?? side[2]}`;
  }
  return FIELD_WORDS[rest] ?? rest;
}

/** The measure of a path inside a joint, so a range problem is worded in the person's units. */
export function jointPathMeasure(rest: string): PageMeasure | undefined {
  if (/emperature/.test(rest)) return 'temperature';
  if (/^sides\.\d+\.length$/.test(rest)) return 'length';
  if (/^sides\.\d+\.alpha$/.test(rest)) return 'alpha';
  if (
    /^(designWidth|designDepth|constructionTolerance|minimumPracticalWidth|openingDepth|otherMovement\.\w+)$/.test(
      rest,
    )
  )
    return 'joint';
  return undefined;
}

interface JointScheduleEditorProps {
  joints: readonly JointInput[];
  onChange: (joints: JointInput[]) => void;
  evaluation: JointsEvaluation;
  selected: number;
  onSelect: (index: number) => void;
  air: AirDesign | null;
  /** Names what a removal removes (for “Removed … — Undo”). */
  onRemove?: (what: string) => void;
}

/** The joint schedule's inputs: a list of joint marks, and every input of the joint picked from it. */
export function JointScheduleEditor({
  joints,
  onChange,
  evaluation,
  selected,
  onSelect,
  air,
  onRemove,
}: JointScheduleEditorProps) {
  const system = useUnitSystem();
  const i = Math.min(selected, joints.length - 1);
  const joint = joints[i];
  const result = i >= 0 ? evaluation.results[i] : null;
  const problems = i >= 0 ? problemsOfJoint(evaluation.problems, i) : [];

  function add(j: JointInput) {
    onChange([...joints, j]);
    onSelect(joints.length);
  }

  return (
    <div className="flex flex-col gap-4">
      <fieldset className="flex flex-wrap items-center gap-2" aria-label="Joints in the schedule">
        {joints.map((j, k) => {
          const r = evaluation.results[k];
          const glyph = r ? (r.verdict === 'pass' ? '✓' : '✕') : '?';
          const tone = r ? (r.verdict === 'pass' ? 'text-meets' : 'text-caution') : 'text-warning';
          return (
            <button
              // biome-ignore lint/suspicious/noArrayIndexKey: joints are addressed by position
              key={k}
              type="button"
              aria-pressed={k === i}
              onClick={() => onSelect(k)}
              className={`rounded-sm border px-3 py-1 text-sm ${k === i ? 'border-ink bg-paper-raised font-semibold' : 'border-rule hover:border-ink'}`}
            >
              <span aria-hidden="true" className={`mr-1 ${tone}`}>
                {glyph}
              </span>
              {j.name || `Joint ${k + 1}`}
              <span className="sr-only">
                {r ? (r.verdict === 'pass' ? ' (meets)' : ' (short)') : ' (waiting for values)'}
              </span>
            </button>
          );
        })}
        <Button
          variant="secondary"
          disabled={joints.length >= MAX_JOINTS}
          onClick={() => add(newJoint(joints.length, air))}
        >
          Add a joint
        </Button>
      </fieldset>

      {joint ? (
        <section
          aria-label={`Joint ${joint.name || i + 1}`}
          className="flex flex-col gap-4 border border-rule bg-paper px-4 py-4"
        >
          <div className="flex flex-wrap items-baseline justify-between gap-3">
            <h4 className="font-serif text-lg">
              Joint <span className="num text-base text-ink-muted">{i + 1}</span> — {joint.name || 'unnamed'}
            </h4>
            <div className="flex gap-2">
              <Button
                variant="quiet"
                disabled={joints.length >= MAX_JOINTS}
                onClick={() => add(copyJoint(joint, joints.length))}
              >
                Copy this joint
              </Button>
              <Button
                variant="danger"
                onClick={() => {
                  onRemove?.(`joint ${joint.name || i + 1}`);
                  onChange(removeAt(joints, i));
                  onSelect(Math.max(0, i - 1));
                }}
              >
                Remove this joint
              </Button>
            </div>
          </div>
          <JointEditor
            key={i}
            joint={joint}
            index={i}
            air={air}
            problems={evaluation.problems}
            onChange={(j) => onChange(replaceAt(joints, i, j))}
          />
          <div aria-live="polite" className="border-t-2 border-ink pt-3" data-testid="joint-live">
            {result ? (
              <p className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
                <span className="label-caps">Live</span>
                <span>
                  Required width{' '}
                  <span className="num font-semibold">
                    {formatPageMeasure(result.requiredWidth, 'joint', system)}
                  </span>{' '}
                  <span className="text-sm text-ink-muted">({GOVERNING_LABELS[result.governing]})</span>
                </span>
                <span className={`font-semibold ${jointVerdict(result, system).cls}`}>
                  <span aria-hidden="true">{jointVerdict(result, system).glyph} </span>
                  {jointVerdict(result, system).text}
                </span>
              </p>
            ) : (
              <Notice tone="caution" title="This joint cannot be sized yet:">
                <ul className="list-disc pl-5">
                  {problems.map(([path, p]) => (
                    <li key={path}>
                      <FieldLink path={path}>
                        {describeJointPath(path.slice(`joints.${i}.`.length))}
                      </FieldLink>
                      : {problemText(p, jointPathMeasure(path.slice(`joints.${i}.`.length)), system)}
                    </li>
                  ))}
                </ul>
              </Notice>
            )}
          </div>
        </section>
      ) : (
        <p className="text-ink-muted">No joints yet. Add one to size it.</p>
      )}
    </div>
  );
}
