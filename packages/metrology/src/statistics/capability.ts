import { mean, sampleStandardDeviation } from 'simple-statistics';

/** Process capability indexes and the figures they come from. */
export interface Capability {
  count: number;
  mean: number;
  /** Standard deviation used: the sample standard deviation unless one was supplied. */
  sigma: number;
  lower: number;
  upper: number;
  /** (upper − lower) / 6σ */
  cp: number;
  /** (upper − mean) / 3σ */
  cpu: number;
  /** (mean − lower) / 3σ */
  cpl: number;
  /** min(cpu, cpl) */
  cpk: number;
}

/** Options of {@link capability}. */
export interface CapabilityOptions {
  /**
   * Standard deviation to use instead of the sample standard deviation, e.g. a within-subgroup
   * estimate R̄/d2 or MR̄/d2 from a control chart.
   */
  sigma?: number;
}

/**
 * Process capability against a two-sided tolerance (NIST/SEMATECH e-Handbook §6.1.6):
 * Cp = (USL − LSL)/(6σ), Cpu = (USL − μ)/(3σ), Cpl = (μ − LSL)/(3σ), Cpk = min(Cpu, Cpl),
 * with μ the mean of the values and σ their sample standard deviation (or the one supplied).
 */
export function capability(
  values: readonly number[],
  lower: number,
  upper: number,
  options: CapabilityOptions = {},
): Capability {
  if (!Array.isArray(values) || values.length < 2) throw new RangeError('capability needs at least 2 values');
  values.forEach((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v))
      throw new RangeError(`capability: value ${i} is not a finite number (${String(v)})`);
  });
  if (!Number.isFinite(lower) || !Number.isFinite(upper) || !(lower < upper)) {
    throw new RangeError(`capability needs finite limits with lower < upper, got ${lower} and ${upper}`);
  }
  const mu = mean(values as number[]);
  const sigma = options.sigma ?? sampleStandardDeviation(values as number[]);
  if (!(sigma > 0) || !Number.isFinite(sigma))
    throw new RangeError(`capability needs a positive standard deviation, got ${sigma}`);
  const cpu = (upper - mu) / (3 * sigma);
  const cpl = (mu - lower) / (3 * sigma);
  return {
    count: values.length,
    mean: mu,
    sigma,
    lower,
    upper,
    cp: (upper - lower) / (6 * sigma),
    cpu,
    cpl,
    cpk: Math.min(cpu, cpl),
  };
}
