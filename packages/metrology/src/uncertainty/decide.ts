/** The decision rule: simple acceptance, or guarded acceptance by the expanded uncertainty. */
export type DecisionRuleName = 'simple' | 'guarded';

/** A verdict. `guard-band` means the value is in the band but within U of a limit: not proven to conform. */
export type Verdict = 'conforms' | 'does-not-conform' | 'guard-band';

/** Tolerance band limits (either may be open by passing ±Infinity). */
export interface ToleranceBand {
  lower: number;
  upper: number;
}

/** Options of {@link decide}. */
export interface DecisionOptions {
  rule: DecisionRuleName;
  /** Expanded uncertainty U of the value (required and used by the guarded rule; k = 2 usually). */
  expanded?: number;
}

/** The outcome of a decision, with the zone that was applied. */
export interface Decision {
  verdict: Verdict;
  /** Which limit the value is near or beyond; null when it conforms. */
  side: 'low' | 'high' | null;
  rule: DecisionRuleName;
  /** Acceptance zone: the band for the simple rule, the band shrunk by U for the guarded rule. */
  acceptance: ToleranceBand;
  /** One line in plain words. */
  message: string;
}

/**
 * Conformance decision (ISO 14253-1:2017; ASME B89.7.3.1-2001).
 * Simple acceptance: conforms when lower ≤ value ≤ upper, otherwise does not conform.
 * Guarded acceptance: the acceptance zone is the band shrunk by U at each end; conforms when
 * lower + U ≤ value ≤ upper − U; outside the band does not conform; in between the value is in
 * the guard band (low or high side) and is never passed silently.
 * When 2U exceeds the band width the acceptance zone is empty and no value can conform.
 */
export function decide(value: number, band: ToleranceBand, options: DecisionOptions): Decision {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new RangeError(`value must be a finite number, got ${String(value)}`);
  const { lower, upper } = band;
  if (Number.isNaN(lower) || Number.isNaN(upper) || !(lower <= upper)) {
    throw new RangeError(`tolerance band needs lower <= upper, got ${lower} and ${upper}`);
  }
  const rule = options.rule;
  if (rule !== 'simple' && rule !== 'guarded') throw new RangeError(`unknown decision rule "${String(rule)}"`);
  let u = 0;
  if (rule === 'guarded') {
    u = options.expanded ?? Number.NaN;
    if (!(u >= 0) || !Number.isFinite(u))
      throw new RangeError(`the guarded rule needs the expanded uncertainty (>= 0), got ${String(options.expanded)}`);
  }
  const acceptance = { lower: lower + u, upper: upper - u };
  const make = (verdict: Verdict, side: 'low' | 'high' | null, message: string): Decision => ({
    verdict,
    side,
    rule,
    acceptance,
    message,
  });

  if (value < lower) return make('does-not-conform', 'low', 'below the lower limit: does not conform');
  if (value > upper) return make('does-not-conform', 'high', 'above the upper limit: does not conform');
  if (value >= acceptance.lower && value <= acceptance.upper)
    return make('conforms', null, 'inside the acceptance zone: conforms');
  // Inside the band but outside the (possibly empty) acceptance zone: report the nearer limit.
  const side = value - lower <= upper - value ? 'low' : 'high';
  return make(
    'guard-band',
    side,
    `within the expanded uncertainty of the ${side === 'low' ? 'lower' : 'upper'} limit: conformance not proven (guard band, ${side} side)`,
  );
}
