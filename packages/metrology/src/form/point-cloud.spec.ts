import { centrePoints, toPointArrays } from './point-cloud';

describe('point arrays', () => {
  it('centres far-away coordinates to a zero mean without losing the centroid', () => {
    const points = [0, 1, 2, 3].map((i) => ({ x: 1e6 + i * 0.1, y: -2e5 + (i % 2) * 0.01, z: 38.1 + i * 1e-4 }));
    const c = centrePoints(toPointArrays(points));
    const mean = (a: Float64Array): number => a.reduce((s, v) => s + v, 0) / a.length;
    expect(Math.abs(mean(c.x))).toBeLessThan(1e-12);
    expect(Math.abs(mean(c.z))).toBeLessThan(1e-15);
    expect(c.centroid.x).toBeCloseTo(1e6 + 0.15, 9);
    expect(c.centroid.z).toBeCloseTo(38.10015, 12);
    expect(c.extent.x).toBeCloseTo(0.15, 9);
  });

  it('names the point with a non-finite or missing coordinate', () => {
    expect(() =>
      toPointArrays([
        { x: 0, y: 0, z: 0 },
        { x: 0, y: Number.NaN, z: 0 },
      ]),
    ).toThrow(new RangeError('point 1 has a non-finite y coordinate'));
    expect(() => toPointArrays([null as never])).toThrow(/point 0 is not a point/);
    expect(() => toPointArrays([{ x: 0, y: 0 } as never], 'datum point')).toThrow(/datum point 0 has a non-finite z/);
  });
});
