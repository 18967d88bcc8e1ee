/**
 * Canonical JSON of the certificate's facts: object keys sorted by UTF-16 code units, no
 * whitespace, strings and numbers as JSON.stringify writes them (the same rules as RFC 8785 for
 * the values a certificate holds: strings, booleans, null, small integers). The bytes signed are
 * exactly the bytes stored.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value === 'boolean' || typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') {
    if (!Number.isSafeInteger(value)) throw new Error('Certificate facts hold integers only; lengths are strings.');
    return JSON.stringify(value);
  }
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  throw new Error(`Cannot write a ${typeof value} into certificate facts.`);
}
