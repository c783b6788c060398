import type { InspectionItem } from '@shared/inspections/schema';
import { describe, expect, it } from 'vitest';
import { alreadyAnswered, versionToSend } from './answer-item';

describe('the version a queued answer names', () => {
  it('is the version the person saw, carried past this device’s own answers sent since', () => {
    // item a: seen at 3; this device's first answer moved it 3 → 4, its second 4 → 5.
    const own = new Map([
      ['a:3', 4],
      ['a:4', 5],
    ]);
    expect(versionToSend('a', 3, own)).toBe(5);
    expect(versionToSend('a', 5, own)).toBe(5);
    // Another item's answers do not move it; a version someone else made is sent as seen (→ 409).
    expect(versionToSend('b', 3, own)).toBe(3);
    expect(versionToSend('a', 2, own)).toBe(2);
  });
});

describe('an answer the server already has', () => {
  const item = { state: 'fail', measured: 1.2, note: 'clip missing', location: 'grid B' } as InspectionItem;
  it('is recognised when the item says what the answer says (a repeat after a cut reply)', () => {
    expect(alreadyAnswered(item, { version: 1, state: 'fail', measured: 1.2, note: 'clip missing' })).toBe(
      true,
    );
    expect(alreadyAnswered(item, { version: 1, state: 'fail' })).toBe(true);
  });
  it('is not when someone else answered differently', () => {
    expect(alreadyAnswered(item, { version: 1, state: 'pass' })).toBe(false);
    expect(alreadyAnswered(item, { version: 1, state: 'fail', measured: 1.3 })).toBe(false);
    expect(alreadyAnswered(item, { version: 1, state: 'fail', note: 'other' })).toBe(false);
  });
});
