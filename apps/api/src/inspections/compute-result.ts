import {
  combineUncertainty,
  decide,
  flatness,
  heightUncertaintyBudget,
  parallelism,
  runout,
  totalRunout,
  type Decision,
  type ToleranceBand,
} from '@evenset/metrology';
import type { DecisionView, Verdict } from '@evenset/contracts';
import type { Spec } from '../specs/spec.entity';
import type { ComputedResult } from './inspection-result.entity';
import type { StationValue } from './measurement-plan';

/** Everything a result is computed from; lengths in mm, temperatures in °C, coefficients in 1e-6/K. */
export interface ComputationInput {
  spec: Spec;
  /** The readings in plan order, every station present. */
  values: StationValue[];
  masterSizeMm: number;
  masterExpandedUncertaintyMm: number;
  masterCoverageFactor: number;
  masterReadingMm: number;
  resolutionMm: number;
  partTemperatureC: number;
  masterTemperatureC: number;
  partExpansionPerK: number;
  masterExpansionPerK: number;
}

/** Standard uncertainty of a shop thermometer reading, °C (common practice: ±1 °C taken as rectangular). */
export const TEMPERATURE_UNCERTAINTY_C = 1 / Math.sqrt(3);

/**
 * Standard uncertainty of an expansion coefficient, 1/°C: ±1.0e-6/K rectangular, the figure ISO
 * 3650 and JCGM 100:2008 H.1 give for gauge steel, used for every material.
 */
export const EXPANSION_UNCERTAINTY = 1e-6 / Math.sqrt(3);

const SEVERITY: Record<Verdict, number> = { conforms: 0, 'guard-band': 1, 'does-not-conform': 2 };

/**
 * The server's computation of one inspection (all lengths mm):
 * - height by comparison with the master, corrected to 20 °C (metrology `comparatorHeight`, via
 *   its uncertainty budget), the part reading being the spec's statistic of the top stations;
 * - GUM budget (`heightUncertaintyBudget`): master U/k, resolution, thermal terms, and a Type A
 *   term from the top readings when the height is their mean (their spread includes the face's
 *   form, so it overstates repeatability rather than hiding it);
 * - flatness (minimum zone and least squares) when the spec limits it, parallelism to the plate
 *   or to the measured datum, circular and total runout per the plan's circles;
 * - a decision per characteristic by the spec's rule; form limits as upper-only bands.
 */
export function computeResult(input: ComputationInput): ComputedResult {
  const { spec, values } = input;
  const top = values.filter((v) => v.kind === 'top');
  const datum = values.filter((v) => v.kind === 'datum');
  const topReadings = top.map((v) => v.reading);

  const partReadings =
    spec.heightStatistic === 'mean'
      ? topReadings
      : spec.heightStatistic === 'highest'
        ? [Math.max(...topReadings)]
        : [top.find((v) => v.name === spec.heightStation)?.reading ?? Number.NaN];

  const budget = heightUncertaintyBudget({
    masterSize: input.masterSizeMm,
    masterExpandedUncertainty: input.masterExpandedUncertaintyMm,
    masterCoverageFactor: input.masterCoverageFactor,
    indicatorResolution: input.resolutionMm,
    partReadings,
    masterReadings: [input.masterReadingMm],
    partTemperature: input.partTemperatureC,
    masterTemperature: input.masterTemperatureC,
    partExpansion: input.partExpansionPerK * 1e-6,
    masterExpansion: input.masterExpansionPerK * 1e-6,
    temperatureUncertainty: TEMPERATURE_UNCERTAINTY_C,
    partExpansionUncertainty: EXPANSION_UNCERTAINTY,
    masterExpansionUncertainty: EXPANSION_UNCERTAINTY,
  });
  const height = budget.height.height;
  const expanded = budget.uncertainty.expandedUncertainty;
  const rule = spec.decisionRule;
  const heightDecision = decide(
    height,
    { lower: spec.nominalMm + spec.bandLowerMm, upper: spec.nominalMm + spec.bandUpperMm },
    { rule, expanded },
  );

  // A form value is the difference of two readings: its uncertainty is that of two resolution
  // steps (rectangular, JCGM 100:2008 F.2.2.1), expanded with k = 2.
  const formExpanded = combineUncertainty([
    { name: 'resolution, high reading', value: input.resolutionMm / 2, distribution: 'rectangular' },
    { name: 'resolution, low reading', value: input.resolutionMm / 2, distribution: 'rectangular' },
  ]).expandedUncertainty;
  const formDecision = (value: number, limit: number) =>
    view(decide(value, { lower: -Infinity, upper: limit }, { rule, expanded: formExpanded }));

  const points = top.map((v) => ({ x: v.x, y: v.y, z: v.reading }));
  let flatnessView: ComputedResult['flatness'] = null;
  let flatnessDecision: DecisionView | null = null;
  if (spec.flatnessMm != null && points.length >= 3) {
    const f = flatness(points);
    const { normal, lowOffset } = f;
    flatnessView = {
      minimumZone: f.minimumZone,
      leastSquares: f.leastSquares,
      contacts: f.contacts.map((i) => top[i]?.name ?? String(i)),
      deviations: top.map((v) => ({
        station: v.name,
        x: v.x,
        y: v.y,
        deviation: normal.x * v.x + normal.y * v.y + normal.z * v.reading - lowOffset,
      })),
    };
    flatnessDecision = formDecision(f.minimumZone, spec.flatnessMm);
  }

  let parallelismView: ComputedResult['parallelism'] = null;
  let parallelismDecision: DecisionView | null = null;
  if (spec.parallelismMm != null) {
    const datumPoints = datum.map((v) => ({ x: v.x, y: v.y, z: v.reading }));
    const p = parallelism(points, datumPoints.length ? datumPoints : undefined);
    parallelismView = { value: p.value, datum: p.datum.source };
    parallelismDecision = formDecision(p.value, spec.parallelismMm);
  }

  let runoutView: ComputedResult['runout'] = null;
  let runoutDecision: DecisionView | null = null;
  if (spec.plan.runoutCircles.length) {
    const circles = spec.plan.runoutCircles.map((c) => {
      const readings = values.filter((v) => v.kind === 'runout' && v.circle === c.name).map((v) => v.reading);
      const r = runout(readings);
      return {
        circle: c.name,
        readings,
        circularRunout: r.circularRunout,
        eccentricity: r.eccentricity,
        roundnessLeastSquares: r.roundnessLeastSquares,
        roundnessMinimumZone: r.roundnessMinimumZone,
      };
    });
    runoutView = {
      circles: circles.map(({ readings: _readings, ...c }) => c),
      total: totalRunout(circles.map((c) => c.readings)),
    };
    // The limit applies to every circle's runout: the largest decides.
    if (spec.runoutMm != null)
      runoutDecision = formDecision(Math.max(...circles.map((c) => c.circularRunout)), spec.runoutMm);
  }

  const decisions = {
    height: view(heightDecision),
    flatness: flatnessDecision,
    parallelism: parallelismDecision,
    runout: runoutDecision,
  };
  const verdict = [decisions.height, flatnessDecision, parallelismDecision, runoutDecision]
    .filter((d): d is DecisionView => d !== null)
    .map((d) => d.verdict)
    .reduce(worse, 'conforms');

  return {
    height,
    heightUncorrected: budget.height.uncorrected,
    combinedUncertainty: budget.uncertainty.combinedStandardUncertainty,
    expandedUncertainty: expanded,
    coverageFactor: budget.uncertainty.coverageFactor,
    budget: budget.uncertainty.components.map((c) => ({
      name: c.name,
      standardUncertainty: c.standardUncertainty,
      sensitivity: c.sensitivity,
      contribution: c.contribution,
    })),
    flatness: flatnessView,
    parallelism: parallelismView,
    runout: runoutView,
    decisions,
    verdict,
  };
}

function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

function view(decision: Decision): DecisionView {
  const acceptance: ToleranceBand = decision.acceptance;
  return {
    verdict: decision.verdict,
    side: decision.side,
    acceptance: { lower: finiteOrNull(acceptance.lower), upper: finiteOrNull(acceptance.upper) },
    message: decision.message,
  };
}

/** The more severe of two verdicts. */
function worse(a: Verdict, b: Verdict): Verdict {
  return SEVERITY[b] > SEVERITY[a] ? b : a;
}
