/**
 * Canonical JSON of a value: object keys sorted (by UTF-16 code units), no whitespace, `undefined`
 * members dropped as JSON.stringify drops them, numbers in JavaScript's shortest round-trip form. Two
 * values that are deep-equal as JSON give the same text whatever the key order a database handed back —
 * the text a check run's SHA-256 is computed over. Refuses NaN and ±Infinity (JSON cannot hold them).
 */
export function canonicalJson(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'number':
      if (!Number.isFinite(value)) throw new Error(`canonical JSON cannot hold ${value}`);
      return JSON.stringify(value);
    case 'string':
    case 'boolean':
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value))
        return `[${value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',')}]`;
      const entries = Object.entries(value as Record<string, unknown>)
        .filter(([, v]) => v !== undefined && typeof v !== 'function')
        .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
      return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
    }
    default:
      throw new Error(`canonical JSON cannot hold a ${typeof value}`);
  }
}
