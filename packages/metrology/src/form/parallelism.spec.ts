import fc from 'fast-check';
import { loadHighs, minimaxPlaneByLp } from '../testing/highs-reference';
import { rotate, seededRandom } from '../testing/seeded-random';
import { parallelism } from './parallelism';
import type { Point3 } from './point-cloud';

describe('parallelism', () => {
  // Definition (brief, "Parallelism"): on the surface plate the datum is z = 0 and the value is the range of z.
  it('uses the surface plate as datum when no datum points are given', () => {
    const top = [38.1002, 38.1005, 38.0999, 38.1003].map((z, i) => ({ x: 10 * i, y: 5 * (i % 2), z }));
    const r = parallelism(top);
    expect(r.datum.source).toBe('surface plate');
    expect(r.value).toBeCloseTo(Math.max(...top.map((p) => p.z)) - Math.min(...top.map((p) => p.z)), 15);
    expect(r.lowest).toBe(2);
    expect(r.highest).toBe(1);
  });

  // Reference: HiGHS (npm `highs`) solving the constrained minimax datum as an LP:
  // min h s.t. 0 <= z_i − (a·x_i + b·y_i + c) <= h for the datum points (linearised, near-level data).
  it('fits the datum like the linear programme and measures the top against it', async () => {
    const highs = await loadHighs();
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.integer({ min: 4, max: 40 }),
        async (seed, count) => {
          const random = seededRandom(seed);
          const tiltX = 2e-5 * (random() - 0.5);
          const tiltY = 2e-5 * (random() - 0.5);
          const datum: Point3[] = Array.from({ length: count }, () => {
            const x = 100 * random();
            const y = 60 * random();
            return { x, y, z: tiltX * x + tiltY * y + 0.004 * random() };
          });
          const top: Point3[] = Array.from({ length: 12 }, () => {
            const x = 100 * random();
            const y = 60 * random();
            return { x, y, z: 38.1 + 3e-5 * x + 0.002 * random() };
          });
          const r = parallelism(top, datum);
          const lp = minimaxPlaneByLp(
            highs,
            datum.map((p) => p.x),
            datum.map((p) => p.y),
            datum.map((p) => p.z),
          );
          // The LP measures along z, we measure along the normal: the LP's planes are an enclosing
          // zone of orthogonal width h/√(1 + a² + b²), and our planes have vertical height
          // zone/|n_z| >= h. So both bounds below hold exactly (up to rounding).
          const cosine = 1 / Math.hypot(1, lp.slopeX, lp.slopeY);
          const slack = 1e-12 * lp.measuredZone + 1e-16;
          expect(r.datum.datumZone).toBeLessThanOrEqual(lp.measuredZone * cosine + slack);
          expect(r.datum.datumZone).toBeGreaterThanOrEqual(lp.measuredZone * r.datum.normal.z - slack);
          // The top measured from the LP's datum: the two datums differ only by that small tilt.
          const lpDistances = top.map((p) => (p.z - lp.slopeX * p.x - lp.slopeY * p.y - lp.low) * cosine);
          const lpValue = Math.max(...lpDistances) - Math.min(...lpDistances);
          const n = r.datum.normal;
          const tilt = Math.hypot(n.x + lp.slopeX * cosine, n.y + lp.slopeY * cosine, n.z - cosine);
          const reach = Math.max(...top.map((p) => Math.hypot(p.x, p.y, p.z)));
          expect(Math.abs(r.value - lpValue)).toBeLessThanOrEqual(2 * tilt * reach + 1e-12);
          expect(tilt).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 40 },
    );
  });

  // Definition (ISO 5459 constrained L∞ datum): the plane lies on or below every datum point and touches them.
  it('puts the datum plane on or below every datum point, touching some, in any orientation', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: -50, max: 50, noNaN: true }),
            fc.double({ min: -50, max: 50, noNaN: true }),
            fc.double({ min: 0, max: 0.01, noNaN: true }),
          ),
          { minLength: 4, maxLength: 30 },
        ),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        (rows, tilt) => {
          // A datum face spans an area: keep plan views that are not nearly a line.
          const [x0, y0] = rows[0] as [number, number, number];
          const spread = Math.max(...rows.map(([x, y]) => Math.hypot(x - x0, y - y0)));
          const area = Math.max(
            ...rows.flatMap(([xa, ya]) =>
              rows.map(([xb, yb]) => Math.abs((xa - x0) * (yb - y0) - (ya - y0) * (xb - x0))),
            ),
          );
          fc.pre(spread > 1 && area > 1e-3 * spread * spread);
          const q: [number, number, number, number] = [1, tilt, 0.3 * tilt, 0];
          const datum = rows.map(([x, y, z]) => rotate(q, { x, y, z }));
          const top = rows.map(([x, y]) => rotate(q, { x, y, z: 20 }));
          const r = parallelism(top, datum);
          const n = r.datum.normal;
          const heights = datum.map((p) => n.x * p.x + n.y * p.y + n.z * p.z - r.datum.offset);
          for (const h of heights) expect(h).toBeGreaterThanOrEqual(-1e-12);
          expect(Math.min(...heights)).toBeLessThanOrEqual(1e-12);
          expect(Math.max(...heights)).toBeCloseTo(r.datum.datumZone, 12);
          expect(r.datum.contacts.length).toBeGreaterThanOrEqual(1);
          expect(r.value).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 150 },
    );
  });

  it('gives the spread of the top above a tilted, exactly flat datum', () => {
    const q: [number, number, number, number] = [0.95, 0.2, -0.1, 0.05];
    const datum = [
      { x: 0, y: 0, z: 0 },
      { x: 80, y: 0, z: 0 },
      { x: 0, y: 50, z: 0 },
      { x: 80, y: 50, z: 0 },
    ].map((p) => rotate(q, p));
    const heights = [25.4, 25.4003, 25.4001, 25.3998];
    const top = heights.map((h, i) => rotate(q, { x: 20 * i, y: 10 + 5 * i, z: h }));
    const r = parallelism(top, datum);
    expect(r.value).toBeCloseTo(Math.max(...heights) - Math.min(...heights), 12);
    expect(r.datum.datumZone).toBeCloseTo(0, 12);
  });

  it('rejects too few or degenerate datum points and bad top points', () => {
    const top = [{ x: 0, y: 0, z: 1 }];
    expect(() => parallelism([])).toThrow(/at least 1 top point/);
    expect(() =>
      parallelism(top, [
        { x: 0, y: 0, z: 0 },
        { x: 1, y: 0, z: 0 },
      ]),
    ).toThrow(/at least 3 datum points, got 2/);
    expect(() =>
      parallelism(
        top,
        [0, 1, 2].map((t) => ({ x: t, y: t, z: 0 })),
      ),
    ).toThrow(/datum points: all points lie on one line/);
    expect(() => parallelism([{ x: 0, y: Number.NaN, z: 0 }])).toThrow(/top point 0 has a non-finite y/);
  });
});
