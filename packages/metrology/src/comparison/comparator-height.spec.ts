import fc from 'fast-check';
import { comparatorHeight, REFERENCE_TEMPERATURE, type ComparatorInput } from './comparator-height';

describe('comparatorHeight', () => {
  // ISO 1:2022: the standard reference temperature for geometrical product specification is 20 °C.
  it('refers heights to 20 °C', () => {
    expect(REFERENCE_TEMPERATURE).toBe(20);
  });

  // JCGM 100:2008 (GUM) Annex H.1: l_S = 50.000 623 mm, d = 215 nm, both gauges 0.1 °C below 20 °C
  // (θ = −0.1 °C, δθ = 0), α_S = 11.5e-6 /°C, δα = 0  →  l = 50.000 838 mm (references.md, [seen]).
  it('reproduces the GUM H.1 end-gauge result', () => {
    const r = comparatorHeight({
      masterSize: 50.000623,
      masterReading: 0,
      partReading: 0.000215,
      partTemperature: 19.9,
      masterTemperature: 19.9,
      partExpansion: 11.5e-6,
      masterExpansion: 11.5e-6,
    });
    // Half a unit of the published last digit (1 nm).
    expect(Math.abs(r.height - 50.000838)).toBeLessThan(0.5e-6);
    expect(r.difference).toBeCloseTo(0.000215, 15);
  });

  // GUM H.1 first-order model l = l_S + d − l_S·(δα·θ + α_S·δθ): the exact model agrees with it
  // up to second-order terms (products of two small quantities).
  it('agrees with the linearised GUM H.1 model to second order', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 100, noNaN: true }),
        fc.double({ min: -0.01, max: 0.01, noNaN: true }),
        fc.double({ min: 17, max: 23, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: 4e-6, max: 24e-6, noNaN: true }),
        fc.double({ min: -2e-6, max: 2e-6, noNaN: true }),
        (lS, d, tS, dTheta, alphaS, dAlpha) => {
          const theta = tS - 20;
          const exact = comparatorHeight({
            masterSize: lS,
            masterReading: 0.1,
            partReading: 0.1 + d,
            masterTemperature: tS,
            partTemperature: tS + dTheta,
            masterExpansion: alphaS,
            partExpansion: alphaS + dAlpha,
          }).height;
          // GUM H.1 defines θ on the part: here the part is at tS + δθ and the standard at tS.
          const linear = lS + d - lS * (dAlpha * (theta + dTheta) + alphaS * dTheta);
          const secondOrder = lS * (24e-6 * 4) ** 2 + Math.abs(d) * 24e-6 * 4;
          expect(Math.abs(exact - linear)).toBeLessThanOrEqual(secondOrder);
        },
      ),
    );
  });

  // Sensitivity coefficients are partial derivatives (GUM §5.1.3): compare with central differences.
  it('gives sensitivities equal to numerical partial derivatives', () => {
    const input: ComparatorInput = {
      masterSize: 38.1,
      masterReading: 0.0012,
      partReading: -0.0031,
      partTemperature: 21.3,
      masterTemperature: 20.6,
      partExpansion: 11.5e-6,
      masterExpansion: 8.4e-6,
    };
    const r = comparatorHeight(input);
    const steps: Record<keyof ComparatorInput, number> = {
      masterSize: 1e-4,
      masterReading: 1e-4,
      partReading: 1e-4,
      partTemperature: 1e-3,
      masterTemperature: 1e-3,
      partExpansion: 1e-8,
      masterExpansion: 1e-8,
    };
    for (const key of Object.keys(steps) as (keyof ComparatorInput)[]) {
      const h = steps[key];
      const up = comparatorHeight({ ...input, [key]: input[key] + h }).height;
      const down = comparatorHeight({ ...input, [key]: input[key] - h }).height;
      const numeric = (up - down) / (2 * h);
      expect(Math.abs(r.sensitivities[key] - numeric)).toBeLessThanOrEqual(1e-7 * Math.max(1, Math.abs(numeric)));
    }
  });

  it('adds the reading difference to the master size when both are at 20 °C', () => {
    const r = comparatorHeight({
      masterSize: 38.1,
      masterReading: 0.002,
      partReading: 0.0035,
      partTemperature: 20,
      masterTemperature: 20,
      partExpansion: 11.5e-6,
      masterExpansion: 4.5e-6,
    });
    expect(r.height).toBe(38.1 + (0.0035 - 0.002));
    expect(r.thermalCorrection).toBe(0);
  });

  it('rejects non-finite inputs by name', () => {
    expect(() =>
      comparatorHeight({
        masterSize: 1,
        masterReading: 0,
        partReading: Number.NaN,
        partTemperature: 20,
        masterTemperature: 20,
        partExpansion: 0,
        masterExpansion: 0,
      }),
    ).toThrow(new RangeError('partReading must be a finite number, got NaN'));
  });
});
