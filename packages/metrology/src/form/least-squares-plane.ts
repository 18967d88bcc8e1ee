import type { CentredPoints, Vector3 } from './point-cloud';
import { symmetricEigen3 } from './symmetric-eigen';

/** A plane n·p = offset with unit normal n. */
export interface Plane {
  normal: Vector3;
  offset: number;
}

/** Total-least-squares plane and the spread of the points about it. */
export interface LeastSquaresPlane extends Plane {
  /** Point the plane passes through: the centroid of the points. */
  centroid: Vector3;
  /** Range (max − min) of the signed orthogonal distances of the points to the plane. */
  range: number;
  /** Eigenvalues of the scatter matrix, ascending; the middle one is ~0 for collinear points. */
  scatter: [number, number, number];
}

/**
 * Total-least-squares (orthogonal regression) plane: it passes through the centroid and its
 * normal is the eigenvector of the smallest eigenvalue of the points' scatter matrix, which
 * minimises the sum of squared orthogonal distances (ISO 12781-2 least-squares reference plane;
 * Pearson 1901). The normal is oriented with a non-negative z component.
 */
export function leastSquaresPlane(points: CentredPoints): LeastSquaresPlane {
  const { x, y, z, count } = points;
  let sxx = 0;
  let sxy = 0;
  let sxz = 0;
  let syy = 0;
  let syz = 0;
  let szz = 0;
  for (let i = 0; i < count; i++) {
    const xi = x[i] as number;
    const yi = y[i] as number;
    const zi = z[i] as number;
    sxx += xi * xi;
    sxy += xi * yi;
    sxz += xi * zi;
    syy += yi * yi;
    syz += yi * zi;
    szz += zi * zi;
  }
  const eigen = symmetricEigen3([sxx, sxy, sxz, syy, syz, szz]);
  const normal = orientUp({ x: eigen.vectors[0][0], y: eigen.vectors[0][1], z: eigen.vectors[0][2] });
  let low = Infinity;
  let high = -Infinity;
  for (let i = 0; i < count; i++) {
    const d = normal.x * (x[i] as number) + normal.y * (y[i] as number) + normal.z * (z[i] as number);
    if (d < low) low = d;
    if (d > high) high = d;
  }
  const c = points.centroid;
  return {
    normal,
    offset: normal.x * c.x + normal.y * c.y + normal.z * c.z,
    centroid: { ...c },
    range: count === 0 ? 0 : high - low,
    scatter: eigen.values,
  };
}

/** Unit vector with z ≥ 0 (then y ≥ 0, then x ≥ 0 when the earlier components are zero). */
export function orientUp(v: Vector3): Vector3 {
  const len = Math.hypot(v.x, v.y, v.z);
  let s = 1 / len;
  if (v.z < 0 || (v.z === 0 && (v.y < 0 || (v.y === 0 && v.x < 0)))) s = -s;
  return { x: v.x * s, y: v.y * s, z: v.z * s };
}
