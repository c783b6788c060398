import type { GeneratedItem, ItemAnswer, MeasuredCheck } from './schema';

/** Relative slack for values that went through a unit conversion (a typed 47.25 in back to m). */
const SLACK = 1e-9;

/**
 * A measured value against the item's acceptance limits: below the minimum, above the maximum, or within
 * (a value equal to a limit meets it). No value or no limits: nothing to check.
 */
export function checkMeasured(
  item: Pick<GeneratedItem, 'tolerance'>,
  measured: number | null,
): MeasuredCheck {
  const t = item.tolerance;
  if (measured === null) return { status: 'none', text: 'not measured' };
  if (t === null || (t.min === null && t.max === null))
    return { status: 'none', text: 'no tolerance to check' };
  if (t.min !== null && measured < t.min - SLACK * Math.max(1, Math.abs(t.min)))
    return { status: 'below', text: 'below the smallest value accepted' };
  if (t.max !== null && measured > t.max + SLACK * Math.max(1, Math.abs(t.max)))
    return { status: 'above', text: 'above the largest value accepted' };
  return { status: 'within', text: 'within the tolerance' };
}

/** What makes an answer impossible for its item: the field and the reason, or undefined when it may be stored. */
export function answerProblem(
  item: Pick<GeneratedItem, 'quantity' | 'tolerance'>,
  answer: Pick<ItemAnswer, 'state'> & { measured: number | null },
): { field: 'state' | 'measured'; reason: string } | undefined {
  const { measured } = answer;
  if (measured === null) return undefined;
  if (item.quantity === null)
    return { field: 'measured', reason: 'this item is looked at, not measured — leave the value empty' };
  if (item.quantity === 'count' && !Number.isInteger(measured))
    return { field: 'measured', reason: 'a count is a whole number' };
  if (item.quantity === 'count' && measured < 0)
    return { field: 'measured', reason: 'a count cannot be negative' };
  const check = checkMeasured(item, measured);
  if (answer.state === 'pass' && (check.status === 'below' || check.status === 'above'))
    return { field: 'state', reason: `the measured value is ${check.text}: it cannot pass` };
  return undefined;
}
