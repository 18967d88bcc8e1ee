import { convexHull } from './convex-hull';
import { minimumWidth } from './minimum-width';
import { centrePoints } from './point-cloud';
import { rotate } from '../testing/seeded-random';

function widthOf(points: readonly { x: number; y: number; z: number }[]): ReturnType<typeof minimumWidth> {
  const p = centrePoints({
    x: Float64Array.from(points, (q) => q.x),
    y: Float64Array.from(points, (q) => q.y),
    z: Float64Array.from(points, (q) => q.z),
  });
  const hull = convexHull(p);
  if (hull.kind !== 'solid') throw new Error('expected a solid');
  return minimumWidth(hull, p);
}

describe('minimumWidth', () => {
  // Geometry of the regular tetrahedron with edge L: opposite edges are L/√2 apart, which is less
  // than its height L·√(2/3), so its width is an edge–edge pair.
  it('finds the edge–edge width of a regular tetrahedron, in any orientation', () => {
    const L = Math.sqrt(8);
    const tetrahedron = [
      { x: 1, y: 1, z: 1 },
      { x: 1, y: -1, z: -1 },
      { x: -1, y: 1, z: -1 },
      { x: -1, y: -1, z: 1 },
    ];
    for (const q of [
      [1, 0, 0, 0],
      [0.3, -0.2, 0.9, 0.1],
      [0.5, 0.5, 0.5, 0.5],
    ] as const) {
      const w = widthOf(tetrahedron.map((p) => rotate(q, p)));
      expect(w.orthogonal.width).toBeCloseTo(L / Math.SQRT2, 12);
    }
  });

  // A box's width is its shortest side (face–vertex pairs); measured along z it is its height.
  it('finds the shortest side of a box and its vertical height', () => {
    const box = [];
    for (const x of [0, 10]) for (const y of [0, 7]) for (const z of [0, 0.5]) box.push({ x, y, z });
    const w = widthOf(box);
    expect(w.orthogonal.width).toBeCloseTo(0.5, 14);
    expect(Math.abs(w.orthogonal.nz)).toBeCloseTo(1, 14);
    expect(w.vertical?.width).toBeCloseTo(0.5, 14);
  });
});
