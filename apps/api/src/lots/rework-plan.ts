import { grindPlan, stockToRemove, type GrindPass } from '@evenset/metrology';
import type { Spec } from '../specs/spec.entity';

/** What a rework asks of the grinder: from where, to where, how much, in which passes (mm). */
export interface ReworkPlan {
  currentHeightMm: number;
  targetHeightMm: number;
  stockMm: number;
  /** Null when the spec names no grinding parameters. */
  passes: GrindPass[] | null;
}

/**
 * Stock to remove and the pass plan from the spec's grinding parameters; shared by a rework
 * disposition and a grind-to-target request so both plan a grind the same way.
 */
export function reworkPlan(spec: Spec, currentHeightMm: number, targetHeightMm: number): ReworkPlan {
  const stockMm = stockToRemove(currentHeightMm, targetHeightMm);
  const passes =
    spec.roughDepthMm != null &&
    spec.finishAllowanceMm != null &&
    spec.finishDepthMm != null &&
    spec.sparkOutPasses != null
      ? grindPlan({
          stock: stockMm,
          roughDepth: spec.roughDepthMm,
          finishAllowance: spec.finishAllowanceMm,
          finishDepth: spec.finishDepthMm,
          sparkOutPasses: spec.sparkOutPasses,
        }).passes
      : null;
  return { currentHeightMm, targetHeightMm, stockMm, passes };
}
