import { xbarR } from '@evenset/metrology';
import { commonSize, histogram, signalsOf, subgroupChart } from './trend-charts';

describe('trend charts', () => {
  it('takes the subgroup size that keeps the most values, at most 25, ties to the smaller', () => {
    expect(commonSize([5, 5, 3])).toBe(5); // 10 values against 9 at size 3
    expect(commonSize([6, 4, 4, 8])).toBe(4); // the demo's RB-40 lots: 16 values against 12 at 6
    expect(commonSize([4, 2, 2, 2])).toBe(2); // 8 either way: the smaller size keeps every lot
    expect(commonSize([40, 40])).toBe(25);
    expect(commonSize([7])).toBeNull();
    expect(commonSize([1, 1, 1])).toBeNull();
  });

  it('charts the first values of larger subgroups and names those left out', () => {
    const chart = subgroupChart('lot', [
      { label: 'L1', serials: ['a', 'b', 'c'], heights: [1, 2, 3] },
      { label: 'L2', serials: ['d'], heights: [4] },
      { label: 'L3', serials: ['e', 'f'], heights: [5, 7] },
    ]);
    expect(chart.size).toBe(2);
    expect(chart.subgroups.map((g) => g.serials)).toEqual([
      ['a', 'b'],
      ['e', 'f'],
    ]);
    expect(chart.xbar).toEqual(
      xbarR([
        [1, 2],
        [5, 7],
      ]).xbar,
    );
    expect(chart.leftOut).toEqual([{ label: 'L2', count: 1, reason: 'fewer than 2 values' }]);
    expect(chart.trimmed).toEqual([{ label: 'L1', count: 3 }]);
  });

  // Patterns built from the rules' own wording (Western Electric, as listed in NIST/SEMATECH
  // e-Handbook §6.3.2), with σ = 1 from limits at ±3.
  const limits = { centre: 0, lower: -3, upper: 3 };
  it('names the points that make each run-rule pattern', () => {
    const eight = signalsOf('individuals', Array(8).fill(0.5), limits, 'abcdefgh'.split(''));
    expect(eight).toEqual([expect.objectContaining({ rule: 4, index: 7, points: 'abcdefgh'.split('') })]);
    const two = signalsOf('xbar', [0, 2.5, -0.5, 2.5], limits, ['L1', 'L2', 'L3', 'L4']);
    expect(two).toEqual([
      expect.objectContaining({ rule: 2, side: 'high', index: 3, indexes: [1, 3], points: ['L2', 'L4'] }),
    ]);
    expect(signalsOf('individuals', [0, -3.5], limits, ['x', 'y'])).toEqual([
      expect.objectContaining({ rule: 1, side: 'low', points: ['y'] }),
    ]);
  });

  it("bins heights by Sturges' rule, every height counted once", () => {
    // Sturges (1926): ⌈log2 16⌉ + 1 = 5 bins.
    const bins = histogram(Array.from({ length: 16 }, (_, i) => 10 + i));
    expect(bins).toHaveLength(5);
    expect(bins[0]!.from).toBe(10);
    expect(bins[4]!.to).toBe(25);
    expect(bins.map((b) => b.count)).toEqual([3, 3, 3, 3, 4]);
    expect(histogram([])).toEqual([]);
  });
});
