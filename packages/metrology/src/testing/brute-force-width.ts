import type { Point3 } from '../form/point-cloud';

/** Range of n·p over the points. */
function widthAlong(points: readonly Point3[], nx: number, ny: number, nz: number): number {
  const len = Math.hypot(nx, ny, nz);
  if (!(len > 1e-300)) return Infinity;
  let low = Infinity;
  let high = -Infinity;
  for (const p of points) {
    const d = (nx * p.x + ny * p.y + nz * p.z) / len;
    if (d < low) low = d;
    if (d > high) high = d;
  }
  return high - low;
}

/**
 * Independent reference for tests: the minimum width by trying every plane through three points
 * (face–vertex candidates) and every common normal of two point pairs (edge–edge candidates),
 * each measured over all points. The optimum is one of these candidates (Houle & Toussaint 1988),
 * and every candidate is a valid enclosing zone, so the minimum is exact. O(n⁵): small n only.
 */
export function bruteForceWidth(points: readonly Point3[]): number {
  const n = points.length;
  let best = Infinity;
  const pairs: [number, number][] = [];
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) pairs.push([i, j]);
  const d = (i: number, j: number): [number, number, number] => {
    const a = points[i] as Point3;
    const b = points[j] as Point3;
    return [b.x - a.x, b.y - a.y, b.z - a.z];
  };
  for (let p = 0; p < pairs.length; p++) {
    for (let q = p; q < pairs.length; q++) {
      const [a1, b1] = pairs[p] as [number, number];
      const [a2, b2] = pairs[q] as [number, number];
      const [ux, uy, uz] = d(a1, b1);
      const [vx, vy, vz] = d(a2, b2);
      const w = widthAlong(points, uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx);
      if (w < best) best = w;
    }
  }
  return best;
}

/** Independent reference: the vertical (linearised) zone by the same candidate normals, divided by |n_z|. */
export function bruteForceVerticalZone(points: readonly Point3[]): number {
  const n = points.length;
  let best = Infinity;
  for (let i = 0; i < n; i++)
    for (let j = i + 1; j < n; j++)
      for (let k = 0; k < n; k++)
        for (let l = k + 1; l < n; l++) {
          const a = points[i] as Point3;
          const b = points[j] as Point3;
          const c = points[k] as Point3;
          const e = points[l] as Point3;
          const ux = b.x - a.x;
          const uy = b.y - a.y;
          const uz = b.z - a.z;
          const vx = e.x - c.x;
          const vy = e.y - c.y;
          const vz = e.z - c.z;
          const nx = uy * vz - uz * vy;
          const ny = uz * vx - ux * vz;
          const nz = ux * vy - uy * vx;
          const len = Math.hypot(nx, ny, nz);
          if (!(Math.abs(nz) > 1e-9 * len)) continue;
          const w = (widthAlong(points, nx, ny, nz) * len) / Math.abs(nz);
          if (w < best) best = w;
        }
  return best;
}
