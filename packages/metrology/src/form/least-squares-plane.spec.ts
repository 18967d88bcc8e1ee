import fc from 'fast-check';
import { leastSquaresPlane } from './least-squares-plane';
import { centrePoints } from './point-cloud';

function centred(points: readonly { x: number; y: number; z: number }[]): ReturnType<typeof centrePoints> {
  return centrePoints({
    x: Float64Array.from(points, (p) => p.x),
    y: Float64Array.from(points, (p) => p.y),
    z: Float64Array.from(points, (p) => p.z),
  });
}

function sumOfSquares(
  points: readonly { x: number; y: number; z: number }[],
  n: { x: number; y: number; z: number },
  c: { x: number; y: number; z: number },
): number {
  const len = Math.hypot(n.x, n.y, n.z);
  let s = 0;
  for (const p of points) s += (((p.x - c.x) * n.x + (p.y - c.y) * n.y + (p.z - c.z) * n.z) / len) ** 2;
  return s;
}

describe('leastSquaresPlane', () => {
  // Definition (orthogonal regression): the plane passes through the centroid and no other
  // normal gives a smaller sum of squared orthogonal distances.
  it('minimises the sum of squared orthogonal distances', () => {
    const coordinate = fc.double({ min: -10, max: 10, noNaN: true });
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: coordinate, y: coordinate, z: coordinate }), { minLength: 4, maxLength: 30 }),
        fc.tuple(
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
        ),
        (points, [dx, dy, dz]) => {
          const plane = leastSquaresPlane(centred(points));
          const best = sumOfSquares(points, plane.normal, plane.centroid);
          const other = { x: plane.normal.x + 0.1 * dx, y: plane.normal.y + 0.1 * dy, z: plane.normal.z + 0.1 * dz };
          fc.pre(Math.hypot(other.x, other.y, other.z) > 0.5);
          expect(best).toBeLessThanOrEqual(sumOfSquares(points, other, plane.centroid) * (1 + 1e-9) + 1e-12);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('recovers a plane from points placed symmetrically on both sides of it', () => {
    const n = { x: 2 / 7, y: 3 / 7, z: 6 / 7 };
    const points = [];
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < 4; j++) {
        // In-plane directions of (2, 3, 6)/7 are (3, −2, 0)/√13 and n × that.
        const u = { x: 3 / Math.sqrt(13), y: -2 / Math.sqrt(13), z: 0 };
        const v = { x: n.y * u.z - n.z * u.y, y: n.z * u.x - n.x * u.z, z: n.x * u.y - n.y * u.x };
        const base = {
          x: 1 + 5 * i * u.x + 3 * j * v.x,
          y: 2 + 5 * i * u.y + 3 * j * v.y,
          z: 3 + 5 * i * u.z + 3 * j * v.z,
        };
        for (const s of [-0.01, 0.01]) points.push({ x: base.x + s * n.x, y: base.y + s * n.y, z: base.z + s * n.z });
      }
    }
    const plane = leastSquaresPlane(centred(points));
    expect(plane.normal.x).toBeCloseTo(n.x, 12);
    expect(plane.normal.y).toBeCloseTo(n.y, 12);
    expect(plane.normal.z).toBeCloseTo(n.z, 12);
    expect(plane.range).toBeCloseTo(0.02, 12);
    expect(plane.offset).toBeCloseTo(n.x * 1 + n.y * 2 + n.z * 3, 12);
  });
});
