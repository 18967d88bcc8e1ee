/** Eigenvalues (ascending) and unit eigenvectors (columns, same order) of a symmetric 3×3 matrix. */
export interface Eigen3 {
  values: [number, number, number];
  vectors: [[number, number, number], [number, number, number], [number, number, number]];
}

/**
 * Eigen-decomposition of a symmetric 3×3 matrix by cyclic Jacobi rotations (Golub & Van Loan,
 * Matrix Computations, §8.5). Jacobi is chosen over the closed-form cubic because it keeps small
 * eigenvalues accurate, which is what a plane fit to nearly flat data needs.
 * `m` is row-major [a00, a01, a02, a11, a12, a22] (upper triangle).
 */
export function symmetricEigen3(m: readonly [number, number, number, number, number, number]): Eigen3 {
  const a = [
    [m[0], m[1], m[2]],
    [m[1], m[3], m[4]],
    [m[2], m[4], m[5]],
  ];
  const v = [
    [1, 0, 0],
    [0, 1, 0],
    [0, 0, 1],
  ];
  const get = (r: number, c: number): number => (a[r] as number[])[c] as number;
  const set = (r: number, c: number, value: number): void => {
    (a[r] as number[])[c] = value;
  };
  for (let sweep = 0; sweep < 60; sweep++) {
    const off = Math.abs(get(0, 1)) + Math.abs(get(0, 2)) + Math.abs(get(1, 2));
    const scale = Math.abs(get(0, 0)) + Math.abs(get(1, 1)) + Math.abs(get(2, 2));
    if (off === 0 || off <= Number.EPSILON * 1e-3 * scale) break;
    for (const [p, q] of [
      [0, 1],
      [0, 2],
      [1, 2],
    ] as const) {
      const apq = get(p, q);
      if (apq === 0) continue;
      const app = get(p, p);
      const aqq = get(q, q);
      const theta = (aqq - app) / (2 * apq);
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
      const c = 1 / Math.sqrt(t * t + 1);
      const s = t * c;
      for (let k = 0; k < 3; k++) {
        const akp = get(k, p);
        const akq = get(k, q);
        set(k, p, c * akp - s * akq);
        set(k, q, s * akp + c * akq);
      }
      for (let k = 0; k < 3; k++) {
        const apk = get(p, k);
        const aqk = get(q, k);
        set(p, k, c * apk - s * aqk);
        set(q, k, s * apk + c * aqk);
      }
      for (let k = 0; k < 3; k++) {
        const row = v[k] as number[];
        const vkp = row[p] as number;
        const vkq = row[q] as number;
        row[p] = c * vkp - s * vkq;
        row[q] = s * vkp + c * vkq;
      }
    }
  }
  const order = [0, 1, 2].sort((i, j) => get(i, i) - get(j, j));
  const column = (j: number): [number, number, number] => [
    (v[0] as number[])[j] as number,
    (v[1] as number[])[j] as number,
    (v[2] as number[])[j] as number,
  ];
  const [i0, i1, i2] = order as [number, number, number];
  return {
    values: [get(i0, i0), get(i1, i1), get(i2, i2)],
    vectors: [column(i0), column(i1), column(i2)],
  };
}
