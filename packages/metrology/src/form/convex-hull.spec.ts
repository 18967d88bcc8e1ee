import fc from 'fast-check';
import { rotate } from '../testing/seeded-random';
import { convexHull, type ConvexHull } from './convex-hull';
import { orientation } from './orientation';
import { centrePoints, type PointArrays } from './point-cloud';

function arrays(points: readonly { x: number; y: number; z: number }[]): PointArrays {
  return centrePoints({
    x: Float64Array.from(points, (p) => p.x),
    y: Float64Array.from(points, (p) => p.y),
    z: Float64Array.from(points, (p) => p.z),
  });
}

/** Exact check that no point lies strictly outside any hull triangle. */
function everyPointInside(hull: ConvexHull, p: PointArrays): boolean {
  for (let f = 0; f < hull.offsets.length; f++) {
    const a = hull.triangles[3 * f] as number;
    const b = hull.triangles[3 * f + 1] as number;
    const c = hull.triangles[3 * f + 2] as number;
    for (let i = 0; i < p.x.length; i++) {
      const s = orientation(
        p.x[a]!,
        p.y[a]!,
        p.z[a]!,
        p.x[b]!,
        p.y[b]!,
        p.z[b]!,
        p.x[c]!,
        p.y[c]!,
        p.z[c]!,
        p.x[i]!,
        p.y[i]!,
        p.z[i]!,
      );
      if (s > 0) return false;
    }
  }
  return true;
}

/** Closed triangulated surface: every directed edge once, its reverse once, and F = 2V − 4 (Euler). */
function closedSurface(hull: ConvexHull): boolean {
  const directed = new Set<string>();
  const t = hull.triangles;
  for (let f = 0; f < hull.offsets.length; f++) {
    for (let k = 0; k < 3; k++) {
      const key = `${t[3 * f + k]},${t[3 * f + ((k + 1) % 3)]}`;
      if (directed.has(key)) return false;
      directed.add(key);
    }
  }
  for (const key of directed) {
    const [a, b] = key.split(',');
    if (!directed.has(`${b},${a}`)) return false;
  }
  return hull.offsets.length === 2 * hull.vertices.length - 4;
}

describe('convexHull', () => {
  const lattice = fc.record({
    x: fc.integer({ min: 0, max: 3 }),
    y: fc.integer({ min: 0, max: 3 }),
    z: fc.integer({ min: 0, max: 2 }),
  });
  const scattered = fc.record({
    x: fc.double({ min: -5, max: 5, noNaN: true }),
    y: fc.double({ min: -5, max: 5, noNaN: true }),
    z: fc.double({ min: -1e-3, max: 1e-3, noNaN: true }),
  });
  const quaternion = fc
    .tuple(
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
    )
    .filter((q) => Math.hypot(...q) > 0.1);

  // Definition of the convex hull: a closed convex surface with every input point on or inside it,
  // checked with the exact predicate, also for lattice points full of coplanar and collinear subsets.
  it('encloses every point and is a closed triangulated surface, even for degenerate input', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.array(lattice, { minLength: 4, maxLength: 40 }),
          fc.array(scattered, { minLength: 4, maxLength: 60 }),
        ),
        quaternion,
        (points, q) => {
          const p = arrays(points.map((pt) => rotate(q as [number, number, number, number], pt)));
          const hull = convexHull(p);
          fc.pre(hull.kind === 'solid');
          if (hull.kind !== 'solid') return;
          expect(everyPointInside(hull, p)).toBe(true);
          expect(closedSurface(hull)).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('keeps the eight corners of a cube filled with interior, face and edge points, and no interior point', () => {
    const points: { x: number; y: number; z: number }[] = [];
    for (let i = 0; i <= 4; i++)
      for (let j = 0; j <= 4; j++) for (let k = 0; k <= 4; k++) points.push({ x: i, y: j, z: k });
    const p = arrays(points);
    const hull = convexHull(p);
    expect(hull.kind).toBe('solid');
    if (hull.kind !== 'solid') return;
    const vertices = Array.from(hull.vertices, (i) => points[i] as { x: number; y: number; z: number });
    const corner = (q: { x: number; y: number; z: number }): boolean =>
      [q.x, q.y, q.z].every((v) => v === 0 || v === 4);
    expect(vertices.filter(corner)).toHaveLength(8);
    // Extra vertices may sit on a face or an edge (exactly coplanar input), never inside.
    for (const q of vertices) expect([q.x, q.y, q.z].some((v) => v === 0 || v === 4)).toBe(true);
    expect(everyPointInside(hull, p)).toBe(true);
    expect(closedSurface(hull)).toBe(true);
  });

  it('reports collinear and coplanar input instead of a hull', () => {
    expect(convexHull(arrays([0, 1, 2, 3].map((t) => ({ x: t, y: 2 * t, z: 3 * t })))).kind).toBe('collinear');
    expect(
      convexHull(
        arrays([
          { x: 1, y: 1, z: 1 },
          { x: 1, y: 1, z: 1 },
          { x: 1, y: 1, z: 1 },
        ]),
      ).kind,
    ).toBe('collinear');
    const planar = convexHull(arrays([0, 1, 2, 3, 4].map((t) => ({ x: t, y: t * t, z: 5 }))));
    expect(planar.kind).toBe('planar');
    if (planar.kind === 'planar') expect(Math.abs(planar.normal.z)).toBeCloseTo(1, 12);
  });
});
