import type { SweepVariantResult } from '@shared/sweep/schema';

/*
 * Variants as they cross from a worker to the page: every number in one Float64Array (moved, not copied) and
 * each string once per chunk. Structured cloning 10 000 variants of a dozen checks each (≈ 200 000 small
 * objects) cost the page more than building them again from numbers (D-032).
 */

export interface PackedVariants {
  /** Check ids and labels, statuses, verdicts and string values, each once; the numbers point into it. */
  strings: string[];
  numbers: Float64Array;
}

type Check = SweepVariantResult['checks'][number];

/**
 * Variants → numbers and strings. Per variant: index, verdict, value count, each value (0 and the number, or 1
 * and a string), 1 and the governing check with its label or 0, check count, each check (id, status, then
 * margin and margin ratio, each 0 and the number or 1 and 0 for null).
 */
export function packVariants(variants: readonly SweepVariantResult[]): PackedVariants {
  const strings: string[] = [];
  const codes = new Map<string, number>();
  const code = (s: string) => {
    let c = codes.get(s);
    if (c === undefined) {
      c = strings.length;
      strings.push(s);
      codes.set(s, c);
    }
    return c;
  };
  const out: number[] = [];
  const nullable = (x: number | null) => (x === null ? out.push(1, 0) : out.push(0, x));
  const check = (c: Check) => {
    out.push(code(c.id), code(c.status));
    nullable(c.margin);
    nullable(c.marginRatio);
  };
  for (const v of variants) {
    out.push(v.index, code(v.verdict), v.values.length);
    for (const x of v.values) typeof x === 'number' ? out.push(0, x) : out.push(1, code(x));
    if (v.governing) {
      out.push(1);
      check(v.governing);
      out.push(code(v.governing.label));
    } else out.push(0);
    out.push(v.checks.length);
    for (const c of v.checks) check(c);
  }
  return { strings, numbers: Float64Array.from(out) };
}

/** Numbers and strings → the variants `packVariants` was given (equal, key for key). */
export function unpackVariants({ strings, numbers }: PackedVariants): SweepVariantResult[] {
  let at = 0;
  const next = () => numbers[at++]!;
  const text = () => strings[next()]!;
  const nullable = () => {
    const isNull = next() === 1;
    const x = next();
    return isNull ? null : x;
  };
  const check = (): Check => ({
    id: text(),
    status: text() as Check['status'],
    margin: nullable(),
    marginRatio: nullable(),
  });
  const variants: SweepVariantResult[] = [];
  while (at < numbers.length) {
    const index = next();
    const verdict = text() as SweepVariantResult['verdict'];
    const values = Array.from({ length: next() }, () => (next() === 0 ? next() : text()));
    const governing = next() === 1 ? { ...check(), label: text() } : null;
    const checks = Array.from({ length: next() }, check);
    variants.push({ index, values, verdict, governing, checks });
  }
  return variants;
}
