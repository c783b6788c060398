import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { issueErrorMap, issueLines, issuesByPath, issueWords } from './issue-words';

const issuesOf = (schema: z.ZodType, value: unknown) => {
  const parsed = schema.safeParse(value);
  if (parsed.success) throw new Error('expected a refusal');
  return parsed.error.issues;
};

describe('zod issues in words (one wording for every screen)', () => {
  it('words missing numbers, ranges in the given unit, lists and choices', () => {
    const schema = z.object({
      thickness: z.number().min(0.001),
      count: z.number().int(),
      fraction: z.number().gt(0).max(1),
      layers: z.array(z.string()).min(1),
      side: z.enum(['in', 'out']),
      name: z.string().min(1),
    });
    const byPath = issuesByPath(
      issuesOf(schema, { thickness: 0, count: 1.5, fraction: 0, layers: [], side: 'up', name: '' }),
    );
    const words = (p: string) => issueWords(byPath.get(p) ?? {}, (si) => `${si * 1000}\u202fmm`);
    expect(words('thickness')).toBe('Must be at least 1\u202fmm.');
    expect(words('count')).toBe('Enter a whole number.');
    expect(words('fraction')).toBe('Must be more than 0.');
    expect(words('layers')).toBe('Add at least one.');
    expect(words('side')).toBe('Choose one of the listed options.');
    expect(words('name')).toBe('Enter a value.');
    expect(issueWords(issuesOf(z.number(), Number.NaN)[0]!)).toBe('Enter a number.');
    expect(issueWords(issuesOf(z.number().max(5), 6)[0]!)).toBe('Must be at most 5.');
  });

  it('keeps the branch of a union whose kind was meant', () => {
    const schema = z.union([
      z.object({ kind: z.literal('point'), chi: z.number().min(0) }),
      z.object({ kind: z.literal('linear'), psi: z.number().min(0), length: z.number().min(0) }),
    ]);
    const byPath = issuesByPath(issuesOf(schema, { kind: 'linear', psi: -1, length: -1 }), ['bridges', 0]);
    expect([...byPath.keys()]).toEqual(['bridges.0.psi', 'bridges.0.length']);
  });

  it('lists a whole refusal with the schema’s own reasons where no unit can word a range', () => {
    const schema = z.object({ span: z.number().min(0.1, 'span must be at least 0.1 m'), name: z.string() });
    expect(issueLines(issuesOf(schema, { span: 0, name: 3 }))).toEqual([
      'span: Span must be at least 0.1 m.',
      'name: Enter a value.',
    ]);
    expect(issueLines(issuesOf(z.number(), 'x'), 'assembly')).toEqual(['assembly: Enter a number.']);
  });

  it('as a form error map, leaves what it does not word to the schema', () => {
    const map = issueErrorMap(() => (si) => `${si} Pa`);
    const schema = z.object({ pressure: z.number().min(10), email: z.email('Enter an e-mail address') });
    const parsed = schema.safeParse({ pressure: 1, email: 'nope' }, { error: map });
    expect(parsed.success ? [] : parsed.error.issues.map((i) => i.message)).toEqual([
      'Must be at least 10 Pa.',
      'Enter an e-mail address',
    ]);
  });
});
