import type { ConvexHull } from './convex-hull';
import type { PointArrays } from './point-cloud';

/** Best direction found for one criterion, as a unit normal and the width along it over the hull. */
export interface WidthDirection {
  nx: number;
  ny: number;
  nz: number;
  /** Width of the hull along the normal (orthogonal criterion) or along z (vertical criterion). */
  width: number;
}

/** Minimum widths of a convex hull under the two criteria. */
export interface HullWidths {
  /** Smallest distance between two parallel supporting planes, along their normal. */
  orthogonal: WidthDirection;
  /**
   * Smallest distance along z between two parallel non-vertical supporting planes
   * z = a·x + b·y + c (the linearised zone); null when every candidate plane is vertical.
   */
  vertical: WidthDirection | null;
  /** Number of candidate directions examined (face–vertex and edge–edge antipodal pairs). */
  candidates: number;
}

/**
 * Minimum width of a convex polytope, exactly (up to floating point), by enumerating its
 * antipodal pairs. Houle & Toussaint (IEEE PAMI 10(5), 1988) show the width is attained by a
 * face and its farthest vertex or by two edges whose common normal gives two supporting planes.
 *
 * Directions are handled on the Gaussian map: face f has normal N_f; edge (u,v) between faces F
 * and G supports the directions on the arc from N_F to N_G. For each face the lowest vertex in
 * direction N_f is found by descent on the hull graph (a local minimum of a linear function on a
 * convex polytope is global). For each edge the arc is swept n(t) = (1−t)N_F + tN_G, t ∈ [0, 1],
 * while the lowest vertex is tracked; each time a neighbour w of the lowest vertex m becomes lower,
 * (u,v) and (m,w) are an antipodal edge pair. This visits every antipodal pair in
 * O(edges + pairs) steps instead of comparing all edge pairs.
 *
 * The same candidates also solve the vertical (linearised) zone: in the chart n = (−a, −b, 1) the
 * vertical width is piecewise linear and convex, with its pieces' corners at exactly these
 * face normals and edge–edge crossings, so its minimum is among them too.
 * A candidate is kept only after its width is measured by descent from both sides (the true
 * extent of the hull along it), so a poorly conditioned cross product can only give a larger,
 * valid width, never a false small one; candidates whose two features are already farther apart
 * than the best width cannot win and are not measured. Descents cross plateaus left by exactly
 * coplanar input (see `lowest`).
 */
export function minimumWidth(hull: ConvexHull, points: PointArrays): HullWidths {
  const vertexCount = hull.vertices.length;
  const local = new Map<number, number>();
  hull.vertices.forEach((p, i) => local.set(p, i));
  const hx = new Float64Array(vertexCount);
  const hy = new Float64Array(vertexCount);
  const hz = new Float64Array(vertexCount);
  for (let i = 0; i < vertexCount; i++) {
    const p = hull.vertices[i] as number;
    hx[i] = points.x[p] as number;
    hy[i] = points.y[p] as number;
    hz[i] = points.z[p] as number;
  }

  const faceCount = hull.offsets.length;
  const tri = new Int32Array(faceCount * 3);
  for (let k = 0; k < tri.length; k++) tri[k] = local.get(hull.triangles[k] as number) as number;

  // Directed edge a→b belongs to exactly one triangle of a closed hull.
  const faceOfEdge = new Map<number, number>();
  const degree = new Int32Array(vertexCount + 1);
  for (let f = 0; f < faceCount; f++) {
    for (let k = 0; k < 3; k++) {
      const a = tri[3 * f + k] as number;
      const b = tri[3 * f + ((k + 1) % 3)] as number;
      faceOfEdge.set(a * vertexCount + b, f);
      degree[a + 1] = (degree[a + 1] as number) + 1;
    }
  }
  // Neighbours in compressed rows: neighbours of v are adj[start[v] .. start[v+1]).
  const start = degree;
  for (let v = 0; v < vertexCount; v++) start[v + 1] = (start[v + 1] as number) + (start[v] as number);
  const adj = new Int32Array(start[vertexCount] as number);
  const fill = start.slice(0, vertexCount);
  for (let f = 0; f < faceCount; f++) {
    for (let k = 0; k < 3; k++) {
      const a = tri[3 * f + k] as number;
      const b = tri[3 * f + ((k + 1) % 3)] as number;
      adj[fill[a] as number] = b;
      fill[a] = (fill[a] as number) + 1;
    }
  }

  const N = hull.normals;
  let scale = 0;
  for (let i = 0; i < vertexCount; i++)
    scale = Math.max(scale, Math.abs(hx[i] as number), Math.abs(hy[i] as number), Math.abs(hz[i] as number));
  const plateau = 64 * Number.EPSILON * scale;
  const stamp = new Int32Array(vertexCount);
  const queue = new Int32Array(vertexCount);
  let generation = 0;

  /**
   * Vertex with the smallest n·p, by steepest descent from `from`. Exactly coplanar input can
   * leave hull vertices inside a flat face, where every neighbour ties; such a plateau is
   * searched breadth-first for a strictly lower neighbour before the descent stops, so the
   * answer is the global minimum (a local minimum is global on a convex polytope only once
   * plateaus are crossed).
   */
  const lowest = (nx: number, ny: number, nz: number, from: number): number => {
    let v = from;
    let value = nx * (hx[v] as number) + ny * (hy[v] as number) + nz * (hz[v] as number);
    for (;;) {
      let next = v;
      let nearest = Infinity;
      for (let k = start[v] as number, end = start[v + 1] as number; k < end; k++) {
        const w = adj[k] as number;
        const candidate = nx * (hx[w] as number) + ny * (hy[w] as number) + nz * (hz[w] as number);
        if (candidate < nearest) nearest = candidate;
        if (candidate < value) {
          value = candidate;
          next = w;
        }
      }
      if (next !== v) {
        v = next;
        continue;
      }
      // Every neighbour is clearly higher: no plateau to search.
      if (nearest > value + plateau) return v;
      generation++;
      stamp[v] = generation;
      queue[0] = v;
      let size = 1;
      let lower = -1;
      for (let head = 0; head < size && lower < 0; head++) {
        const u = queue[head] as number;
        for (let k = start[u] as number, end = start[u + 1] as number; k < end; k++) {
          const w = adj[k] as number;
          if (stamp[w] === generation) continue;
          const candidate = nx * (hx[w] as number) + ny * (hy[w] as number) + nz * (hz[w] as number);
          if (candidate < value) {
            lower = w;
            value = candidate;
            break;
          }
          if (candidate <= value + plateau) {
            stamp[w] = generation;
            queue[size++] = w;
          }
        }
      }
      if (lower < 0) return v;
      v = lower;
    }
  };
  const dot = (nx: number, ny: number, nz: number, v: number): number =>
    nx * (hx[v] as number) + ny * (hy[v] as number) + nz * (hz[v] as number);

  const orthogonal: WidthDirection = { nx: 0, ny: 0, nz: 1, width: Infinity };
  let vertical: WidthDirection | null = null;
  let candidates = 0;

  /** Measures the true width along (nx, ny, nz) and keeps it if it is the best so far. */
  const consider = (nx0: number, ny0: number, nz0: number, high: number, low: number): void => {
    const len = Math.hypot(nx0, ny0, nz0);
    if (!(len > 0) || !Number.isFinite(len)) return;
    // Orient from the low feature to the high one so both descents start at their answer.
    const sign = dot(nx0, ny0, nz0, high) >= dot(nx0, ny0, nz0, low) ? 1 : -1;
    const nx = (sign * nx0) / len;
    const ny = (sign * ny0) / len;
    const nz = (sign * nz0) / len;
    candidates++;
    // The width along n is at least the gap between the two features, so a candidate whose gap
    // already reaches the best widths cannot improve them and needs no descent.
    const gap = dot(nx, ny, nz, high) - dot(nx, ny, nz, low);
    const verticalGap = Math.abs(nz) > 1e-12 ? gap / Math.abs(nz) : Infinity;
    if (gap >= orthogonal.width && (vertical === null ? verticalGap === Infinity : verticalGap >= vertical.width))
      return;
    const top = lowest(-nx, -ny, -nz, high);
    const bottom = lowest(nx, ny, nz, low);
    const width = dot(nx, ny, nz, top) - dot(nx, ny, nz, bottom);
    if (width < orthogonal.width) {
      orthogonal.width = width;
      orthogonal.nx = nx;
      orthogonal.ny = ny;
      orthogonal.nz = nz;
    }
    // Below this |n_z| the plane is practically vertical and the vertical width meaningless.
    if (Math.abs(nz) > 1e-12) {
      const verticalWidth = width / Math.abs(nz);
      if (vertical === null || verticalWidth < vertical.width) vertical = { nx, ny, nz, width: verticalWidth };
    }
  };

  // Face–vertex pairs, faces in breadth-first order so each descent starts near its answer.
  const lowestOfFace = new Int32Array(faceCount).fill(-1);
  const order = new Int32Array(faceCount);
  const queued = new Uint8Array(faceCount);
  let head = 0;
  let tail = 0;
  for (let seed = 0; seed < faceCount; seed++) {
    if (queued[seed] === 1) continue;
    queued[seed] = 1;
    order[tail++] = seed;
    let startVertex = 0;
    while (head < tail) {
      const f = order[head++] as number;
      const nx = N[3 * f] as number;
      const ny = N[3 * f + 1] as number;
      const nz = N[3 * f + 2] as number;
      const from = lowestOfFace[f] !== -1 ? (lowestOfFace[f] as number) : startVertex;
      const low = lowest(nx, ny, nz, from);
      lowestOfFace[f] = low;
      startVertex = low;
      consider(nx, ny, nz, tri[3 * f] as number, low);
      for (let k = 0; k < 3; k++) {
        const a = tri[3 * f + k] as number;
        const b = tri[3 * f + ((k + 1) % 3)] as number;
        const g = faceOfEdge.get(b * vertexCount + a);
        if (g !== undefined && queued[g] === 0) {
          queued[g] = 1;
          // Hint for the neighbour's descent; replaced by its own answer when it is processed.
          lowestOfFace[g] = low;
          order[tail++] = g;
        }
      }
    }
  }

  // Edge–edge pairs by sweeping each edge's arc on the Gaussian map.
  const stepLimit = 4 * vertexCount + 16;
  for (let f = 0; f < faceCount; f++) {
    for (let k = 0; k < 3; k++) {
      const u = tri[3 * f + k] as number;
      const v = tri[3 * f + ((k + 1) % 3)] as number;
      if (u > v) continue; // each undirected edge once
      const g = faceOfEdge.get(v * vertexCount + u);
      if (g === undefined) continue;
      const fx = N[3 * f] as number;
      const fy = N[3 * f + 1] as number;
      const fz = N[3 * f + 2] as number;
      const gx = N[3 * g] as number;
      const gy = N[3 * g + 1] as number;
      const gz = N[3 * g + 2] as number;
      const dx1 = (hx[v] as number) - (hx[u] as number);
      const dy1 = (hy[v] as number) - (hy[u] as number);
      const dz1 = (hz[v] as number) - (hz[u] as number);
      let m = lowestOfFace[f] as number;
      let t = 0;
      for (let step = 0; step < stepLimit; step++) {
        const mx = hx[m] as number;
        const my = hy[m] as number;
        const mz = hz[m] as number;
        let nextT = Infinity;
        let next = -1;
        for (let q = start[m] as number, end = start[m + 1] as number; q < end; q++) {
          const w = adj[q] as number;
          const ex = (hx[w] as number) - mx;
          const ey = (hy[w] as number) - my;
          const ez = (hz[w] as number) - mz;
          const A = fx * ex + fy * ey + fz * ez;
          const B = gx * ex + gy * ey + gz * ez;
          // n(t)·(w − m) = A + t(B − A) must turn negative for w to become the lowest.
          if (B - A >= 0) continue;
          let crossing = A / (A - B);
          if (!(crossing >= t)) crossing = t;
          if (crossing < nextT) {
            nextT = crossing;
            next = w;
          }
        }
        if (next < 0 || nextT > 1) break;
        const ex = (hx[next] as number) - mx;
        const ey = (hy[next] as number) - my;
        const ez = (hz[next] as number) - mz;
        // Common normal of the two edges, and the arc's direction at the crossing.
        consider(dy1 * ez - dz1 * ey, dz1 * ex - dx1 * ez, dx1 * ey - dy1 * ex, u, m);
        consider((1 - nextT) * fx + nextT * gx, (1 - nextT) * fy + nextT * gy, (1 - nextT) * fz + nextT * gz, u, m);
        m = next;
        t = nextT;
      }
    }
  }
  return { orthogonal, vertical, candidates };
}
