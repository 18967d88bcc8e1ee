import { orientation } from './orientation';
import type { PointArrays, Vector3 } from './point-cloud';

/** Triangulated convex hull of a 3-D point set. */
export interface ConvexHull {
  kind: 'solid';
  /** Point indexes of the hull's vertices, ascending. */
  vertices: Int32Array;
  /** Three point indexes per triangle, counter-clockwise seen from outside. */
  triangles: Int32Array;
  /** Outward unit normal per triangle (x, y, z). */
  normals: Float64Array;
  /** Per triangle, n·p of the triangle's plane; every point satisfies n·p <= offset up to rounding. */
  offsets: Float64Array;
}

/** Result when all points lie on one line (or coincide), within rounding. */
export interface CollinearHull {
  kind: 'collinear';
}

/** Result when all points lie on one plane, within rounding. */
export interface PlanarHull {
  kind: 'planar';
  normal: Vector3;
}

/** The hull, or the reason there is none. */
export type HullResult = ConvexHull | CollinearHull | PlanarHull;

class HalfEdge {
  /** Point index at the end of the edge; the start is `prev.head`. */
  head: number;
  face: Face;
  next!: HalfEdge;
  prev!: HalfEdge;
  twin!: HalfEdge;
  constructor(head: number, face: Face) {
    this.head = head;
    this.face = face;
  }
}

class Face {
  a = 0;
  b = 0;
  c = 0;
  nx = 0;
  ny = 0;
  nz = 0;
  offset = 0;
  /** Half-width of the band around the plane where its floating-point distance cannot be trusted. */
  margin = 0;
  edge!: HalfEdge;
  /** First point of this face's outside set, chained through `QuickHull.nextOutside`; -1 when empty. */
  outsideHead = -1;
  outsideCount = 0;
  farthest = -1;
  farthestDistance = 0;
  deleted = false;
}

/**
 * Convex hull of a point set by quickhull (Barber, Dobkin & Huhdanpaa, ACM TOMS 22(4), 1996),
 * with the horizon walk of J. E. Lloyd's QuickHull3D. Every decision — is a point outside a face,
 * does a face see the eye point — uses the exact orientation predicate ({@link orientation}),
 * so the hull is topologically valid even for coplanar, collinear and nearly degenerate input:
 * the faces seen from a point are exactly a disc and the horizon one loop. Plane distances are
 * only used to rank candidate eye points and to skip the exact test when it cannot change the
 * answer. A point lying exactly on a face when it is examined never becomes a vertex, but a
 * vertex added earlier can end up inside a flat face or on an edge of the final hull, so flat
 * faces may be split into several triangles carrying such extra vertices (the width search
 * allows for these plateaus).
 * Coordinates should be centred first. Returns `collinear` or `planar` for input that spans no
 * volume (judged with a tolerance of 3·ε·(max|x| + max|y| + max|z|)).
 */
export function convexHull(points: PointArrays): HullResult {
  const X = points.x;
  const Y = points.y;
  const Z = points.z;
  const n = X.length;
  if (n < 3) return { kind: 'collinear' };

  let maxAbsX = 0;
  let maxAbsY = 0;
  let maxAbsZ = 0;
  let radius = 0;
  const minIdx = [0, 0, 0];
  const maxIdx = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const x = X[i] as number;
    const y = Y[i] as number;
    const z = Z[i] as number;
    if (Math.abs(x) > maxAbsX) maxAbsX = Math.abs(x);
    if (Math.abs(y) > maxAbsY) maxAbsY = Math.abs(y);
    if (Math.abs(z) > maxAbsZ) maxAbsZ = Math.abs(z);
    if (x < (X[minIdx[0] as number] as number)) minIdx[0] = i;
    if (x > (X[maxIdx[0] as number] as number)) maxIdx[0] = i;
    if (y < (Y[minIdx[1] as number] as number)) minIdx[1] = i;
    if (y > (Y[maxIdx[1] as number] as number)) maxIdx[1] = i;
    if (z < (Z[minIdx[2] as number] as number)) minIdx[2] = i;
    if (z > (Z[maxIdx[2] as number] as number)) maxIdx[2] = i;
  }
  radius = Math.hypot(maxAbsX, maxAbsY, maxAbsZ);
  const tolerance = 3 * Number.EPSILON * (maxAbsX + maxAbsY + maxAbsZ);

  // Initial simplex: the widest axis pair, the point farthest from their line, then from their plane.
  const spans = [
    (X[maxIdx[0] as number] as number) - (X[minIdx[0] as number] as number),
    (Y[maxIdx[1] as number] as number) - (Y[minIdx[1] as number] as number),
    (Z[maxIdx[2] as number] as number) - (Z[minIdx[2] as number] as number),
  ];
  let axis = 0;
  if ((spans[1] as number) > (spans[axis] as number)) axis = 1;
  if ((spans[2] as number) > (spans[axis] as number)) axis = 2;
  if ((spans[axis] as number) <= tolerance) return { kind: 'collinear' };
  const v0 = minIdx[axis] as number;
  const v1 = maxIdx[axis] as number;

  const ux0 = (X[v1] as number) - (X[v0] as number);
  const uy0 = (Y[v1] as number) - (Y[v0] as number);
  const uz0 = (Z[v1] as number) - (Z[v0] as number);
  const ulen = Math.hypot(ux0, uy0, uz0);
  const ux = ux0 / ulen;
  const uy = uy0 / ulen;
  const uz = uz0 / ulen;
  let v2 = -1;
  let best = 0;
  for (let i = 0; i < n; i++) {
    const dx = (X[i] as number) - (X[v0] as number);
    const dy = (Y[i] as number) - (Y[v0] as number);
    const dz = (Z[i] as number) - (Z[v0] as number);
    const cx = uy * dz - uz * dy;
    const cy = uz * dx - ux * dz;
    const cz = ux * dy - uy * dx;
    const d = cx * cx + cy * cy + cz * cz;
    if (d > best) {
      best = d;
      v2 = i;
    }
  }
  if (v2 < 0 || Math.sqrt(best) <= tolerance) return { kind: 'collinear' };

  const plane = planeOf(X, Y, Z, v0, v1, v2);
  let v3 = -1;
  best = 0;
  for (let i = 0; i < n; i++) {
    const d = Math.abs(
      plane.nx * (X[i] as number) + plane.ny * (Y[i] as number) + plane.nz * (Z[i] as number) - plane.offset,
    );
    if (d > best) {
      best = d;
      v3 = i;
    }
  }
  const planar: PlanarHull = { kind: 'planar', normal: { x: plane.nx, y: plane.ny, z: plane.nz } };
  if (v3 < 0 || best <= tolerance) return planar;
  const hull = new QuickHull(X, Y, Z, radius);
  if (hull.orient(v0, v1, v2, v3) === 0) return planar;
  return hull.build(v0, v1, v2, v3);
}

interface PlaneOf {
  nx: number;
  ny: number;
  nz: number;
  offset: number;
  /** |u|·|v| / |u × v| for the two edges used: how badly the normal is conditioned. */
  condition: number;
}

/** Plane through three points, normal from the two shorter edges (the better-conditioned cross product). */
function planeOf(X: Float64Array, Y: Float64Array, Z: Float64Array, a: number, b: number, c: number): PlaneOf {
  const ax = X[a] as number;
  const ay = Y[a] as number;
  const az = Z[a] as number;
  const bx = X[b] as number;
  const by = Y[b] as number;
  const bz = Z[b] as number;
  const cx = X[c] as number;
  const cy = Y[c] as number;
  const cz = Z[c] as number;
  const ab = (bx - ax) ** 2 + (by - ay) ** 2 + (bz - az) ** 2;
  const bc = (cx - bx) ** 2 + (cy - by) ** 2 + (cz - bz) ** 2;
  const ca = (ax - cx) ** 2 + (ay - cy) ** 2 + (az - cz) ** 2;
  let nx: number;
  let ny: number;
  let nz: number;
  let edges: number;
  if (ab >= bc && ab >= ca) {
    // Longest edge ab: use the edges meeting at c.
    nx = (ay - cy) * (bz - cz) - (az - cz) * (by - cy);
    ny = (az - cz) * (bx - cx) - (ax - cx) * (bz - cz);
    nz = (ax - cx) * (by - cy) - (ay - cy) * (bx - cx);
    edges = Math.sqrt(ca * bc);
  } else if (bc >= ca) {
    // Longest edge bc: use the edges meeting at a.
    nx = (by - ay) * (cz - az) - (bz - az) * (cy - ay);
    ny = (bz - az) * (cx - ax) - (bx - ax) * (cz - az);
    nz = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    edges = Math.sqrt(ab * ca);
  } else {
    // Longest edge ca: use the edges meeting at b.
    nx = (cy - by) * (az - bz) - (cz - bz) * (ay - by);
    ny = (cz - bz) * (ax - bx) - (cx - bx) * (az - bz);
    nz = (cx - bx) * (ay - by) - (cy - by) * (ax - bx);
    edges = Math.sqrt(ab * bc);
  }
  const len = Math.hypot(nx, ny, nz);
  if (!(len > 0)) return { nx: 0, ny: 0, nz: 0, offset: 0, condition: Infinity };
  nx /= len;
  ny /= len;
  nz /= len;
  const offset = (nx * (ax + bx + cx) + ny * (ay + by + cy) + nz * (az + bz + cz)) / 3;
  return { nx, ny, nz, offset, condition: edges / len };
}

class QuickHull {
  private readonly faces: Face[] = [];
  /** Outside sets as linked lists in one array: no per-face arrays to grow or collect. */
  private readonly nextOutside: Int32Array;

  constructor(
    private readonly X: Float64Array,
    private readonly Y: Float64Array,
    private readonly Z: Float64Array,
    private readonly radius: number,
  ) {
    this.nextOutside = new Int32Array(X.length);
  }

  /** Exact orientation of point p against the triangle (a, b, c): > 0 above, 0 coplanar, < 0 below. */
  orient(a: number, b: number, c: number, p: number): number {
    const { X, Y, Z } = this;
    return orientation(
      X[a] as number,
      Y[a] as number,
      Z[a] as number,
      X[b] as number,
      Y[b] as number,
      Z[b] as number,
      X[c] as number,
      Y[c] as number,
      Z[c] as number,
      X[p] as number,
      Y[p] as number,
      Z[p] as number,
    );
  }

  build(v0: number, v1: number, v2: number, v3: number): ConvexHull {
    const initial: Face[] = [];
    for (const [p, q, r, opposite] of [
      [v0, v1, v2, v3],
      [v0, v3, v1, v2],
      [v1, v3, v2, v0],
      [v2, v3, v0, v1],
    ] as const) {
      // Orient outward: the fourth vertex must lie below the face.
      initial.push(this.orient(p, q, r, opposite) < 0 ? this.makeFace(p, q, r) : this.makeFace(p, r, q));
    }
    this.faces.push(...initial);
    linkTwins(initial);

    const n = this.X.length;
    for (let i = 0; i < n; i++) {
      if (i === v0 || i === v1 || i === v2 || i === v3) continue;
      this.assign(i, initial);
    }

    const pending: Face[] = initial.filter((f) => f.outsideCount > 0);
    const next = this.nextOutside;
    for (let head = 0; head < pending.length; head++) {
      const face = pending[head] as Face;
      if (face.deleted || face.outsideCount === 0) continue;
      const eye = face.farthest;
      const visible: Face[] = [];
      const horizon = this.computeHorizon(eye, face, visible);
      // With exact visibility the seen faces form a disc, so this cannot fail; check anyway.
      if (!isCycle(horizon)) throw new Error('convex hull: the horizon is not a simple loop');
      const created = this.addCone(eye, horizon);
      for (const old of visible) {
        let p = old.outsideHead;
        while (p !== -1) {
          // Read the link first: assigning p to a new face overwrites it.
          const following = next[p] as number;
          if (p !== eye) this.assign(p, created);
          p = following;
        }
        old.outsideHead = -1;
        old.outsideCount = 0;
      }
      for (const f of created) if (f.outsideCount > 0) pending.push(f);
    }
    return this.output();
  }

  private makeFace(a: number, b: number, c: number): Face {
    const face = new Face();
    face.a = a;
    face.b = b;
    face.c = c;
    const e0 = new HalfEdge(b, face);
    const e1 = new HalfEdge(c, face);
    const e2 = new HalfEdge(a, face);
    e0.next = e1;
    e1.next = e2;
    e2.next = e0;
    e0.prev = e2;
    e1.prev = e0;
    e2.prev = e1;
    face.edge = e0;
    const plane = planeOf(this.X, this.Y, this.Z, a, b, c);
    face.nx = plane.nx;
    face.ny = plane.ny;
    face.nz = plane.nz;
    face.offset = plane.offset;
    // Error of n·p − offset: the normal's error (~20ε·condition) times the distance from the
    // face, plus rounding of the dot products; doubled for safety.
    face.margin = Number.EPSILON * this.radius * (64 * plane.condition + 16);
    return face;
  }

  /**
   * Height of point p above the face if it is strictly outside (exactly), otherwise 0.
   * The floating-point distance decides when it is beyond the face's error margin.
   */
  private above(face: Face, p: number): number {
    const d =
      face.nx * (this.X[p] as number) + face.ny * (this.Y[p] as number) + face.nz * (this.Z[p] as number) - face.offset;
    if (d > face.margin) return d;
    if (d < -face.margin) return 0;
    return this.orient(face.a, face.b, face.c, p) > 0 ? Math.max(d, Number.MIN_VALUE) : 0;
  }

  /** Puts point `i` in the outside set of the candidate face it is farthest above, if any. */
  private assign(i: number, candidates: Face[]): void {
    // Same decision as `above`, written out: this loop is where quickhull spends its time.
    const x = this.X[i] as number;
    const y = this.Y[i] as number;
    const z = this.Z[i] as number;
    let bestFace: Face | null = null;
    let bestDistance = 0;
    for (let k = 0; k < candidates.length; k++) {
      const f = candidates[k] as Face;
      let d = f.nx * x + f.ny * y + f.nz * z - f.offset;
      if (d <= f.margin) {
        if (d < -f.margin || this.orient(f.a, f.b, f.c, i) <= 0) continue;
        if (d < Number.MIN_VALUE) d = Number.MIN_VALUE;
      }
      if (d > bestDistance) {
        bestDistance = d;
        bestFace = f;
        // Clearly outside this face: good enough, skip the rest (as QuickHull3D does).
        if (d > 1000 * f.margin) break;
      }
    }
    if (bestFace !== null) {
      this.nextOutside[i] = bestFace.outsideHead;
      bestFace.outsideHead = i;
      bestFace.outsideCount++;
      if (bestDistance > bestFace.farthestDistance) {
        bestFace.farthestDistance = bestDistance;
        bestFace.farthest = i;
      }
    }
  }

  /**
   * Depth-first walk over the faces that see the eye point (Lloyd's calculateHorizon, made
   * iterative). Marks them deleted, collects them in `visible` and returns the horizon edges
   * (edges of visible faces whose twin face stays) in counter-clockwise order.
   */
  private computeHorizon(eye: number, start: Face, visible: Face[]): HalfEdge[] {
    const horizon: HalfEdge[] = [];
    start.deleted = true;
    visible.push(start);
    const edges: HalfEdge[] = [start.edge];
    const remaining: number[] = [3];
    while (edges.length > 0) {
      const top = edges.length - 1;
      const left = remaining[top] as number;
      if (left === 0) {
        edges.pop();
        remaining.pop();
        continue;
      }
      const edge = edges[top] as HalfEdge;
      edges[top] = edge.next;
      remaining[top] = left - 1;
      const opposite = edge.twin.face;
      if (opposite.deleted) continue;
      if (this.above(opposite, eye) > 0) {
        opposite.deleted = true;
        visible.push(opposite);
        // Enter the neighbour through the shared edge and visit its two other edges.
        edges.push(edge.twin.next);
        remaining.push(2);
      } else {
        horizon.push(edge);
      }
    }
    return horizon;
  }

  /** New triangles joining each horizon edge to the eye point, stitched to their neighbours. */
  private addCone(eye: number, horizon: HalfEdge[]): Face[] {
    const created: Face[] = [];
    for (const h of horizon) {
      const face = this.makeFace(h.prev.head, h.head, eye);
      const base = face.edge;
      const outer = h.twin;
      base.twin = outer;
      outer.twin = base;
      created.push(face);
    }
    const k = created.length;
    for (let i = 0; i < k; i++) {
      const f = created[i] as Face;
      const g = created[(i + 1) % k] as Face;
      // f's edge head→eye meets g's edge eye→tail, where g's tail is f's head.
      const up = f.edge.next;
      const down = g.edge.prev;
      up.twin = down;
      down.twin = up;
    }
    this.faces.push(...created);
    return created;
  }

  private output(): ConvexHull {
    const alive = this.faces.filter((f) => !f.deleted);
    const triangles = new Int32Array(alive.length * 3);
    const normals = new Float64Array(alive.length * 3);
    const offsets = new Float64Array(alive.length);
    for (let i = 0; i < alive.length; i++) {
      const f = alive[i] as Face;
      triangles[3 * i] = f.a;
      triangles[3 * i + 1] = f.b;
      triangles[3 * i + 2] = f.c;
      normals[3 * i] = f.nx;
      normals[3 * i + 1] = f.ny;
      normals[3 * i + 2] = f.nz;
      offsets[i] = f.offset;
    }
    // A closed triangulation has V = F/2 + 2 vertices; sort a copy of the corners and keep each once.
    const corners = triangles.slice().sort();
    const vertices = new Int32Array(alive.length / 2 + 2);
    let count = 0;
    for (let k = 0; k < corners.length; k++) {
      if (k === 0 || corners[k] !== corners[k - 1]) vertices[count++] = corners[k] as number;
    }
    return { kind: 'solid', vertices: vertices.subarray(0, count), triangles, normals, offsets };
  }
}

/** Sets the twins of the half-edges of a closed set of triangles by matching reversed edges. */
function linkTwins(faces: Face[]): void {
  const byKey = new Map<string, HalfEdge>();
  for (const f of faces) {
    let e = f.edge;
    for (let k = 0; k < 3; k++) {
      byKey.set(`${e.prev.head},${e.head}`, e);
      e = e.next;
    }
  }
  for (const f of faces) {
    let e = f.edge;
    for (let k = 0; k < 3; k++) {
      const twin = byKey.get(`${e.head},${e.prev.head}`);
      if (twin === undefined) throw new Error('convex hull: initial simplex is not closed');
      e.twin = twin;
      e = e.next;
    }
  }
}

function isCycle(horizon: HalfEdge[]): boolean {
  const k = horizon.length;
  if (k < 3) return false;
  for (let i = 0; i < k; i++) {
    if ((horizon[i] as HalfEdge).head !== (horizon[(i + 1) % k] as HalfEdge).prev.head) return false;
  }
  const tails = new Set<number>();
  for (const e of horizon) tails.add(e.prev.head);
  return tails.size === k;
}
