import { fUpperTail } from './distributions';

/** One-way analysis of variance. */
export interface OneWayAnova {
  groups: number;
  count: number;
  grandMean: number;
  betweenSumOfSquares: number;
  withinSumOfSquares: number;
  betweenDegreesOfFreedom: number;
  withinDegreesOfFreedom: number;
  betweenMeanSquare: number;
  withinMeanSquare: number;
  f: number;
  /** P(F > f) under the null hypothesis of equal group means. */
  pValue: number;
  /** √(within mean square). */
  residualStandardDeviation: number;
}

/**
 * One-way ANOVA (fixed effects): between- and within-group sums of squares about the grand
 * mean, F = MS_between / MS_within. Deviations are taken from the group means and the grand
 * mean (two-pass), which keeps the NIST StRD "SiRstv" data to about 12 significant digits.
 */
export function oneWayAnova(groups: readonly (readonly number[])[]): OneWayAnova {
  if (!Array.isArray(groups) || groups.length < 2) throw new RangeError('one-way ANOVA needs at least 2 groups');
  let count = 0;
  let total = 0;
  groups.forEach((g, i) => {
    if (!Array.isArray(g) || g.length < 1) throw new RangeError(`group ${i} has no values`);
    g.forEach((v, j) => {
      if (typeof v !== 'number' || !Number.isFinite(v))
        throw new RangeError(`group ${i}, value ${j} is not a finite number`);
      total += v;
    });
    count += g.length;
  });
  if (count <= groups.length) throw new RangeError('one-way ANOVA needs more values than groups');
  let grandMean = total / count;
  // Second pass refines the mean by the mean remainder.
  let remainder = 0;
  for (const g of groups) for (const v of g) remainder += v - grandMean;
  grandMean += remainder / count;
  let between = 0;
  let within = 0;
  for (const g of groups) {
    let s = 0;
    for (const v of g) s += v - grandMean;
    const offset = s / g.length; // group mean − grand mean
    between += g.length * offset * offset;
    for (const v of g) {
      const e = v - grandMean - offset;
      within += e * e;
    }
  }
  const dfBetween = groups.length - 1;
  const dfWithin = count - groups.length;
  const msBetween = between / dfBetween;
  const msWithin = within / dfWithin;
  const f = msBetween / msWithin;
  return {
    groups: groups.length,
    count,
    grandMean,
    betweenSumOfSquares: between,
    withinSumOfSquares: within,
    betweenDegreesOfFreedom: dfBetween,
    withinDegreesOfFreedom: dfWithin,
    betweenMeanSquare: msBetween,
    withinMeanSquare: msWithin,
    f,
    pValue: fUpperTail(f, dfBetween, dfWithin),
    residualStandardDeviation: Math.sqrt(msWithin),
  };
}
