import { seededRandom } from '../testing/seeded-random';
import { heightUncertaintyBudget, type HeightBudgetInput } from './height-budget';

const base: HeightBudgetInput = {
  masterSize: 38.10012,
  masterExpandedUncertainty: 0.00008,
  masterCoverageFactor: 2,
  indicatorResolution: 0.0001,
  partReadings: [0.0021],
  masterReadings: [0.0003],
  partTemperature: 21.2,
  masterTemperature: 20.4,
  partExpansion: 11.5e-6,
  masterExpansion: 11.5e-6,
  temperatureUncertainty: 0.3,
  partExpansionUncertainty: 1e-6 / Math.sqrt(3),
  masterExpansionUncertainty: 1e-6 / Math.sqrt(3),
};

/** Box–Muller normal deviate from a uniform generator. */
function normal(random: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

describe('heightUncertaintyBudget', () => {
  // JCGM 100:2008: resolution as a rectangular distribution of full width one step, u = res/√12
  // (F.2.2.1); calibration U/k (4.3.3); Type A standard deviation of the mean s/√n with n − 1 dof (4.2).
  it('builds the standard components', () => {
    const r = heightUncertaintyBudget({
      ...base,
      partReadings: [0.0021, 0.0023, 0.002],
      masterReadings: [0.0003, 0.0002],
    });
    const byName = new Map(r.uncertainty.components.map((c) => [c.name, c]));
    expect(byName.get('master calibration')?.standardUncertainty).toBeCloseTo(0.00004, 15);
    expect(byName.get('indicator resolution (part reading)')?.standardUncertainty).toBeCloseTo(
      0.0001 / Math.sqrt(12),
      15,
    );
    expect(byName.get('indicator resolution (master reading)')?.standardUncertainty).toBeCloseTo(
      0.0001 / Math.sqrt(12),
      15,
    );
    const part = [0.0021, 0.0023, 0.002];
    const mean = part.reduce((s, v) => s + v, 0) / 3;
    const s = Math.sqrt(part.reduce((acc, v) => acc + (v - mean) ** 2, 0) / 2);
    expect(byName.get('repeatability (part readings)')?.standardUncertainty).toBeCloseTo(s / Math.sqrt(3), 15);
    expect(byName.get('repeatability (part readings)')?.degreesOfFreedom).toBe(2);
    expect(byName.get('repeatability (master readings)')?.degreesOfFreedom).toBe(1);
    expect(r.height.height).toBeCloseTo(r.height.uncorrected + r.height.thermalCorrection, 15);
    expect(r.uncertainty.coverageFactor).toBe(2);
  });

  // Independent check by Monte Carlo propagation (JCGM 101:2008, GUM Supplement 1): draw every
  // input from its distribution, evaluate the exact model, compare the spread with u_c.
  it('agrees with a Monte Carlo propagation of the same inputs', () => {
    const r = heightUncertaintyBudget(base);
    const random = seededRandom(1234);
    const uT = base.temperatureUncertainty;
    const trials = 200_000;
    let sum = 0;
    let sumSq = 0;
    for (let i = 0; i < trials; i++) {
      const masterSize = base.masterSize + (base.masterExpandedUncertainty / 2) * normal(random);
      const partReading = 0.0021 + (random() - 0.5) * base.indicatorResolution;
      const masterReading = 0.0003 + (random() - 0.5) * base.indicatorResolution;
      const tP = base.partTemperature + uT * normal(random) - 20;
      const tM = base.masterTemperature + uT * normal(random) - 20;
      const aP = base.partExpansion + (random() - 0.5) * 2e-6;
      const aM = base.masterExpansion + (random() - 0.5) * 2e-6;
      const h = (masterSize * (1 + aM * tM) + partReading - masterReading) / (1 + aP * tP);
      sum += h;
      sumSq += h * h;
    }
    const mean = sum / trials;
    const sd = Math.sqrt((sumSq - trials * mean * mean) / (trials - 1));
    // 200 000 draws estimate a standard deviation to about 0.2 %; allow 2 %.
    expect(Math.abs(sd / r.uncertainty.combinedStandardUncertainty - 1)).toBeLessThan(0.02);
    expect(Math.abs(mean - r.height.height)).toBeLessThan(3 * (sd / Math.sqrt(trials)) + 1e-9);
  });

  it('uses a prior repeatability for single readings and none otherwise', () => {
    const none = heightUncertaintyBudget(base);
    expect(none.uncertainty.components.some((c) => c.name.startsWith('repeatability'))).toBe(false);
    const prior = heightUncertaintyBudget({
      ...base,
      repeatability: { standardDeviation: 0.0002, degreesOfFreedom: 60 },
    });
    const part = prior.uncertainty.components.find((c) => c.name === 'repeatability (part, from study)');
    expect(part?.standardUncertainty).toBe(0.0002);
    expect(part?.degreesOfFreedom).toBe(60);
  });

  it('gives zero sensitivity to expansion coefficients at exactly 20 °C without breaking', () => {
    const r = heightUncertaintyBudget({ ...base, partTemperature: 20, masterTemperature: 20 });
    const alpha = r.uncertainty.components.filter((c) => c.name.includes('expansion coefficient'));
    expect(alpha.every((c) => c.sensitivity === 0 && c.contribution === 0)).toBe(true);
    expect(Number.isFinite(r.uncertainty.expandedUncertainty)).toBe(true);
  });

  it('names the bad input', () => {
    expect(() => heightUncertaintyBudget({ ...base, partReadings: [] })).toThrow(/part needs at least one reading/);
    expect(() => heightUncertaintyBudget({ ...base, masterReadings: [0.1, Number.NaN] })).toThrow(
      /master: reading 1 is not a finite number/,
    );
    expect(() => heightUncertaintyBudget({ ...base, indicatorResolution: -0.001 })).toThrow(
      /indicatorResolution must be a finite number >= 0/,
    );
  });
});
