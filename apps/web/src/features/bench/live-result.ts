import type { Spec, Verdict } from '@evenset/contracts';
import {
  combineUncertainty,
  decide,
  flatness,
  heightUncertaintyBudget,
  parallelism,
  runout,
  type Decision,
} from '@evenset/metrology';
import type { BenchStation } from './bench-stations';

/** Everything a live result is computed from; lengths in mm, temperatures °C, coefficients 1e-6/K. */
export interface LiveInput {
  spec: Spec;
  masterSize: number;
  masterExpandedUncertainty: number;
  masterCoverageFactor: number;
  masterExpansionPerK: number;
  masterReading: number;
  resolution: number;
  partTemperature: number;
  masterTemperature: number;
}

export interface LiveValue {
  value: number;
  decision: Decision | null;
}

export interface LiveResult {
  height: LiveValue | null;
  expandedUncertainty: number | null;
  flatness: LiveValue | null;
  parallelism: LiveValue | null;
  runout: LiveValue | null;
  verdict: Verdict | null;
}

const SEVERITY: Record<Verdict, number> = { conforms: 0, 'guard-band': 1, 'does-not-conform': 2 };
/** The server's thermal inputs (common practice: ±1 °C and ±1e-6/K, rectangular). */
const TEMPERATURE_U = 1 / Math.sqrt(3);
const EXPANSION_U = 1e-6 / Math.sqrt(3);

/**
 * The results so far, from the readings typed so far (mm), with the same metrology functions the
 * server uses; the server recomputes on save and its stored result is the record.
 */
export function liveResult(
  input: LiveInput,
  stations: readonly BenchStation[],
  readings: readonly number[],
): LiveResult {
  const { spec } = input;
  const def = spec.definition;
  const read = stations.slice(0, readings.length).map((s, i) => ({ ...s, reading: readings[i] ?? 0 }));
  const top = read.filter((s) => s.kind === 'top');
  const allTop = top.length === stations.filter((s) => s.kind === 'top').length;
  const rule = def.decisionRule;
  const formU = combineUncertainty([
    { name: 'resolution, high reading', value: input.resolution / 2, distribution: 'rectangular' },
    { name: 'resolution, low reading', value: input.resolution / 2, distribution: 'rectangular' },
  ]).expandedUncertainty;
  const formValue = (value: number, limit: number | null | undefined): LiveValue => ({
    value,
    decision: limit == null ? null : decide(value, { lower: -Infinity, upper: limit }, { rule, expanded: formU }),
  });

  let height: LiveValue | null = null;
  let expanded: number | null = null;
  const partReadings =
    def.heightStatistic === 'mean'
      ? top.map((s) => s.reading)
      : def.heightStatistic === 'highest'
        ? allTop
          ? [Math.max(...top.map((s) => s.reading))]
          : []
        : top.filter((s) => s.name === def.heightStation).map((s) => s.reading);
  if (partReadings.length > 0) {
    const budget = heightUncertaintyBudget({
      masterSize: input.masterSize,
      masterExpandedUncertainty: input.masterExpandedUncertainty,
      masterCoverageFactor: input.masterCoverageFactor,
      indicatorResolution: input.resolution,
      partReadings,
      masterReadings: [input.masterReading],
      partTemperature: input.partTemperature,
      masterTemperature: input.masterTemperature,
      partExpansion: (spec.frozenExpansion?.expansionPerK ?? spec.material.expansionPerK) * 1e-6,
      masterExpansion: input.masterExpansionPerK * 1e-6,
      temperatureUncertainty: TEMPERATURE_U,
      partExpansionUncertainty: EXPANSION_U,
      masterExpansionUncertainty: EXPANSION_U,
    });
    expanded = budget.uncertainty.expandedUncertainty;
    const band = { lower: def.nominal + def.band.lower, upper: def.nominal + def.band.upper };
    height = { value: budget.height.height, decision: decide(budget.height.height, band, { rule, expanded }) };
  }

  const points = top.map((s) => ({ x: s.x, y: s.y, z: s.reading }));
  const flat =
    def.flatness != null && allTop && points.length >= 3 ? formValue(flatness(points).minimumZone, def.flatness) : null;
  const datum = read.filter((s) => s.kind === 'datum').map((s) => ({ x: s.x, y: s.y, z: s.reading }));
  const datumDone = datum.length === stations.filter((s) => s.kind === 'datum').length;
  const par =
    def.parallelism != null && allTop && datumDone && points.length >= 3
      ? formValue(parallelism(points, datum.length ? datum : undefined).value, def.parallelism)
      : null;
  const circles = def.plan.runoutCircles.map((c) => ({
    expected: c.positions,
    readings: read.filter((s) => s.circle === c.name).map((s) => s.reading),
  }));
  const complete = circles.filter((c) => c.readings.length === c.expected && c.expected >= 3);
  const run =
    complete.length > 0
      ? formValue(Math.max(...complete.map((c) => runout(c.readings).circularRunout)), def.runout)
      : null;

  const decisions = [height, flat, par, run].flatMap((v) => (v?.decision ? [v.decision.verdict] : []));
  const verdict = decisions.length ? decisions.reduce((a, b) => (SEVERITY[b] > SEVERITY[a] ? b : a)) : null;
  return { height, expandedUncertainty: expanded, flatness: flat, parallelism: par, runout: run, verdict };
}
