import type {
  TrendHistogramBin,
  TrendIndividuals,
  TrendLimits,
  TrendSignal,
  TrendSubgroup,
  TrendSubgroupChart,
} from '@evenset/contracts';
import { CHART_SUBGROUP_MAX, CHART_SUBGROUP_MIN, individuals, runRules, xbarR } from '@evenset/metrology';

/** A subgroup's values in chart order. */
export interface Group {
  label: string;
  serials: string[];
  heights: number[];
}

export const SIZE_RULE =
  'Every subgroup of an X-bar/R chart needs the same number of values. The chart uses the size that keeps the most values (ties go to the smaller size, which keeps more subgroups), at most 25: a subgroup with fewer values is left out, a larger one is charted with its first values in chart order.';

/**
 * The common subgroup size: the n (2 to 25) that maximises n × (subgroups holding at least n
 * values). Unequal subgroups would need limits per subgroup; one size keeps the standard constants.
 */
export function commonSize(sizes: readonly number[]): number | null {
  let best: { n: number; kept: number } | null = null;
  for (let n = CHART_SUBGROUP_MIN; n <= CHART_SUBGROUP_MAX; n++) {
    const groups = sizes.filter((s) => s >= n).length;
    if (groups < 2) continue;
    const kept = n * groups;
    if (!best || kept > best.kept) best = { n, kept };
  }
  return best?.n ?? null;
}

/** X-bar/R chart of the groups, with what was left out or trimmed to one size. */
export function subgroupChart(basis: TrendSubgroup, groups: readonly Group[]): TrendSubgroupChart {
  const size = commonSize(groups.map((g) => g.heights.length));
  const empty: TrendSubgroupChart = {
    basis,
    size: null,
    sizeRule: SIZE_RULE,
    subgroups: [],
    leftOut: [],
    trimmed: [],
    xbar: null,
    range: null,
    sigma: null,
    note: null,
  };
  if (size === null)
    return {
      ...empty,
      leftOut: groups.map((g) => ({
        label: g.label,
        count: g.heights.length,
        reason: 'fewer than 2 subgroups of 2 or more values',
      })),
      note:
        basis === 'set'
          ? 'An X-bar/R chart by set needs at least 2 sold sets of this part number within the filters.'
          : 'An X-bar/R chart by lot needs at least 2 lots with 2 or more measured parts within the filters.',
    };
  const used = groups.filter((g) => g.heights.length >= size);
  const chart = xbarR(used.map((g) => g.heights.slice(0, size)));
  return {
    ...empty,
    size,
    subgroups: used.map((g, i) => ({
      label: g.label,
      serials: g.serials.slice(0, size),
      mean: chart.means[i]!,
      range: chart.ranges[i]!,
    })),
    leftOut: groups
      .filter((g) => g.heights.length < size)
      .map((g) => ({ label: g.label, count: g.heights.length, reason: `fewer than ${size} values` })),
    trimmed: used.filter((g) => g.heights.length > size).map((g) => ({ label: g.label, count: g.heights.length })),
    xbar: chart.xbar,
    range: chart.range,
    sigma: chart.sigma,
  };
}

export function individualsChart(heights: readonly number[]): TrendIndividuals | null {
  if (heights.length < 2) return null;
  const chart = individuals(heights);
  return {
    movingRanges: chart.movingRanges,
    individuals: chart.individuals,
    movingRange: chart.movingRange,
    sigma: chart.sigma,
  };
}

/** How many successive points each rule looks at, and how far out (in σ) they must lie. */
const PATTERN: Readonly<Record<number, { length: number; beyond: number }>> = {
  1: { length: 1, beyond: 3 },
  2: { length: 3, beyond: 2 },
  3: { length: 5, beyond: 1 },
  4: { length: 8, beyond: 0 },
};

/**
 * Run-rule signals on a chart's plotted values, with the points that make each pattern. σ of the
 * plotted statistic is a third of the distance from the centre line to the upper control limit
 * (A2·R̄/3 for means, MR̄/d2 for individuals), as the limits themselves are centre ± 3σ.
 */
export function signalsOf(
  chart: TrendSignal['chart'],
  values: readonly number[],
  limits: TrendLimits,
  labels: readonly string[],
): TrendSignal[] {
  const sigma = (limits.upper - limits.centre) / 3;
  if (!(sigma > 0)) return [];
  return runRules(values, limits.centre, sigma).map((signal) => {
    const { length, beyond } = PATTERN[signal.rule]!;
    const sign = signal.side === 'high' ? 1 : -1;
    const indexes: number[] = [];
    for (let k = Math.max(0, signal.index - length + 1); k <= signal.index; k++)
      if ((sign * (values[k]! - limits.centre)) / sigma > beyond) indexes.push(k);
    return {
      chart,
      rule: signal.rule,
      side: signal.side,
      description: signal.description,
      index: signal.index,
      indexes,
      points: indexes.map((k) => labels[k]!),
    };
  });
}

/**
 * Histogram bins of equal width over the heights: Sturges' rule, ⌈log2 n⌉ + 1 bins (Sturges 1926;
 * common practice for small samples). Each bin holds from ≤ x < to, the last one also its upper edge.
 */
export function histogram(heights: readonly number[]): TrendHistogramBin[] {
  if (!heights.length) return [];
  const low = Math.min(...heights);
  const high = Math.max(...heights);
  const count = Math.ceil(Math.log2(heights.length)) + 1;
  // All alike: one bin a micrometre wide around the value.
  if (high - low < 1e-9) return [{ from: low - 0.0005, to: high + 0.0005, count: heights.length }];
  const width = (high - low) / count;
  const bins = Array.from({ length: count }, (_, i) => ({
    from: low + i * width,
    to: i === count - 1 ? high : low + (i + 1) * width,
    count: 0,
  }));
  for (const h of heights) bins[Math.min(count - 1, Math.floor((h - low) / width))]!.count += 1;
  return bins;
}
