import { DEFICIENCY_STATES } from '@shared/inspections/schema';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isOverdue, localToday } from './overdue';

describe('localToday', () => {
  it('is the local calendar day, zero-padded', () => {
    expect(localToday(new Date(2027, 0, 5, 23, 59))).toBe('2027-01-05');
    expect(localToday(new Date(2026, 11, 31, 0, 0))).toBe('2026-12-31');
  });
});

describe('isOverdue (the rule of the deficiency page: past due and not accepted)', () => {
  const today = '2027-01-15';
  it('past due and open, reopened or corrected is overdue', () => {
    for (const state of ['open', 'reopened', 'corrected'] as const)
      expect(isOverdue({ state, dueDate: '2027-01-14' }, today)).toBe(true);
  });
  it('due today, due later, no due date or accepted is not', () => {
    expect(isOverdue({ state: 'open', dueDate: today }, today)).toBe(false);
    expect(isOverdue({ state: 'open', dueDate: '2027-01-16' }, today)).toBe(false);
    expect(isOverdue({ state: 'open', dueDate: null }, today)).toBe(false);
    expect(isOverdue({ state: 'accepted', dueDate: '2020-01-01' }, today)).toBe(false);
  });
  it('agrees with comparing the days as dates (derived)', () => {
    const day = fc
      .date({ min: new Date(2000, 0, 1), max: new Date(2099, 11, 31), noInvalidDate: true })
      .map((d) => localToday(d));
    fc.assert(
      fc.property(day, day, fc.constantFrom(...DEFICIENCY_STATES), (due, now, state) => {
        const before = new Date(`${due}T00:00`) < new Date(`${now}T00:00`);
        expect(isOverdue({ state, dueDate: due }, now)).toBe(before && state !== 'accepted');
      }),
    );
  });
});
