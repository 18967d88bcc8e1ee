/** The serials a pattern makes: prefix + number counted up from `start`, zero-padded to `digits`. */
export function serialsOf(prefix: string, start: number, count: number, digits: number): string[] {
  return Array.from(
    { length: count },
    (_, i) => `${prefix.trim().toUpperCase()}${String(start + i).padStart(digits, '0')}`,
  );
}

/** A short preview of a long list: the first few, an ellipsis and the last. */
export function serialPreviewText(serials: readonly string[]): string {
  if (serials.length <= 4) return serials.join(', ');
  return `${serials.slice(0, 3).join(', ')}, … ${serials.at(-1) ?? ''} (${serials.length} serials)`;
}
