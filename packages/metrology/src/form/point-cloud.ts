/** A measured point. Lengths in any single unit chosen by the caller. */
export interface Point3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

/** A direction or normal. */
export interface Vector3 {
  x: number;
  y: number;
  z: number;
}

/** Points held as three coordinate arrays, for large point sets (no object per point). */
export interface PointArrays {
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly z: Float64Array;
}

/** Point coordinates moved so that their mean is the origin, which keeps rounding errors small. */
export interface CentredPoints extends PointArrays {
  readonly count: number;
  readonly centroid: Vector3;
  /** Largest absolute centred coordinate per axis, used to scale tolerances. */
  readonly extent: Vector3;
}

/** Copies `{x,y,z}` objects into coordinate arrays, rejecting non-finite values with the point's index. */
export function toPointArrays(points: readonly Point3[], what = 'point'): PointArrays {
  const n = points.length;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const p = points[i];
    if (p === undefined || p === null || typeof p !== 'object') {
      throw new RangeError(`${what} ${i} is not a point with x, y and z`);
    }
    x[i] = p.x;
    y[i] = p.y;
    z[i] = p.z;
  }
  checkFiniteArrays({ x, y, z }, what);
  return { x, y, z };
}

/** Rejects arrays of unequal length and non-finite coordinates, naming the first bad point. */
export function checkFiniteArrays(points: PointArrays, what = 'point'): void {
  const { x, y, z } = points;
  if (x.length !== y.length || x.length !== z.length) {
    throw new RangeError(`coordinate arrays differ in length (${x.length}, ${y.length}, ${z.length})`);
  }
  for (let i = 0; i < x.length; i++) {
    // A NaN or ±Infinity makes this sum non-finite.
    if (!Number.isFinite((x[i] as number) + (y[i] as number) + (z[i] as number))) {
      const bad = !Number.isFinite(x[i] as number) ? 'x' : !Number.isFinite(y[i] as number) ? 'y' : 'z';
      throw new RangeError(`${what} ${i} has a non-finite ${bad} coordinate`);
    }
  }
}

/**
 * Returns the coordinates with their mean subtracted, in new arrays or, with `inPlace`, in the
 * given ones (saves memory on large sets). Means are taken in two passes (mean, then mean of
 * the remainders) so that data far from the origin lose no digits.
 */
export function centrePoints(points: PointArrays, inPlace = false): CentredPoints {
  const n = points.x.length;
  const centroid = { x: mean(points.x), y: mean(points.y), z: mean(points.z) };
  const x = inPlace ? points.x : new Float64Array(n);
  const y = inPlace ? points.y : new Float64Array(n);
  const z = inPlace ? points.z : new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = (points.x[i] as number) - centroid.x;
    y[i] = (points.y[i] as number) - centroid.y;
    z[i] = (points.z[i] as number) - centroid.z;
  }
  // Second pass: correct the centroid by the mean remainder.
  const cx = mean(x);
  const cy = mean(y);
  const cz = mean(z);
  let ex = 0;
  let ey = 0;
  let ez = 0;
  for (let i = 0; i < n; i++) {
    const xi = (x[i] as number) - cx;
    const yi = (y[i] as number) - cy;
    const zi = (z[i] as number) - cz;
    x[i] = xi;
    y[i] = yi;
    z[i] = zi;
    if (Math.abs(xi) > ex) ex = Math.abs(xi);
    if (Math.abs(yi) > ey) ey = Math.abs(yi);
    if (Math.abs(zi) > ez) ez = Math.abs(zi);
  }
  return {
    x,
    y,
    z,
    count: n,
    centroid: { x: centroid.x + cx, y: centroid.y + cy, z: centroid.z + cz },
    extent: { x: ex, y: ey, z: ez },
  };
}

function mean(values: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += values[i] as number;
  return values.length === 0 ? 0 : sum / values.length;
}
