// Public API of @evenset/metrology: pure functions, no I/O, usable on the server and in the browser.

export { LENGTH_UNITS, fromMillimetres, isLengthUnit, toMillimetres, type LengthUnit } from './units/length-units';
export {
  displayResolution,
  formatFixed,
  formatInchTrade,
  formatLength,
  type DisplayResolution,
  type FormatLengthOptions,
  type ResolutionLevel,
} from './units/format-length';

export type { Point3, PointArrays, Vector3 } from './form/point-cloud';
export { flatness, flatnessOfArrays, type FlatnessResult, type VerticalZone } from './form/flatness';
export { parallelism, type DatumPlane, type ParallelismResult } from './form/parallelism';
export type { Plane } from './form/least-squares-plane';

export { runout, totalRunout, type LimaconFit, type RunoutResult } from './runout/runout';

export {
  REFERENCE_TEMPERATURE,
  comparatorHeight,
  type ComparatorHeight,
  type ComparatorInput,
  type ComparatorSensitivities,
} from './comparison/comparator-height';

export {
  combineUncertainty,
  standardUncertaintyOf,
  type CombinedUncertainty,
  type CoverageOptions,
  type DistributedComponent,
  type EvaluatedComponent,
  type StandardComponent,
  type UncertaintyComponent,
  type UncertaintyDistribution,
} from './uncertainty/combine-uncertainty';
export {
  decide,
  type Decision,
  type DecisionOptions,
  type DecisionRuleName,
  type ToleranceBand,
  type Verdict,
} from './uncertainty/decide';
export { heightUncertaintyBudget, type HeightBudget, type HeightBudgetInput } from './uncertainty/height-budget';

export { fitsBand, setSpread } from './matching/set-spread';
export {
  interchangeWindow,
  interchangeWindowDetail,
  type HeightWindow,
  type InterchangeDetail,
} from './matching/interchange-window';
export { buildSets, type BuiltSets, type PartHeight } from './matching/build-sets';

export { grindPlan, stockToRemove, type GrindPass, type GrindPlan, type GrindPlanInput } from './grinding/grind-plan';

export {
  CHART_SUBGROUP_MAX,
  CHART_SUBGROUP_MIN,
  chartConstants,
  type ChartConstants,
} from './statistics/chart-constants';
export {
  individuals,
  xbarR,
  type ControlLimits,
  type IndividualsChart,
  type XbarRChart,
} from './statistics/control-charts';
export { capability, type Capability, type CapabilityOptions } from './statistics/capability';
export { runRules, type RunRule, type RunRuleSignal } from './statistics/run-rules';
export {
  gaugeRR,
  type AnovaRow,
  type GaugeRR,
  type GaugeRRInput,
  type VarianceComponents,
} from './statistics/gauge-rr';
export { oneWayAnova, type OneWayAnova } from './statistics/anova';
export {
  fUpperTail,
  normalCdf,
  normalQuantile,
  regularizedBeta,
  regularizedGamma,
  studentTCdf,
  studentTQuantile,
} from './statistics/distributions';
