import fc from 'fast-check';
import { bruteForceVerticalZone, bruteForceWidth } from '../testing/brute-force-width';
import { loadHighs, minimaxPlaneByLp } from '../testing/highs-reference';
import { rotate, seededRandom } from '../testing/seeded-random';
import { flatness, flatnessOfArrays } from './flatness';
import type { Point3 } from './point-cloud';

type Quaternion = [number, number, number, number];

const coordinate = fc.double({ min: -10, max: 10, noNaN: true, noDefaultInfinity: true });
const point = fc.record({ x: coordinate, y: coordinate, z: coordinate });
const quaternion = fc
  .tuple(
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
  )
  .filter((q) => Math.hypot(...q) > 0.1) as fc.Arbitrary<Quaternion>;

/** True when the points do not span a plane (relative to their size), so flatness must refuse them. */
function degenerate(points: readonly Point3[], ratio = 1e-6): boolean {
  const a = points[0] as Point3;
  let best = 0;
  let far = a;
  for (const p of points) {
    const d = Math.hypot(p.x - a.x, p.y - a.y, p.z - a.z);
    if (d > best) {
      best = d;
      far = p;
    }
  }
  if (best < 1e-6) return true;
  let area = 0;
  for (const p of points) {
    const u = [far.x - a.x, far.y - a.y, far.z - a.z];
    const v = [p.x - a.x, p.y - a.y, p.z - a.z];
    area = Math.max(
      area,
      Math.hypot(u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!) / best,
    );
  }
  return area < ratio * best;
}

function extent(points: readonly Point3[]): number {
  let e = 0;
  for (const p of points) e = Math.max(e, Math.abs(p.x), Math.abs(p.y), Math.abs(p.z));
  return e;
}

describe('flatness: minimum zone', () => {
  // Independent reference: exhaustive search over every face–vertex and edge–edge candidate
  // normal (Houle & Toussaint 1988), each measured over all points (src/testing/brute-force-width.ts).
  it('equals the exhaustive-search width for any small point set, in any orientation', () => {
    fc.assert(
      fc.property(fc.array(point, { minLength: 4, maxLength: 10 }), (points) => {
        fc.pre(!degenerate(points));
        const result = flatness(points);
        const reference = bruteForceWidth(points);
        expect(Math.abs(result.minimumZone - reference)).toBeLessThanOrEqual(
          1e-9 * Math.max(reference, 1e-3 * extent(points)),
        );
      }),
      { numRuns: 300 },
    );
  });

  it('gives the linearised (vertical) zone of the exhaustive search too', () => {
    fc.assert(
      fc.property(fc.array(point, { minLength: 4, maxLength: 9 }), (points) => {
        // The vertical zone is for surfaces seen from above: their plan view must span an area.
        fc.pre(
          !degenerate(
            points.map((p) => ({ x: p.x, y: p.y, z: 0 })),
            1e-3,
          ),
        );
        const result = flatness(points);
        const reference = bruteForceVerticalZone(points);
        fc.pre(Number.isFinite(reference) && result.vertical !== null);
        // Relative to the zone, or to the data where the zone is nearly nil; never finer than
        // 1e-12 mm (a hundred-thousandth of the 0.1 nm the product stores): below that, a plane
        // through points 1e-19 mm apart in plan differs by rounding alone (seen: 3.7e-16 mm).
        expect(Math.abs((result.vertical?.zone ?? NaN) - reference)).toBeLessThanOrEqual(
          Math.max(1e-9 * Math.max(reference, 1e-3 * extent(points)), 1e-12),
        );
      }),
      {
        numRuns: 150,
        examples: [
          [
            [
              { x: 9.80333820103794e-7, y: 0, z: 0 },
              { x: 0, y: 0, z: 0 },
              { x: 0, y: -1.9734639890482337e-7, z: -0.00036912043649755454 },
              { x: 0, y: 0, z: 0 },
              { x: 0, y: -1.9734639890482338e-19, z: 0 },
            ],
          ],
        ],
      },
    );
  });

  // Property (ISO 12781: the zone is defined by distances only): rigid motions leave it unchanged.
  it('is unchanged by rigid rotations and translations', () => {
    fc.assert(
      fc.property(
        fc.array(point, { minLength: 4, maxLength: 40 }),
        quaternion,
        fc.record({
          x: fc.double({ min: -1000, max: 1000, noNaN: true }),
          y: fc.double({ min: -1000, max: 1000, noNaN: true }),
          z: fc.double({ min: -1000, max: 1000, noNaN: true }),
        }),
        (points, q, shift) => {
          fc.pre(!degenerate(points));
          const moved = points.map((p) => {
            const r = rotate(q, p);
            return { x: r.x + shift.x, y: r.y + shift.y, z: r.z + shift.z };
          });
          const before = flatness(points).minimumZone;
          const after = flatness(moved).minimumZone;
          expect(Math.abs(after - before)).toBeLessThanOrEqual(
            1e-9 * Math.max(before, 1e-3 * extent(points)) + 1e-12 * 1000,
          );
        },
      ),
      { numRuns: 200 },
    );
  });

  // Property: the minimum zone is the minimum over all directions, so it never exceeds the
  // least-squares value (ISO 12781-2; references.md, "least squares gives a value never smaller").
  it('is never larger than the least-squares value', () => {
    fc.assert(
      fc.property(fc.array(point, { minLength: 4, maxLength: 60 }), (points) => {
        fc.pre(!degenerate(points));
        const result = flatness(points);
        expect(result.minimumZone).toBeLessThanOrEqual(result.leastSquares);
      }),
      { numRuns: 200 },
    );
  });

  /**
   * Points strictly between two parallel planes a distance s apart, with three points on the upper
   * plane forming a wide triangle and one on the lower plane above the triangle's middle (a
   * face–vertex lock), or two crossing segments, one in each plane (an edge–edge lock). When the
   * lock's margin is large compared with s, no tilt narrows the zone, so the minimum zone is s.
   */
  function lockedSlab(
    lock: 'face-vertex' | 'edge-edge',
    s: number,
    interior: readonly [number, number, number][],
    q: Quaternion,
    shift: Point3,
  ): { points: Point3[]; locks: number[] } {
    const local: Point3[] =
      lock === 'face-vertex'
        ? [
            { x: -50, y: -40, z: s },
            { x: 50, y: -40, z: s },
            { x: 0, y: 50, z: s },
            { x: 0, y: -5, z: 0 },
          ]
        : [
            { x: -50, y: -50, z: s },
            { x: 50, y: 50, z: s },
            { x: -50, y: 50, z: 0 },
            { x: 50, y: -50, z: 0 },
          ];
    for (const [u, v, w] of interior) local.push({ x: 30 * u, y: 30 * v, z: s * (0.001 + 0.998 * w) });
    const points = local.map((p) => {
      const r = rotate(q, p);
      return { x: r.x + shift.x, y: r.y + shift.y, z: r.z + shift.z };
    });
    return { points, locks: [0, 1, 2, 3] };
  }

  it('gives exactly the separation of two known parallel planes that both carry points', () => {
    const unit = fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true });
    fc.assert(
      fc.property(
        fc.constantFrom('face-vertex' as const, 'edge-edge' as const),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.array(
          fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), unit),
          { maxLength: 60 },
        ),
        quaternion,
        fc.record({
          x: fc.double({ min: -500, max: 500, noNaN: true }),
          y: fc.double({ min: -500, max: 500, noNaN: true }),
          z: fc.double({ min: -500, max: 500, noNaN: true }),
        }),
        (lock, s, interior, q, shift) => {
          const { points, locks } = lockedSlab(lock, s, interior, q, shift);
          const result = flatness(points);
          expect(Math.abs(result.minimumZone - s)).toBeLessThanOrEqual(1e-9 * s + 1e-13 * 600);
          expect(result.contacts).toEqual(expect.arrayContaining(locks));
        },
      ),
      { numRuns: 200 },
    );
  });

  // The acceptance check: a steeply tilted slab must give its orthogonal zone, not the vertical one.
  it('gives the orthogonal zone of a steeply tilted slab, not its vertical height', () => {
    const random = seededRandom(20240601);
    const interior = Array.from(
      { length: 500 },
      () => [2 * random() - 1, 2 * random() - 1, random()] as [number, number, number],
    );
    // 75° tilt about the y axis: the slab's normal has n_z = cos 75° ≈ 0.26.
    const half = (75 * Math.PI) / 360;
    const { points } = lockedSlab('face-vertex', 0.01, interior, [Math.cos(half), 0, Math.sin(half), 0], {
      x: 10,
      y: 20,
      z: 30,
    });
    const result = flatness(points);
    expect(result.minimumZone).toBeCloseTo(0.01, 12);
    expect(Math.abs(result.normal.z)).toBeCloseTo(Math.cos((75 * Math.PI) / 180), 9);
    // Measured along z the same slab is about 1/cos 75° ≈ 3.9 times thicker.
    expect(result.vertical?.zone ?? 0).toBeGreaterThan(3 * result.minimumZone);
  });

  it('reports as contacts only points on the zone planes, at least four of them for scattered data', () => {
    fc.assert(
      fc.property(fc.array(point, { minLength: 5, maxLength: 50 }), (points) => {
        fc.pre(!degenerate(points));
        const r = flatness(points);
        const tol = 1e-9 * r.minimumZone + 1e-12 * extent(points);
        for (const i of r.lowContacts) {
          const p = points[i] as Point3;
          expect(Math.abs(r.normal.x * p.x + r.normal.y * p.y + r.normal.z * p.z - r.lowOffset)).toBeLessThanOrEqual(
            tol,
          );
        }
        for (const i of r.highContacts) {
          const p = points[i] as Point3;
          expect(Math.abs(r.normal.x * p.x + r.normal.y * p.y + r.normal.z * p.z - r.highOffset)).toBeLessThanOrEqual(
            tol,
          );
        }
        expect(r.highOffset - r.lowOffset).toBeCloseTo(r.minimumZone, 9);
        for (const p of points) {
          const d = r.normal.x * p.x + r.normal.y * p.y + r.normal.z * p.z;
          expect(d).toBeGreaterThanOrEqual(r.lowOffset - tol);
          expect(d).toBeLessThanOrEqual(r.highOffset + tol);
        }
        if (r.minimumZone > 1e-6) {
          expect(r.lowContacts.length).toBeGreaterThanOrEqual(1);
          expect(r.highContacts.length).toBeGreaterThanOrEqual(1);
          expect(r.contacts.length).toBeGreaterThanOrEqual(4);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('gives zone 0 and the plane normal when every point lies on one tilted plane', () => {
    const normal = { x: 1 / 3, y: -2 / 3, z: 2 / 3 };
    const points = Array.from({ length: 30 }, (_, i) => {
      const u = (i % 6) * 7.5;
      const v = Math.floor(i / 6) * 3.25;
      // Two in-plane directions orthogonal to (1, −2, 2)/3.
      return { x: (2 / 3) * u + (2 / 3) * v, y: (2 / 3) * u - (1 / 3) * v, z: (1 / 3) * u - (2 / 3) * v };
    });
    const r = flatness(points);
    expect(r.minimumZone).toBe(0);
    expect(r.leastSquares).toBe(0);
    expect(r.normal.x).toBeCloseTo(normal.x, 12);
    expect(r.normal.y).toBeCloseTo(normal.y, 12);
    expect(r.normal.z).toBeCloseTo(normal.z, 12);
    expect(r.contacts).toHaveLength(30);
  });

  it('rejects fewer than 3 points, non-finite numbers and points on one line with a RangeError', () => {
    expect(() =>
      flatness([
        { x: 0, y: 0, z: 0 },
        { x: 1, y: 0, z: 0 },
      ]),
    ).toThrow(new RangeError('flatness needs at least 3 points, got 2'));
    expect(() =>
      flatness([
        { x: 0, y: 0, z: 0 },
        { x: 1, y: 0, z: Number.NaN },
        { x: 0, y: 1, z: 0 },
      ]),
    ).toThrow(/point 1 has a non-finite z coordinate/);
    expect(() =>
      flatness([
        { x: 0, y: 0, z: 0 },
        { x: 1, y: 0, z: 0 },
        { x: 0, y: Infinity, z: 0 },
      ]),
    ).toThrow(RangeError);
    const line = Array.from({ length: 10 }, (_, i) => ({ x: i, y: 2 * i, z: -i }));
    expect(() => flatness(line)).toThrow(/all points lie on one line/);
    expect(() => flatness(Array.from({ length: 5 }, () => ({ x: 1, y: 1, z: 1 })))).toThrow(/one line \(or coincide\)/);
  });

  it('gives the same result from coordinate arrays and leaves them unchanged', () => {
    const random = seededRandom(7);
    const points = Array.from({ length: 200 }, () => ({
      x: 100 * random(),
      y: 100 * random(),
      z: 25 + 0.001 * random(),
    }));
    const x = Float64Array.from(points, (p) => p.x);
    const y = Float64Array.from(points, (p) => p.y);
    const z = Float64Array.from(points, (p) => p.z);
    const copy = Float64Array.from(z);
    const fromArrays = flatnessOfArrays({ x, y, z });
    expect(fromArrays.minimumZone).toBe(flatness(points).minimumZone);
    expect(z).toEqual(copy);
  });
});

describe('flatness: comparison with a general-purpose LP solver', () => {
  // Reference: HiGHS (npm package `highs`, test-only dev dependency) solving the linearised
  // minimum zone  min h  s.t.  c + a·x + b·y ≤ z ≤ c + a·x + b·y + h  (src/testing/highs-reference.ts).
  it('matches the LP on near-level surfaces, and its orthogonal zone is at most the vertical one', async () => {
    const highs = await loadHighs();
    const random = seededRandom(42);
    for (const [side, tiltX, tiltY, amplitude] of [
      [5, 0, 0, 0.002],
      [12, 3e-5, -1e-5, 0.001],
      [30, -2e-4, 5e-5, 0.005],
    ] as const) {
      const points: Point3[] = [];
      for (let i = 0; i < side; i++) {
        for (let j = 0; j < side; j++) {
          const x = (100 * i) / (side - 1);
          const y = (80 * j) / (side - 1);
          points.push({ x, y, z: 38.1 + tiltX * x + tiltY * y + amplitude * random() });
        }
      }
      const r = flatness(points);
      const lp = minimaxPlaneByLp(
        highs,
        points.map((p) => p.x),
        points.map((p) => p.y),
        points.map((p) => p.z),
      );
      expect(Math.abs((r.vertical?.zone ?? NaN) - lp.measuredZone)).toBeLessThanOrEqual(1e-9 * lp.measuredZone);
      expect(Math.abs((r.vertical?.zone ?? NaN) - lp.zone)).toBeLessThanOrEqual(1e-7 * lp.zone);
      expect(r.minimumZone).toBeLessThanOrEqual(lp.measuredZone * (1 + 1e-12));
      // For a tilt t the two criteria differ by at most a factor √(1 + t²).
      expect(r.minimumZone).toBeGreaterThanOrEqual(
        lp.measuredZone / Math.sqrt(1 + (Math.abs(tiltX) + Math.abs(tiltY) + 1e-3) ** 2),
      );
    }
  });

  it('matches the LP for random near-level point sets', async () => {
    const highs = await loadHighs();
    await fc.assert(
      fc.asyncProperty(
        fc.array(
          fc.tuple(
            fc.double({ min: 0, max: 100, noNaN: true }),
            fc.double({ min: 0, max: 100, noNaN: true }),
            fc.double({ min: 0, max: 0.01, noNaN: true }),
          ),
          { minLength: 5, maxLength: 80 },
        ),
        async (rows) => {
          const points = rows.map(([x, y, z]) => ({ x, y, z: 12.7 + z }));
          fc.pre(
            !degenerate(
              points.map((p) => ({ x: p.x, y: p.y, z: 0 })),
              1e-3,
            ),
          );
          const r = flatness(points);
          const lp = minimaxPlaneByLp(
            highs,
            rows.map((row) => row[0]),
            rows.map((row) => row[1]),
            points.map((p) => p.z),
          );
          // Floor: rounding of heights near 12.7 (a few ulps of 12.7 ≈ 1e-15).
          expect(Math.abs((r.vertical?.zone ?? NaN) - lp.measuredZone)).toBeLessThanOrEqual(
            1e-9 * lp.measuredZone + 1e-13 * 12.7,
          );
        },
      ),
      { numRuns: 60 },
    );
  });
});
