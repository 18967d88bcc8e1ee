/** One field of an audited record: its value before and after the change, as text. */
export interface FieldChange {
  field: string;
  label: string;
  before: string | null;
  after: string | null;
  kind: 'added' | 'removed' | 'changed' | 'unchanged';
}

type Json = Record<string, unknown>;

const isPlainObject = (value: unknown): value is Json =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** Nested objects become dotted paths (`band.lower`), so every leaf compares on its own row. */
function flatten(record: Json | null, prefix = '', into = new Map<string, unknown>()): Map<string, unknown> {
  for (const [key, value] of Object.entries(record ?? {})) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (isPlainObject(value) && Object.keys(value).length) flatten(value, path, into);
    else into.set(path, value);
  }
  return into;
}

/** A value as a person reads it. */
export function formatValue(value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return value === '' ? '(empty)' : value;
  if (typeof value === 'number') return String(value);
  if (Array.isArray(value))
    return value.length
      ? value.every((v) => typeof v !== 'object' || v === null)
        ? value.map(formatValue).join(', ')
        : JSON.stringify(value)
      : '(none)';
  return JSON.stringify(value);
}

/** `nominalMm` → "Nominal mm", `band.lower` → "Band › lower". */
export function fieldLabel(path: string): string {
  return path
    .split('.')
    .map((part, index) => {
      const words = part.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
      return index === 0 ? words.charAt(0).toUpperCase() + words.slice(1) : words;
    })
    .join(' › ');
}

/**
 * Field-by-field comparison of an entry's before and after. Fields keep the order they first
 * appear in (before, then after); changed fields are marked so the eye finds them.
 */
export function diffRecords(before: Json | null, after: Json | null): FieldChange[] {
  const was = flatten(before);
  const now = flatten(after);
  const fields = [...new Set([...was.keys(), ...now.keys()])];
  return fields.map((field) => {
    const inBefore = was.has(field);
    const inAfter = now.has(field);
    const b = inBefore ? formatValue(was.get(field)) : null;
    const a = inAfter ? formatValue(now.get(field)) : null;
    const kind: FieldChange['kind'] =
      inBefore && inAfter ? (a === b ? 'unchanged' : 'changed') : inAfter ? 'added' : 'removed';
    return { field, label: fieldLabel(field), before: b, after: a, kind };
  });
}
