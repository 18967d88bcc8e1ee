import type { SpecChange } from '@evenset/contracts';

type Flat = Map<string, unknown>;

/**
 * Flattens a definition to dotted paths. Lists of named items (stations, circles) are keyed by
 * name, so a moved station reads `plan.stations.C.x`, and the list itself is listed by its names
 * in order, so an added, removed or reordered station shows too.
 */
export function flatten(value: unknown, prefix = '', into: Flat = new Map()): Flat {
  if (Array.isArray(value) && value.every(isNamed)) {
    into.set(prefix, value.map((item) => item.name).join(', '));
    for (const { name, ...rest } of value) flatten(rest, `${prefix}.${name}`, into);
  } else if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [key, inner] of Object.entries(value)) flatten(inner, prefix ? `${prefix}.${key}` : key, into);
  } else {
    into.set(prefix, value ?? null);
  }
  return into;
}

/** What changed, field by field, from `before` to `after` (objects of the same kind). */
export function compareFields(before: object, after: object): SpecChange[] {
  const from = flatten(before);
  const to = flatten(after);
  const fields = [...new Set([...from.keys(), ...to.keys()])];
  return fields
    .filter((field) => !sameValue(from.get(field), to.get(field)))
    .map((field) => ({ field, before: from.get(field) ?? null, after: to.get(field) ?? null }));
}

function isNamed(item: unknown): item is { name: string } {
  return typeof item === 'object' && item !== null && typeof (item as { name?: unknown }).name === 'string';
}

function sameValue(a: unknown, b: unknown): boolean {
  return (a ?? null) === (b ?? null) || JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}
