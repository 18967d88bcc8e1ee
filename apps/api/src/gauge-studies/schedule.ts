/** One planned measurement: the inspector (by index), the trial (1-based), the part (by index), the order. */
export interface ScheduledMeasurement {
  inspector: number;
  trial: number;
  part: number;
  /** 1-based place in this inspector's own order. */
  sequence: number;
}

/**
 * A small seeded generator (mulberry32, public domain, by Tommy Ettinger), enough to shuffle a
 * schedule reproducibly from the seed stored with the study; not for anything secret.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * The study's schedule: each inspector measures every part once per trial, trial after trial, the
 * parts in a fresh random order each time (Fisher–Yates), drawn from `seed` so the same seed gives
 * the same schedule. A trial never starts with the part that ended the one before, so nobody
 * measures the same part twice in a row (possible whenever there are 2 parts or more).
 */
export function gaugeStudySchedule(
  seed: number,
  parts: number,
  inspectors: number,
  trials: number,
): ScheduledMeasurement[] {
  const random = seededRandom(seed);
  const pick = (n: number) => Math.floor(random() * n);
  const schedule: ScheduledMeasurement[] = [];
  for (let inspector = 0; inspector < inspectors; inspector++) {
    let previousLast = -1;
    for (let trial = 1; trial <= trials; trial++) {
      const order = Array.from({ length: parts }, (_, i) => i);
      for (let i = parts - 1; i > 0; i--) {
        const j = pick(i + 1);
        [order[i], order[j]] = [order[j]!, order[i]!];
      }
      if (parts > 1 && order[0] === previousLast) {
        const j = 1 + pick(parts - 1);
        [order[0], order[j]] = [order[j]!, order[0]!];
      }
      order.forEach((part, k) => schedule.push({ inspector, trial, part, sequence: (trial - 1) * parts + k + 1 }));
      previousLast = order[parts - 1]!;
    }
  }
  return schedule;
}
