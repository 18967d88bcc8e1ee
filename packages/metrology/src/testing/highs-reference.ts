import highsLoader, { type Highs } from 'highs';

let loading: Promise<Highs> | null = null;

/** Loads the HiGHS linear-programming solver (WebAssembly build of the npm package `highs`) once. */
export function loadHighs(): Promise<Highs> {
  loading ??= highsLoader();
  return loading;
}

/** Minimax plane z = slopeX·x + slopeY·y + low … + low + zone found by the LP solver. */
export interface LpPlane {
  slopeX: number;
  slopeY: number;
  /** Offset of the lower plane at the origin of the caller's coordinates. */
  low: number;
  /** The LP's optimal objective h, in the caller's unit. */
  zone: number;
  /** Range of z − slopeX·x − slopeY·y over the data, i.e. the LP's plane measured exactly. */
  measuredZone: number;
}

/**
 * Independent reference: the linearised minimum zone as a linear programme solved by HiGHS,
 *   minimise h  subject to  c + a·x_i + b·y_i ≤ z_i ≤ c + a·x_i + b·y_i + h  for every i,
 * which is also the constrained minimax plane below the points (its lower plane c). The data are
 * centred and scaled to about ±1 before solving so the solver's absolute tolerances are
 * relative ones; `measuredZone` re-evaluates the LP's plane on the data.
 */
export function minimaxPlaneByLp(
  highs: Highs,
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  z: ArrayLike<number>,
): LpPlane {
  const n = x.length;
  const centre = (v: ArrayLike<number>): { mean: number; scale: number } => {
    let s = 0;
    for (let i = 0; i < n; i++) s += v[i] as number;
    const mean = s / n;
    let scale = 0;
    for (let i = 0; i < n; i++) scale = Math.max(scale, Math.abs((v[i] as number) - mean));
    return { mean, scale: scale > 0 ? scale : 1 };
  };
  const cx = centre(x);
  const cy = centre(y);
  const cz = centre(z);
  // Columns a, b, c, h; rows 2i: a·x + b·y + c <= z, 2i+1: a·x + b·y + c + h >= z (CSC storage).
  const rows = 2 * n;
  const starts = new Int32Array([0, rows, 2 * rows, 3 * rows, 3 * rows + n]);
  const indices = new Int32Array(3 * rows + n);
  const values = new Float64Array(3 * rows + n);
  const rowLower = new Float64Array(rows);
  const rowUpper = new Float64Array(rows);
  for (let i = 0; i < n; i++) {
    const xi = ((x[i] as number) - cx.mean) / cx.scale;
    const yi = ((y[i] as number) - cy.mean) / cy.scale;
    const zi = ((z[i] as number) - cz.mean) / cz.scale;
    for (const [column, value] of [
      [0, xi],
      [1, yi],
      [2, 1],
    ] as const) {
      indices[column * rows + 2 * i] = 2 * i;
      values[column * rows + 2 * i] = value;
      indices[column * rows + 2 * i + 1] = 2 * i + 1;
      values[column * rows + 2 * i + 1] = value;
    }
    indices[3 * rows + i] = 2 * i + 1;
    values[3 * rows + i] = 1;
    rowLower[2 * i] = -highs.infinity;
    rowUpper[2 * i] = zi;
    rowLower[2 * i + 1] = zi;
    rowUpper[2 * i + 1] = highs.infinity;
  }
  const inf = highs.infinity;
  return highs.withModel(
    {
      numCols: 4,
      numRows: rows,
      colCost: [0, 0, 0, 1],
      colLower: [-inf, -inf, -inf, 0],
      colUpper: [inf, inf, inf, inf],
      rowLower,
      rowUpper,
      matrix: { format: 'csc', numRows: rows, numCols: 4, starts, indices, values },
    },
    (model) => {
      model.options.set({ output_flag: false, primal_feasibility_tolerance: 1e-10, dual_feasibility_tolerance: 1e-10 });
      model.run();
      const status = model.getModelStatus();
      if (status !== highs.constants.modelStatus.optimal)
        throw new Error(`HiGHS did not solve the LP (status ${status})`);
      const [a, b, c, h] = Array.from(model.getSolution().colValue) as [number, number, number, number];
      const slopeX = (a * cz.scale) / cx.scale;
      const slopeY = (b * cz.scale) / cy.scale;
      let low = Infinity;
      let high = -Infinity;
      for (let i = 0; i < n; i++) {
        const r =
          (z[i] as number) - cz.mean - slopeX * ((x[i] as number) - cx.mean) - slopeY * ((y[i] as number) - cy.mean);
        if (r < low) low = r;
        if (r > high) high = r;
      }
      return {
        slopeX,
        slopeY,
        low: c * cz.scale + cz.mean - slopeX * cx.mean - slopeY * cy.mean,
        zone: h * cz.scale,
        measuredZone: high - low,
      };
    },
  );
}
