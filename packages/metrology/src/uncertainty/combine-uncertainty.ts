import { studentTQuantile } from '../statistics/distributions';

/**
 * How a component's standard uncertainty is stated: directly, or as a value with a distribution.
 * - `rectangular`: value = half-width a, u = a/√3
 * - `triangular`: value = half-width a, u = a/√6
 * - `arcsine` (U-shaped): value = half-width a, u = a/√2
 * - `normal`: value = expanded uncertainty U with `coverageFactor` k (default 2), u = U/k
 * (JCGM 100:2008 §4.3.7, §4.3.9, §4.3.3.)
 */
export type UncertaintyDistribution = 'rectangular' | 'triangular' | 'arcsine' | 'normal';

interface ComponentBase {
  /** Name shown in the budget. */
  name: string;
  /** Sensitivity coefficient c = ∂y/∂x (default 1). Zero is allowed. */
  sensitivity?: number;
  /** Degrees of freedom of u (default Infinity: the uncertainty is known exactly). */
  degreesOfFreedom?: number;
}

/** A component given by its standard uncertainty. */
export interface StandardComponent extends ComponentBase {
  standardUncertainty: number;
}

/** A component given by a value and the distribution it stands for. */
export interface DistributedComponent extends ComponentBase {
  value: number;
  distribution: UncertaintyDistribution;
  /** Coverage factor of `value` for the `normal` distribution (default 2). */
  coverageFactor?: number;
}

/** One input of an uncertainty budget. */
export type UncertaintyComponent = StandardComponent | DistributedComponent;

/** A component after evaluation. */
export interface EvaluatedComponent {
  name: string;
  standardUncertainty: number;
  sensitivity: number;
  /** |c|·u, the component's contribution to u_c in the output unit. */
  contribution: number;
  degreesOfFreedom: number;
  /** (c·u)² / u_c²: its share of the combined variance (0 when u_c = 0). */
  varianceShare: number;
}

/** The result of combining a budget. */
export interface CombinedUncertainty {
  components: EvaluatedComponent[];
  /** u_c = √Σ(c_i·u_i)². */
  combinedStandardUncertainty: number;
  /** Welch–Satterthwaite ν_eff (Infinity when every contributing component has infinite dof). */
  effectiveDegreesOfFreedom: number;
  coverageFactor: number;
  /** U = k·u_c. */
  expandedUncertainty: number;
  /** Coverage probability used to find k, or null when k was given. */
  coverageProbability: number | null;
}

/** How to choose the coverage factor. */
export interface CoverageOptions {
  /**
   * A coverage factor k (default 2), or `{ probability }` to take k = t_p(ν_eff) from Student's
   * t distribution (JCGM 100:2008 G.4.1), ν_eff truncated to the next lower integer as GUM G.4.1
   * allows (the conservative choice), unless `truncate` is false.
   */
  coverage?: number | { probability: number; truncate?: boolean };
}

const DIVISORS: Readonly<Record<Exclude<UncertaintyDistribution, 'normal'>, number>> = {
  rectangular: Math.sqrt(3),
  triangular: Math.sqrt(6),
  arcsine: Math.SQRT2,
};

/** Standard uncertainty of one component from how it is stated (JCGM 100:2008 §4.3). */
export function standardUncertaintyOf(component: UncertaintyComponent): number {
  if ('standardUncertainty' in component) {
    const u = component.standardUncertainty;
    if (!(u >= 0) || !Number.isFinite(u))
      throw new RangeError(`"${component.name}": standard uncertainty must be finite and >= 0, got ${u}`);
    return u;
  }
  const { value, distribution } = component;
  if (!(value >= 0) || !Number.isFinite(value))
    throw new RangeError(`"${component.name}": value must be finite and >= 0, got ${value}`);
  if (distribution === 'normal') {
    const k = component.coverageFactor ?? 2;
    if (!(k > 0) || !Number.isFinite(k))
      throw new RangeError(`"${component.name}": coverage factor must be positive, got ${k}`);
    return value / k;
  }
  const divisor = DIVISORS[distribution];
  if (divisor === undefined)
    throw new RangeError(`"${component.name}": unknown distribution "${String(distribution)}"`);
  return value / divisor;
}

/**
 * Combines uncertainty components by the GUM law of propagation for uncorrelated inputs
 * (JCGM 100:2008 eq. 10): u_c² = Σ (c_i·u_i)², with the Welch–Satterthwaite effective degrees
 * of freedom ν_eff = u_c⁴ / Σ (c_i·u_i)⁴/ν_i (eq. G.2b). Components with infinite ν or zero
 * contribution add nothing to the denominator, so zero-sensitivity inputs are harmless.
 * Expanded uncertainty U = k·u_c with k = 2 by default, or k = t_p(ν_eff) for a coverage probability.
 */
export function combineUncertainty(
  components: readonly UncertaintyComponent[],
  options: CoverageOptions = {},
): CombinedUncertainty {
  if (!Array.isArray(components) || components.length === 0)
    throw new RangeError('an uncertainty budget needs at least one component');
  const evaluated = components.map((component, i) => {
    if (component === null || typeof component !== 'object') throw new RangeError(`component ${i} is not an object`);
    const name = typeof component.name === 'string' && component.name !== '' ? component.name : `component ${i}`;
    const u = standardUncertaintyOf({ ...component, name });
    const c = component.sensitivity ?? 1;
    if (!Number.isFinite(c)) throw new RangeError(`"${name}": sensitivity must be finite, got ${c}`);
    const nu = component.degreesOfFreedom ?? Infinity;
    if (!(nu > 0)) throw new RangeError(`"${name}": degrees of freedom must be positive (or Infinity), got ${nu}`);
    return {
      name,
      standardUncertainty: u,
      sensitivity: c,
      contribution: Math.abs(c * u),
      degreesOfFreedom: nu,
      varianceShare: 0,
    };
  });
  // Scale by the largest contribution so squares and fourth powers neither overflow nor underflow.
  const scale = Math.max(...evaluated.map((e) => e.contribution));
  let variance = 0;
  let wsDenominator = 0;
  for (const e of evaluated) {
    if (scale === 0) break;
    const r = e.contribution / scale;
    variance += r * r;
    if (e.degreesOfFreedom !== Infinity && r > 0) wsDenominator += (r * r * r * r) / e.degreesOfFreedom;
  }
  const uc = scale * Math.sqrt(variance);
  for (const e of evaluated) e.varianceShare = scale === 0 ? 0 : (e.contribution / scale) ** 2 / variance;
  const nuEff = wsDenominator > 0 ? (variance * variance) / wsDenominator : Infinity;

  let k: number;
  let probability: number | null = null;
  const coverage = options.coverage ?? 2;
  if (typeof coverage === 'number') {
    if (!(coverage > 0) || !Number.isFinite(coverage))
      throw new RangeError(`coverage factor must be positive, got ${coverage}`);
    k = coverage;
  } else {
    probability = coverage.probability;
    if (!(probability > 0 && probability < 1))
      throw new RangeError(`coverage probability must be between 0 and 1, got ${probability}`);
    const nu = coverage.truncate === false || nuEff === Infinity ? nuEff : Math.max(1, Math.floor(nuEff));
    k = studentTQuantile((1 + probability) / 2, nu);
  }
  return {
    components: evaluated,
    combinedStandardUncertainty: uc,
    effectiveDegreesOfFreedom: nuEff,
    coverageFactor: k,
    expandedUncertainty: k * uc,
    coverageProbability: probability,
  };
}
