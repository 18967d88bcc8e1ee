/** Checks that a list of heights is non-empty and finite, naming the first bad entry. */
export function checkHeights(heights: readonly number[], what: string): void {
  if (!Array.isArray(heights) || heights.length === 0) throw new RangeError(`${what} has no heights`);
  heights.forEach((h, i) => {
    if (typeof h !== 'number' || !Number.isFinite(h))
      throw new RangeError(`${what}: height ${i} is not a finite number (${String(h)})`);
  });
}

/** Checks a matching band: finite and not negative. */
export function checkBand(band: number): void {
  if (typeof band !== 'number' || !Number.isFinite(band) || band < 0) {
    throw new RangeError(`matching band must be a finite number >= 0, got ${String(band)}`);
  }
}

/**
 * Whether the heights from `low` to `high` fit in the band. Heights are stored rounded, so
 * differences such as 1.5003 − 1.5001 come out a few ulps above 0.0002; a tolerance of a few
 * ulps of the largest magnitude keeps those inside, far below any real measurement step.
 */
export function fitsBand(low: number, high: number, band: number): boolean {
  const scale = Math.max(Math.abs(low), Math.abs(high), band);
  return high - low <= band + 8 * Number.EPSILON * scale;
}

/** Spread of a matched set: highest − lowest height (brief: "a set's spread"). */
export function setSpread(heights: readonly number[]): number {
  checkHeights(heights, 'set');
  return Math.max(...heights) - Math.min(...heights);
}
