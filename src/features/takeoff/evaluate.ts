import { type TakeoffInput, type TakeoffResult, takeoffInputSchema } from '@shared/calc/takeoff/schema';
import { calculateTakeoff } from '@shared/calc/takeoff/takeoff';
import { calcProblem, collectIssues, type FieldProblems, type ZodIssueLike } from '../../lib/field-problems';

export interface TakeoffEvaluation {
  result: TakeoffResult | null;
  /** Path (`takeoff.walls.0.length`) → why it cannot be used. */
  problems: FieldProblems;
}

/** The takeoff in the browser with the shared engine: schema first, then the engine's own refusals. */
export function evaluateTakeoff(input: TakeoffInput): TakeoffEvaluation {
  const problems: FieldProblems = {};
  const parsed = takeoffInputSchema.safeParse(input);
  if (!parsed.success) {
    collectIssues(parsed.error.issues as ZodIssueLike[], ['takeoff'], problems);
    return { result: null, problems };
  }
  try {
    return { result: calculateTakeoff(parsed.data), problems };
  } catch (e) {
    const [path, problem] = calcProblem(e, 'takeoff.');
    problems[path] = problem;
    return { result: null, problems };
  }
}
