import type { MeasurementPlan } from '@evenset/contracts';
import { placedCircles } from '../specs/components/plan-drawing/plan-geometry';

/** One reading to take at the Bench, in the plan's order; runout positions are named `<circle>:<n>`. */
export interface BenchStation {
  name: string;
  kind: 'top' | 'datum' | 'runout';
  x: number;
  y: number;
  /** The runout circle, for runout positions. */
  circle?: string;
}

/** Every reading of the plan, in order: top face, datum face, then each runout circle round. */
export function benchStations(plan: MeasurementPlan): BenchStation[] {
  return [
    ...plan.stations.map((s) => ({ name: s.name, kind: 'top' as const, x: s.x, y: s.y })),
    ...plan.datumStations.map((s) => ({ name: s.name, kind: 'datum' as const, x: s.x, y: s.y })),
    ...placedCircles(plan.runoutCircles).flatMap((c) =>
      c.positions.map((p, k) => ({
        name: `${c.name}:${k + 1}`,
        kind: 'runout' as const,
        x: p.x,
        y: p.y,
        circle: c.name,
      })),
    ),
  ];
}
