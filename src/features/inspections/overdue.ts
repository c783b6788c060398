import { type DeficiencyState, isDeficiencyOpen } from '@shared/inspections/schema';

/** Today on this device's calendar as YYYY-MM-DD (a due date is a local calendar day, not an instant). */
export function localToday(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/**
 * Overdue: a due date before today and not yet accepted by the inspector (a correction still to be accepted
 * counts — the deficiency is open until accepted). Due today is not overdue. YYYY-MM-DD compares as text.
 */
export const isOverdue = (d: { state: DeficiencyState; dueDate: string | null }, today: string): boolean =>
  d.dueDate !== null && isDeficiencyOpen(d.state) && d.dueDate < today;
