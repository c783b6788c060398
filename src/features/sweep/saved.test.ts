import { demoAssembly } from '@shared/checks/fixtures';
import { describe, expect, it } from 'vitest';
import { validateSweep } from './draft';
import { draftOf, staleText } from './saved';

const a = demoAssembly();

describe('a saved sweep on the page', () => {
  it('says in words when the assembly has changed since it ran, and nothing otherwise', () => {
    expect(staleText({ stale: true, assemblyRevision: 3, currentRevision: 5 })).toBe(
      'Stale — the assembly changed since (revision 3 → 5)',
    );
    expect(staleText({ stale: false, assemblyRevision: 5, currentRevision: 5 })).toBeNull();
  });

  it('its parameters come back in the form and plan the same sweep (a range, a list in inches, sealant classes)', () => {
    const parameters = [
      { kind: 'insulationThickness' as const, layer: 3, range: { start: 0.05, stop: 0.15, step: 0.025 } },
      { kind: 'clipSpacing' as const, list: [0.4064, 0.6096] },
    ];
    const drafts = parameters.map((p) => draftOf(a, p, 'IP'));
    expect(drafts[0]).toMatchObject({ mode: 'range', target: 3, start: 0.05, stop: 0.15, step: 0.025 });
    expect(drafts[1]).toMatchObject({ mode: 'list', list: '16 24' });
    const v = validateSweep(a, drafts, 'IP');
    expect(v.ok && v.plan.count).toBe(10);
    expect(v.ok && v.parameters[1]).toMatchObject({
      list: [expect.closeTo(0.4064, 9), expect.closeTo(0.6096, 9)],
    });
    expect(draftOf(a, { kind: 'sealantClass', list: ['25', '50'] }, 'SI')).toMatchObject({
      mode: 'list',
      target: null,
      classes: ['25', '50'],
    });
  });
});
