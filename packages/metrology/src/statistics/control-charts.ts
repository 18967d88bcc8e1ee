import { mean } from 'simple-statistics';
import { chartConstants, type ChartConstants } from './chart-constants';

/** Centre line and control limits of one chart. */
export interface ControlLimits {
  centre: number;
  lower: number;
  upper: number;
}

/** X-bar and R chart of subgroups. */
export interface XbarRChart {
  subgroupSize: number;
  constants: ChartConstants;
  /** Mean of each subgroup, in order. */
  means: number[];
  /** Range of each subgroup, in order. */
  ranges: number[];
  grandMean: number;
  meanRange: number;
  /** Within-subgroup standard deviation estimate R̄/d2. */
  sigma: number;
  xbar: ControlLimits;
  range: ControlLimits;
}

/** Individuals and moving-range (I-MR) chart. */
export interface IndividualsChart {
  values: number[];
  /** |x_i − x_{i−1}| for i ≥ 1 (one fewer than the values). */
  movingRanges: number[];
  mean: number;
  meanMovingRange: number;
  /** Short-term standard deviation estimate MR̄/d2(2). */
  sigma: number;
  individuals: ControlLimits;
  movingRange: ControlLimits;
}

function checkValues(values: readonly number[], what: string): void {
  values.forEach((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v))
      throw new RangeError(`${what}: value ${i} is not a finite number (${String(v)})`);
  });
}

/**
 * X-bar and R control chart (Shewhart; ASTM E2587; NIST/SEMATECH e-Handbook §6.3.2.1):
 * centre lines x̿ and R̄; x-bar limits x̿ ± A2·R̄; range limits D3·R̄ and D4·R̄.
 * All subgroups must have the same size, from 2 to 25.
 */
export function xbarR(subgroups: readonly (readonly number[])[]): XbarRChart {
  if (!Array.isArray(subgroups) || subgroups.length < 2)
    throw new RangeError('an X-bar/R chart needs at least 2 subgroups');
  const size = (subgroups[0] as readonly number[]).length;
  subgroups.forEach((g, i) => {
    if (!Array.isArray(g) || g.length !== size) {
      throw new RangeError(`subgroup ${i} has ${Array.isArray(g) ? g.length : 0} values; every subgroup needs ${size}`);
    }
    checkValues(g, `subgroup ${i}`);
  });
  const constants = chartConstants(size);
  const means = subgroups.map((g) => mean(g as number[]));
  const ranges = subgroups.map((g) => Math.max(...g) - Math.min(...g));
  const grandMean = mean(means);
  const meanRange = mean(ranges);
  return {
    subgroupSize: size,
    constants,
    means,
    ranges,
    grandMean,
    meanRange,
    sigma: meanRange / constants.d2,
    xbar: {
      centre: grandMean,
      lower: grandMean - constants.A2 * meanRange,
      upper: grandMean + constants.A2 * meanRange,
    },
    range: { centre: meanRange, lower: constants.D3 * meanRange, upper: constants.D4 * meanRange },
  };
}

/**
 * Individuals and moving-range chart (NIST/SEMATECH e-Handbook §6.3.2.2): moving ranges of two
 * successive values; individuals limits x̄ ± 3·MR̄/d2 with d2 for n = 2; moving-range upper
 * limit D4(2)·MR̄, lower limit 0.
 */
export function individuals(values: readonly number[]): IndividualsChart {
  if (!Array.isArray(values) || values.length < 2) throw new RangeError('an individuals chart needs at least 2 values');
  checkValues(values, 'individuals');
  const movingRanges: number[] = [];
  for (let i = 1; i < values.length; i++)
    movingRanges.push(Math.abs((values[i] as number) - (values[i - 1] as number)));
  const constants = chartConstants(2);
  const centre = mean(values as number[]);
  const meanMovingRange = mean(movingRanges);
  const sigma = meanMovingRange / constants.d2;
  return {
    values: [...values],
    movingRanges,
    mean: centre,
    meanMovingRange,
    sigma,
    individuals: { centre, lower: centre - 3 * sigma, upper: centre + 3 * sigma },
    movingRange: {
      centre: meanMovingRange,
      lower: constants.D3 * meanMovingRange,
      upper: constants.D4 * meanMovingRange,
    },
  };
}
