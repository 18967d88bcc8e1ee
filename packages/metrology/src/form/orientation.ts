/**
 * Bound on the rounding error of the floating-point determinant below, relative to its
 * permanent. Shewchuk's bound for this evaluation order is (7 + 56u)u ≈ 7.8e-16 (Shewchuk,
 * "Adaptive precision floating-point arithmetic and fast robust geometric predicates",
 * Discrete Comput. Geom. 18, 1997); 1e-15 leaves a margin.
 */
const ERROR_BOUND = 1e-15;

const view = new DataView(new ArrayBuffer(8));

/** The exact value of a double as mantissa·2^exponent (mantissa an integer). */
function decompose(value: number): [bigint, number] {
  if (value === 0) return [0n, 0];
  view.setFloat64(0, value);
  const high = view.getUint32(0);
  const low = view.getUint32(4);
  const exponentBits = (high >>> 20) & 0x7ff;
  let mantissa = (BigInt(high & 0xfffff) << 32n) | BigInt(low);
  let exponent: number;
  if (exponentBits === 0) {
    exponent = -1074; // subnormal
  } else {
    mantissa |= 1n << 52n;
    exponent = exponentBits - 1075;
  }
  return [high >>> 31 === 1 ? -mantissa : mantissa, exponent];
}

/** Sign of det[b−a, c−a, p−a] computed exactly with integers (all 12 doubles scaled to a common exponent). */
function exactSign(coordinates: readonly number[]): number {
  const parts = coordinates.map(decompose);
  let lowest = Infinity;
  for (const [m, e] of parts) if (m !== 0n && e < lowest) lowest = e;
  if (lowest === Infinity) return 0;
  const v = parts.map(([m, e]) => (m === 0n ? 0n : m << BigInt(e - lowest)));
  const [ax, ay, az, bx, by, bz, cx, cy, cz, px, py, pz] = v as [
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
  const ux = bx - ax;
  const uy = by - ay;
  const uz = bz - az;
  const vx = cx - ax;
  const vy = cy - ay;
  const vz = cz - az;
  const wx = px - ax;
  const wy = py - ay;
  const wz = pz - az;
  const det = wx * (uy * vz - uz * vy) + wy * (uz * vx - ux * vz) + wz * (ux * vy - uy * vx);
  return det > 0n ? 1 : det < 0n ? -1 : 0;
}

/**
 * Exact orientation of point p against the plane through a, b, c: the sign of
 * ((b − a) × (c − a)) · (p − a). Positive when p lies on the side the normal (b − a) × (c − a)
 * points to, zero when the four points are exactly coplanar. The floating-point value decides
 * whenever it exceeds its error bound; otherwise the determinant is evaluated exactly in integer
 * arithmetic (every double is an integer times a power of two), so the answer is always exact.
 */
export function orientation(
  ax: number,
  ay: number,
  az: number,
  bx: number,
  by: number,
  bz: number,
  cx: number,
  cy: number,
  cz: number,
  px: number,
  py: number,
  pz: number,
): number {
  const ux = bx - ax;
  const uy = by - ay;
  const uz = bz - az;
  const vx = cx - ax;
  const vy = cy - ay;
  const vz = cz - az;
  const wx = px - ax;
  const wy = py - ay;
  const wz = pz - az;
  const uyvz = uy * vz;
  const uzvy = uz * vy;
  const uzvx = uz * vx;
  const uxvz = ux * vz;
  const uxvy = ux * vy;
  const uyvx = uy * vx;
  const det = wx * (uyvz - uzvy) + wy * (uzvx - uxvz) + wz * (uxvy - uyvx);
  const permanent =
    Math.abs(wx) * (Math.abs(uyvz) + Math.abs(uzvy)) +
    Math.abs(wy) * (Math.abs(uzvx) + Math.abs(uxvz)) +
    Math.abs(wz) * (Math.abs(uxvy) + Math.abs(uyvx));
  const bound = ERROR_BOUND * permanent;
  if (det > bound) return 1;
  if (-det > bound) return -1;
  if (permanent === 0 && noUnderflow([ux, uy, uz, vx, vy, vz, wx, wy, wz])) {
    // Differences of doubles are zero only when the doubles are equal, so with no underflow a
    // zero permanent means every term has an exactly zero factor: the points are coplanar.
    return 0;
  }
  return exactSign([ax, ay, az, bx, by, bz, cx, cy, cz, px, py, pz]);
}

/** True when no product of three of these numbers can underflow (each is 0 or at least 1e-100). */
function noUnderflow(values: readonly number[]): boolean {
  for (const v of values) if (v !== 0 && Math.abs(v) < 1e-100) return false;
  return true;
}
