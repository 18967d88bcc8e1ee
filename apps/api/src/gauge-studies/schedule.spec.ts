import { gaugeStudySchedule, seededRandom } from './schedule';

describe('gaugeStudySchedule', () => {
  it('gives every inspector every part exactly once per trial, in their own numbered order', () => {
    const schedule = gaugeStudySchedule(12345, 10, 3, 3);
    expect(schedule).toHaveLength(90);
    for (let inspector = 0; inspector < 3; inspector++) {
      const own = schedule.filter((s) => s.inspector === inspector).sort((a, b) => a.sequence - b.sequence);
      expect(own.map((s) => s.sequence)).toEqual(Array.from({ length: 30 }, (_, i) => i + 1));
      for (let trial = 1; trial <= 3; trial++) {
        const parts = own.filter((s) => s.trial === trial).map((s) => s.part);
        expect([...parts].sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
      }
      // Never the same part twice in a row, across trial boundaries too.
      own.slice(1).forEach((s, i) => expect(s.part).not.toBe(own[i]!.part));
    }
  });

  it('draws a different order per inspector and trial, and the same schedule again from the same seed', () => {
    const schedule = gaugeStudySchedule(777, 10, 3, 3);
    const orders = new Set<string>();
    for (let inspector = 0; inspector < 3; inspector++)
      for (let trial = 1; trial <= 3; trial++)
        orders.add(
          schedule
            .filter((s) => s.inspector === inspector && s.trial === trial)
            .map((s) => s.part)
            .join(','),
        );
    expect(orders.size).toBe(9);
    expect(gaugeStudySchedule(777, 10, 3, 3)).toEqual(schedule);
    expect(gaugeStudySchedule(778, 10, 3, 3)).not.toEqual(schedule);
  });

  it('avoids a repeat even with two parts, where half the shuffles would start with the last part', () => {
    for (let seed = 0; seed < 200; seed++) {
      const own = gaugeStudySchedule(seed, 2, 1, 5);
      own.slice(1).forEach((s, i) => expect(s.part).not.toBe(own[i]!.part));
    }
  });

  // The schedule relies on range and reproducibility only, not on any particular sequence.
  it('draws numbers in [0, 1) reproducibly from a seed', () => {
    const a = seededRandom(42);
    const b = seededRandom(42);
    for (let i = 0; i < 1000; i++) {
      const x = a();
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThan(1);
      expect(b()).toBe(x);
    }
  });
});
