import { convexHull } from './convex-hull';
import { leastSquaresPlane, orientUp, type Plane } from './least-squares-plane';
import { minimumWidth } from './minimum-width';
import {
  centrePoints,
  checkFiniteArrays,
  toPointArrays,
  type CentredPoints,
  type Point3,
  type PointArrays,
  type Vector3,
} from './point-cloud';

/** The linearised (vertical) zone: two planes z = slopeX·x + slopeY·y + c, c from `low` to `high`. */
export interface VerticalZone {
  /** high − low: the zone's height measured along z. */
  zone: number;
  slopeX: number;
  slopeY: number;
  low: number;
  high: number;
}

/** Flatness of a point set. Lengths are in the caller's unit. */
export interface FlatnessResult {
  /**
   * ISO 12781 minimum zone: the smallest distance between two parallel planes that enclose every
   * point, measured along their normal, whatever the orientation of the points.
   */
  minimumZone: number;
  /** Range of orthogonal distances to the total-least-squares plane (never below `minimumZone`). */
  leastSquares: number;
  /** Unit normal of the minimum-zone planes, oriented with z ≥ 0. */
  normal: Vector3;
  /** The zone's planes are normal·p = lowOffset and normal·p = highOffset. */
  lowOffset: number;
  highOffset: number;
  /** Indexes (ascending) of the points on either plane of the minimum zone. */
  contacts: number[];
  lowContacts: number[];
  highContacts: number[];
  /** The total-least-squares plane (normal·p = offset) through the centroid. */
  leastSquaresPlane: Plane & { centroid: Vector3 };
  /**
   * The linearised zone measured along z (what fitting z = a·x + b·y + c by a minimax linear
   * program gives); null when the points admit only vertical planes (all on a vertical plane).
   */
  vertical: VerticalZone | null;
  /** Number of convex-hull vertices, for diagnostics. */
  hullVertices: number;
}

/**
 * Flatness of measured points by the exact minimum zone (ISO 12781-1 §3.3.3, minimum-zone
 * reference planes; ISO 1101 flatness tolerance zone) and by total least squares.
 * The minimum zone is the width of the point set: computed on its convex hull from the
 * face–vertex and edge–edge antipodal pairs (Houle & Toussaint 1988), so it is exact up to
 * floating point for any orientation, not only for near-level data.
 * Throws RangeError for fewer than 3 points, a non-finite coordinate, or points on one line.
 * All points on one plane give a zone of 0 with that plane's normal.
 */
export function flatness(points: readonly Point3[]): FlatnessResult {
  if (!Array.isArray(points)) throw new RangeError('flatness needs an array of points');
  if (points.length < 3) throw new RangeError(`flatness needs at least 3 points, got ${points.length}`);
  // The arrays are our own copy, so they may be centred in place.
  return flatnessOfCentred(centrePoints(toPointArrays(points), true));
}

/**
 * {@link flatness} for points held in coordinate arrays (no object per point, for large sets).
 * The arrays are not modified.
 */
export function flatnessOfArrays(points: PointArrays): FlatnessResult {
  checkFiniteArrays(points);
  const count = points.x.length;
  if (count < 3) throw new RangeError(`flatness needs at least 3 points, got ${count}`);
  return flatnessOfCentred(centrePoints(points));
}

function flatnessOfCentred(centred: CentredPoints): FlatnessResult {
  const count = centred.count;
  const ls = leastSquaresPlane(centred);
  const hull = convexHull(centred);
  if (hull.kind === 'collinear') {
    throw new RangeError('all points lie on one line (or coincide): flatness needs points spanning a plane');
  }

  let normal: Vector3;
  let verticalNormal: Vector3 | null;
  let hullVertices: number;
  if (hull.kind === 'planar') {
    // Coplanar within rounding: take whichever estimate of the plane fits the points more tightly.
    const fromHull = orientUp(hull.normal);
    const a = measure(centred, ls.normal);
    const b = measure(centred, fromHull);
    normal = b.high - b.low < a.high - a.low ? fromHull : ls.normal;
    verticalNormal = Math.abs(normal.z) > 1e-12 ? normal : null;
    hullVertices = 0;
  } else {
    const widths = minimumWidth(hull, centred);
    normal = orientUp({ x: widths.orthogonal.nx, y: widths.orthogonal.ny, z: widths.orthogonal.nz });
    const v = widths.vertical;
    verticalNormal = v === null ? null : orientUp({ x: v.nx, y: v.ny, z: v.nz });
    hullVertices = hull.vertices.length;
  }

  let zone = measure(centred, normal);
  // Any direction encloses the points; keep the least-squares one if rounding made it narrower.
  if (hull.kind === 'solid' && ls.range < zone.high - zone.low) {
    normal = ls.normal;
    zone = measure(centred, normal);
  }
  const planar = hull.kind === 'planar';
  const width = planar ? 0 : zone.high - zone.low;
  const scale = centred.extent.x + centred.extent.y + centred.extent.z;
  const tolerance = 1e-9 * width + 64 * Number.EPSILON * scale;
  const lowContacts: number[] = [];
  const highContacts: number[] = [];
  const contacts: number[] = [];
  for (let i = 0; i < count; i++) {
    const d =
      normal.x * (centred.x[i] as number) + normal.y * (centred.y[i] as number) + normal.z * (centred.z[i] as number);
    const onLow = planar || d - zone.low <= tolerance;
    const onHigh = planar || zone.high - d <= tolerance;
    if (onLow) lowContacts.push(i);
    if (onHigh) highContacts.push(i);
    if (onLow || onHigh) contacts.push(i);
  }

  const c = centred.centroid;
  const shift = normal.x * c.x + normal.y * c.y + normal.z * c.z;
  return {
    minimumZone: width,
    leastSquares: planar ? 0 : Math.max(ls.range, width),
    normal,
    lowOffset: zone.low + shift,
    highOffset: planar ? zone.low + shift : zone.high + shift,
    contacts,
    lowContacts,
    highContacts,
    leastSquaresPlane: { normal: ls.normal, offset: ls.offset, centroid: ls.centroid },
    vertical: verticalNormal === null ? null : verticalZone(centred, verticalNormal, planar),
    hullVertices,
  };
}

/** Smallest and largest n·p over the centred points. */
function measure(points: CentredPoints, n: Vector3): { low: number; high: number } {
  let low = Infinity;
  let high = -Infinity;
  const { x, y, z, count } = points;
  for (let i = 0; i < count; i++) {
    const d = n.x * (x[i] as number) + n.y * (y[i] as number) + n.z * (z[i] as number);
    if (d < low) low = d;
    if (d > high) high = d;
  }
  return { low, high };
}

/** Vertical zone for planes with normal n, i.e. z = a·x + b·y + c with a = −n_x/n_z, b = −n_y/n_z. */
function verticalZone(points: CentredPoints, n: Vector3, planar: boolean): VerticalZone {
  const a = -n.x / n.z;
  const b = -n.y / n.z;
  let low = Infinity;
  let high = -Infinity;
  const { x, y, z, count } = points;
  for (let i = 0; i < count; i++) {
    const r = (z[i] as number) - a * (x[i] as number) - b * (y[i] as number);
    if (r < low) low = r;
    if (r > high) high = r;
  }
  const c = points.centroid;
  const shift = c.z - a * c.x - b * c.y;
  if (planar) high = low;
  return { zone: high - low, slopeX: a, slopeY: b, low: low + shift, high: high + shift };
}
