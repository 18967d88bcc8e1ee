import fc from 'fast-check';
import { orientation } from './orientation';

/** Independent reference: the determinant of integer coordinates in BigInt arithmetic. */
function integerSign(c: readonly bigint[]): number {
  const [ax, ay, az, bx, by, bz, cx, cy, cz, px, py, pz] = c as [
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
    bigint,
  ];
  const u = [bx - ax, by - ay, bz - az];
  const v = [cx - ax, cy - ay, cz - az];
  const w = [px - ax, py - ay, pz - az];
  const det =
    w[0]! * (u[1]! * v[2]! - u[2]! * v[1]!) +
    w[1]! * (u[2]! * v[0]! - u[0]! * v[2]!) +
    w[2]! * (u[0]! * v[1]! - u[1]! * v[0]!);
  return det > 0n ? 1 : det < 0n ? -1 : 0;
}

describe('orientation (exact predicate)', () => {
  it('is positive above a counter-clockwise triangle, negative below, zero on its plane', () => {
    expect(orientation(0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, 1)).toBe(1);
    expect(orientation(0, 0, 0, 1, 0, 0, 0, 1, 0, 0, 0, -1)).toBe(-1);
    expect(orientation(0, 0, 0, 1, 0, 0, 0, 1, 0, 0.3, 0.7, 0)).toBe(0);
  });

  // Reference: exact integer determinant. Points are built almost coplanar from large integers,
  // where the floating-point determinant loses its sign (products exceed 2^53).
  it('matches exact integer arithmetic on nearly coplanar points with large coordinates', () => {
    const big = fc.integer({ min: -(2 ** 30), max: 2 ** 30 });
    fc.assert(
      fc.property(
        fc.array(big, { minLength: 9, maxLength: 9 }),
        fc.integer({ min: -1000, max: 1000 }),
        fc.integer({ min: -1000, max: 1000 }),
        fc.constantFrom(-1, 0, 1),
        fc.constantFrom(0, 1, 2),
        (abc, s, t, nudge, axis) => {
          const [ax, ay, az, bx, by, bz, cx, cy, cz] = abc as [
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
          ];
          // p = a + s(b − a) + t(c − a), moved by one unit along one axis (or not at all).
          const p = [
            ax + s * (bx - ax) + t * (cx - ax),
            ay + s * (by - ay) + t * (cy - ay),
            az + s * (bz - az) + t * (cz - az),
          ];
          p[axis] = (p[axis] as number) + nudge;
          fc.pre(p.every((v) => Number.isSafeInteger(v)));
          const coordinates = [ax, ay, az, bx, by, bz, cx, cy, cz, ...p];
          const expected = integerSign(coordinates.map((v) => BigInt(v)));
          const [x0, y0, z0, x1, y1, z1, x2, y2, z2, x3, y3, z3] = coordinates as [
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
          ];
          expect(orientation(x0, y0, z0, x1, y1, z1, x2, y2, z2, x3, y3, z3)).toBe(expected);
        },
      ),
      { numRuns: 500 },
    );
  });

  // Property: scaling every coordinate by a power of two is exact, so the sign cannot change.
  it('is unchanged by exact power-of-two scaling, down to tiny magnitudes', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 12, maxLength: 12 }),
        fc.integer({ min: -900, max: 900 }),
        (c, exponent) => {
          const scale = 2 ** exponent;
          const [a, b, cc, d, e, f, g, h, i, j, k, l] = c.map((v) => v * scale) as [
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
            number,
          ];
          expect(orientation(a, b, cc, d, e, f, g, h, i, j, k, l)).toBe(integerSign(c.map((v) => BigInt(v))));
        },
      ),
      { numRuns: 300 },
    );
  });
});
