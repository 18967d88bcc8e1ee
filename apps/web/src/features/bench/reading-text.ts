/** A typed indicator reading: a number (minus signs of any kind accepted), or a message saying what is wrong. */
export function parseReading(text: string): { value: number } | { error: string } {
  const trimmed = text.trim().replace(/[−–]/g, '-').replace(',', '.');
  if (trimmed === '') return { error: 'Type the indicator reading first.' };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(trimmed))
    return { error: `“${text.trim()}” is not a number. Type the reading as shown on the indicator, e.g. -0.0012.` };
  return { value: Number(trimmed) };
}

/**
 * The typo guard: a reading more than `bandWidths` band widths away from the reading expected
 * (all in the reading's unit) is probably mistyped and is asked about before it is taken.
 */
export function isFarFromExpected(value: number, expected: number, bandWidth: number, bandWidths = 4): boolean {
  return Math.abs(value - expected) > bandWidths * bandWidth;
}
