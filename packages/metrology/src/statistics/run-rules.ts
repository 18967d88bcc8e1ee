/** Which classic run rule fired. */
export type RunRule = 1 | 2 | 3 | 4;

/** One run-rule signal. */
export interface RunRuleSignal {
  rule: RunRule;
  /** Index of the value that completes the pattern. */
  index: number;
  /** Side of the centre line. */
  side: 'high' | 'low';
  /** The rule in plain words. */
  description: string;
}

const DESCRIPTIONS: Readonly<Record<RunRule, string>> = {
  1: 'one point more than 3 sigma from the centre line',
  2: '2 of 3 points in a row more than 2 sigma from the centre line on the same side',
  3: '4 of 5 points in a row more than 1 sigma from the centre line on the same side',
  4: '8 points in a row on the same side of the centre line',
};

/**
 * The classic run rules (Western Electric Statistical Quality Control Handbook, 1956; listed in
 * the NIST/SEMATECH e-Handbook §6.3.2):
 *   1. one point beyond 3σ;  2. 2 of 3 successive points beyond 2σ on the same side;
 *   3. 4 of 5 successive points beyond 1σ on the same side;  4. 8 successive points on one side.
 * A signal is reported at the point that completes the pattern, when that point is itself one
 * of the points beyond the line (so a pattern is not reported again for later, ordinary points).
 * A point exactly on the centre line belongs to neither side.
 */
export function runRules(values: readonly number[], centre: number, sigma: number): RunRuleSignal[] {
  if (!Number.isFinite(centre)) throw new RangeError(`centre must be finite, got ${centre}`);
  if (!(sigma > 0) || !Number.isFinite(sigma)) throw new RangeError(`sigma must be positive, got ${sigma}`);
  const z = values.map((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v))
      throw new RangeError(`run rules: value ${i} is not a finite number (${String(v)})`);
    return (v - centre) / sigma;
  });
  const signals: RunRuleSignal[] = [];
  const add = (rule: RunRule, index: number, side: 'high' | 'low'): void => {
    signals.push({ rule, index, side, description: `${DESCRIPTIONS[rule]} (${side} side)` });
  };
  const countBeyond = (end: number, length: number, limit: number, sign: 1 | -1): number => {
    let count = 0;
    for (let k = Math.max(0, end - length + 1); k <= end; k++) if (sign * (z[k] as number) > limit) count++;
    return count;
  };
  for (let i = 0; i < z.length; i++) {
    const zi = z[i] as number;
    for (const sign of [1, -1] as const) {
      const side = sign === 1 ? 'high' : 'low';
      const s = sign * zi;
      if (s > 3) add(1, i, side);
      if (i >= 2 && s > 2 && countBeyond(i, 3, 2, sign) >= 2) add(2, i, side);
      if (i >= 4 && s > 1 && countBeyond(i, 5, 1, sign) >= 4) add(3, i, side);
      if (i >= 7 && s > 0 && countBeyond(i, 8, 0, sign) === 8) add(4, i, side);
    }
  }
  return signals;
}
