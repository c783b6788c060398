import { calculateJoint } from '@shared/calc/joints/joints';
import { type JointInput, type JointResult, jointInputSchema } from '@shared/calc/joints/schema';
import {
  calcProblem,
  collectIssues,
  type FieldProblem,
  type FieldProblems,
  type ZodIssueLike,
} from '../../lib/field-problems';

/** Most joints an assembly stores (shared/schemas/assembly caps `joints` at 100). */
export const MAX_JOINTS = 100;

export interface JointsEvaluation {
  /** One entry per joint: its result, or null while one of its values cannot be used. */
  results: (JointResult | null)[];
  /** Path (`joints.2.designWidth`) → why it cannot be used. */
  problems: FieldProblems;
  passCount: number;
  failCount: number;
}

/**
 * Size every joint of the schedule in the browser with the shared engine, each on its own, so one joint
 * with a value to put right does not blank the others. The schema (ranges, required values) is checked
 * first; then the engine refuses physically impossible input at its field path.
 */
export function evaluateJoints(joints: readonly JointInput[]): JointsEvaluation {
  const problems: FieldProblems = {};
  const results = joints.map((joint, i) => {
    const parsed = jointInputSchema.safeParse(joint);
    if (!parsed.success) {
      collectIssues(parsed.error.issues as ZodIssueLike[], ['joints', i], problems);
      return null;
    }
    try {
      return calculateJoint(parsed.data, `joints.${i}`);
    } catch (e) {
      const [path, problem] = calcProblem(e);
      problems[path] = problem;
      return null;
    }
  });
  if (joints.length > MAX_JOINTS)
    problems.joints = { kind: 'text', text: `An assembly holds at most ${MAX_JOINTS} joints.` };
  const passCount = results.filter((r) => r?.verdict === 'pass').length;
  const failCount = results.filter((r) => r?.verdict === 'fail').length;
  return { results, problems, passCount, failCount };
}

/** The problems of joint `i` (paths under `joints.i.`). */
export function problemsOfJoint(problems: FieldProblems, i: number): [string, FieldProblem][] {
  const prefix = `joints.${i}.`;
  return Object.entries(problems).filter(([k]) => k.startsWith(prefix) || k === `joints.${i}`);
}
