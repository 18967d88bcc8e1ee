import { flatness } from './flatness';
import { toPointArrays, type Point3, type Vector3 } from './point-cloud';

/** The datum plane normal·p = offset, with the material on the side the normal points to. */
export interface DatumPlane {
  normal: Vector3;
  offset: number;
  /** How the datum was obtained. */
  source: 'surface plate' | 'datum points';
  /** Largest distance of a datum point above the datum plane (0 for the surface plate). */
  datumZone: number;
  /** Indexes of the datum points touching the datum plane. */
  contacts: number[];
}

/** Parallelism of a top face to a datum. */
export interface ParallelismResult {
  /** Range of the top points' orthogonal distances to the datum plane: the zone parallel to the datum. */
  value: number;
  datum: DatumPlane;
  /** Signed orthogonal distance of each top point to the datum plane. */
  distances: number[];
  /** Indexes of the top points nearest to and farthest from the datum. */
  lowest: number;
  highest: number;
}

/**
 * Parallelism of the points of a face to a datum (ISO 1101 / ASME Y14.5: the zone between two
 * planes parallel to the datum that encloses the face; its width is the value).
 *
 * Without datum points the part rests on the surface plate: the datum is the plane z = 0 and
 * the value is the range of z.
 *
 * With datum points the datum plane is their constrained minimax plane (ISO 5459 "L∞ outside
 * the material"): a plane lying on or below every datum point (material above) that minimises
 * the largest orthogonal distance to them. For a normal n the best such plane touches the
 * lowest point, so its largest distance is the width of the points along n; minimising over n
 * gives the minimum-zone width, and the datum plane is the lower plane of the datum points'
 * minimum zone (computed exactly by {@link flatness}).
 */
export function parallelism(top: readonly Point3[], datum?: readonly Point3[]): ParallelismResult {
  if (!Array.isArray(top) || top.length < 1) throw new RangeError('parallelism needs at least 1 top point');
  const t = toPointArrays(top, 'top point');
  let plane: DatumPlane;
  if (datum === undefined || datum.length === 0) {
    plane = { normal: { x: 0, y: 0, z: 1 }, offset: 0, source: 'surface plate', datumZone: 0, contacts: [] };
  } else {
    if (datum.length < 3) throw new RangeError(`a measured datum needs at least 3 datum points, got ${datum.length}`);
    toPointArrays(datum, 'datum point');
    let zone;
    try {
      zone = flatness(datum);
    } catch (error) {
      if (error instanceof RangeError) throw new RangeError(`datum points: ${error.message}`);
      throw error;
    }
    if (zone.normal.z <= 0)
      throw new RangeError('datum points: their best plane is vertical, so no plane lies below them');
    plane = {
      normal: zone.normal,
      offset: zone.lowOffset,
      source: 'datum points',
      datumZone: zone.minimumZone,
      contacts: zone.lowContacts,
    };
  }
  const n = plane.normal;
  const distances: number[] = [];
  let lowest = 0;
  let highest = 0;
  for (let i = 0; i < top.length; i++) {
    const d = n.x * (t.x[i] as number) + n.y * (t.y[i] as number) + n.z * (t.z[i] as number) - plane.offset;
    distances.push(d);
    if (d < (distances[lowest] as number)) lowest = i;
    if (d > (distances[highest] as number)) highest = i;
  }
  return {
    value: (distances[highest] as number) - (distances[lowest] as number),
    datum: plane,
    distances,
    lowest,
    highest,
  };
}
