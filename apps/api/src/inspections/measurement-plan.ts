import type { ApiErrorDetail, MeasurementPlan } from '@evenset/contracts';

export type StationKind = 'top' | 'datum' | 'runout';

/** One place a reading is taken, in the plan's order. */
export interface PlanStation {
  name: string;
  kind: StationKind;
  x: number;
  y: number;
  /** Runout positions only. */
  circle?: string;
}

/** The name of position n (1-based) of a runout circle, e.g. `R1:3`. */
export function runoutStationName(circle: string, position: number): string {
  return `${circle}:${position}`;
}

/** Every station of a plan in reading order: top face, datum face, then each circle's positions. */
export function planStations(plan: MeasurementPlan): PlanStation[] {
  return [
    ...plan.stations.map((s) => ({ ...s, kind: 'top' as const })),
    ...plan.datumStations.map((s) => ({ ...s, kind: 'datum' as const })),
    ...plan.runoutCircles.flatMap((c) =>
      Array.from({ length: c.positions }, (_, i) => ({
        name: runoutStationName(c.name, i + 1),
        kind: 'runout' as const,
        x: 0,
        y: 0,
        circle: c.name,
      })),
    ),
  ];
}

/** A station with its reading (mm). */
export type StationValue = PlanStation & { reading: number };

/**
 * Matches readings to the plan: every station exactly once, no unknown station, finite values.
 * Returns the readings in plan order, or the problems, each naming its station.
 */
export function matchReadings(
  stations: PlanStation[],
  readings: { station: string; reading: number }[],
  path = 'readings',
): { values: StationValue[]; problems: ApiErrorDetail[] } {
  const byName = new Map(stations.map((s) => [s.name, s]));
  const seen = new Map<string, number>();
  const problems: ApiErrorDetail[] = [];
  readings.forEach(({ station, reading }, index) => {
    if (!byName.has(station))
      problems.push({ path: `${path}.${index}.station`, message: `There is no station "${station}" in the plan.` });
    else if (seen.has(station))
      problems.push({ path: `${path}.${index}.station`, message: `Station ${station} has more than one reading.` });
    else if (!Number.isFinite(reading))
      problems.push({
        path: `${path}.${index}.reading`,
        message: `The reading at station ${station} is not a number.`,
      });
    else seen.set(station, reading);
  });
  const missing = stations.filter((s) => !seen.has(s.name)).map((s) => s.name);
  if (missing.length)
    problems.push({
      path,
      message: `Readings are missing for station${missing.length > 1 ? 's' : ''} ${missing.join(', ')}.`,
    });
  const values = stations.flatMap((s) => {
    const reading = seen.get(s.name);
    return reading === undefined ? [] : [{ ...s, reading }];
  });
  return { values, problems };
}
