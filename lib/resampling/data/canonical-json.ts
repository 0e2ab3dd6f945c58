/**
 * Canonical JSON of request data, for the data hash: object keys sorted by UTF-16 code
 * units, no whitespace, numbers in JavaScript's shortest round-trip form — the rules of
 * RFC 8785 (JSON Canonicalization Scheme) — with non-finite numbers written as null
 * (JSON has no NaN). Two requests with the same data hash to the same value whatever the
 * order of their columns.
 *
 * Example: canonicalJson({ b: [1], a: [2.5, null] }) = '{"a":[2.5,null],"b":[1]}'.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || value === undefined) return 'null';
  if (typeof value === 'number') return Number.isFinite(value) ? JSON.stringify(value) : 'null';
  if (typeof value === 'string' || typeof value === 'boolean') return JSON.stringify(value);
  if (Array.isArray(value)) {
    // A column of plain values (the usual data): JSON.stringify writes each element exactly
    // as the loop below would (finite numbers in shortest round-trip form, NaN, ±Infinity,
    // null, undefined and holes as null, strings and booleans as JSON), in one native pass
    // instead of one string per element.
    if (allPlain(value)) return JSON.stringify(value);
    let out = '[';
    for (let i = 0; i < value.length; i++) out += (i ? ',' : '') + canonicalJson(value[i]);
    return `${out}]`;
  }
  const obj = value as Record<string, unknown>;
  const keys = Object.keys(obj).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(obj[k])}`).join(',')}}`;
}

function allPlain(values: unknown[]): boolean {
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== null && v !== undefined && typeof v !== 'number' && typeof v !== 'string' && typeof v !== 'boolean') return false;
  }
  return true;
}
