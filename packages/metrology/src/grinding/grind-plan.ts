/** Inputs of a surface-grinding plan. Lengths in one unit. */
export interface GrindPlanInput {
  /** Total stock to remove (current height − target height). */
  stock: number;
  /** Down-feed per roughing pass. */
  roughDepth: number;
  /** Stock left for finishing. */
  finishAllowance: number;
  /** Down-feed per finishing pass. */
  finishDepth: number;
  /** Passes with no down-feed at the end, to let the wheel spark out. */
  sparkOutPasses: number;
}

/** One pass of the wheel. */
export interface GrindPass {
  /** 1-based pass number. */
  pass: number;
  kind: 'rough' | 'finish' | 'spark-out';
  /** Down-feed of this pass (0 for spark-out). */
  depth: number;
  /** Stock still to remove after this pass. */
  remaining: number;
}

/** A grinding plan: the passes and their counts. */
export interface GrindPlan {
  passes: GrindPass[];
  roughPasses: number;
  finishPasses: number;
  sparkOutPasses: number;
  /** Stock taken by roughing and by finishing. */
  roughStock: number;
  finishStock: number;
}

/** Digits kept when cleaning sums and differences of decimal inputs (well above any grinding step). */
const SIGNIFICANT = 12;

/** Removes binary noise from a difference or product of decimal inputs of magnitude `scale`. */
function clean(value: number, scale: number): number {
  if (value === 0 || scale === 0) return value;
  const decimals = Math.min(100, Math.max(0, SIGNIFICANT - 1 - Math.floor(Math.log10(Math.abs(scale)))));
  return Number(value.toFixed(decimals));
}

/**
 * Stock to remove to bring a part from its current height to a target height, cleaned of binary
 * noise (0.650 − 0.648 is 0.002, not 0.0020000000000000018).
 */
export function stockToRemove(currentHeight: number, targetHeight: number): number {
  if (!Number.isFinite(currentHeight) || !Number.isFinite(targetHeight))
    throw new RangeError('heights must be finite numbers');
  if (targetHeight > currentHeight)
    throw new RangeError(
      `target height ${targetHeight} is above the current height ${currentHeight}: nothing can be ground off`,
    );
  return clean(currentHeight - targetHeight, Math.max(Math.abs(currentHeight), Math.abs(targetHeight)));
}

/** Number of passes of `depth` needed for `stock`: a whole quotient within rounding counts exactly. */
function passesFor(stock: number, depth: number): number {
  if (stock <= 0) return 0;
  const q = stock / depth;
  const whole = Math.round(q);
  // 0.009/0.001 = 8.999999999999998 must be 9 passes and 0.001/0.0002 = 5.000000000000001 must be 5.
  if (Math.abs(q - whole) <= 1e-9 * Math.max(1, q)) return whole;
  return Math.ceil(q);
}

/**
 * Surface-grinding passes (common practice): roughing passes at the rough down-feed until only
 * the finish allowance is left, finishing passes at the finish down-feed, then spark-out
 * passes with no down-feed. Each stage takes full passes; when its stock is not a whole
 * number of passes the last pass of that stage is lighter, never deeper.
 * Example (common practice): 0.010 in stock, 0.001 in roughing, 0.001 in allowance at
 * 0.0002 in per pass: 9 roughing and 5 finishing passes.
 * Counts tolerate binary rounding of decimal inputs (0.009/0.001 is 9 passes, not 10).
 */
export function grindPlan(input: GrindPlanInput): GrindPlan {
  const { stock, roughDepth, finishAllowance, finishDepth, sparkOutPasses } = input;
  if (!Number.isFinite(stock) || stock < 0)
    throw new RangeError(`stock must be a finite number >= 0, got ${String(stock)}`);
  if (!(roughDepth > 0) || !Number.isFinite(roughDepth))
    throw new RangeError(`rough depth must be positive, got ${String(roughDepth)}`);
  if (!(finishDepth > 0) || !Number.isFinite(finishDepth))
    throw new RangeError(`finish depth must be positive, got ${String(finishDepth)}`);
  if (!Number.isFinite(finishAllowance) || finishAllowance < 0)
    throw new RangeError(`finish allowance must be >= 0, got ${String(finishAllowance)}`);
  if (!Number.isInteger(sparkOutPasses) || sparkOutPasses < 0)
    throw new RangeError(`spark-out passes must be a whole number >= 0, got ${String(sparkOutPasses)}`);

  const scale = Math.max(stock, roughDepth, finishAllowance, finishDepth);
  const finishStock = Math.min(stock, finishAllowance);
  const roughStock = clean(stock - finishStock, scale);
  const roughPasses = passesFor(roughStock, roughDepth);
  const finishPasses = passesFor(finishStock, finishDepth);
  const passes: GrindPass[] = [];
  const stage = (kind: 'rough' | 'finish', stageStock: number, depth: number, count: number, after: number): void => {
    for (let i = 1; i <= count; i++) {
      // Depth from whole-pass arithmetic, not a running subtraction, so errors do not accumulate.
      const done = i === count ? stageStock : Math.min(stageStock, i * depth);
      const before = i === 1 ? 0 : Math.min(stageStock, (i - 1) * depth);
      passes.push({
        pass: passes.length + 1,
        kind,
        depth: clean(done - before, scale),
        remaining: clean(stageStock - done + after, scale),
      });
    }
  };
  stage('rough', roughStock, roughDepth, roughPasses, finishStock);
  stage('finish', finishStock, finishDepth, finishPasses, 0);
  for (let i = 0; i < sparkOutPasses; i++)
    passes.push({ pass: passes.length + 1, kind: 'spark-out', depth: 0, remaining: 0 });
  return { passes, roughPasses, finishPasses, sparkOutPasses, roughStock, finishStock: clean(finishStock, scale) };
}
