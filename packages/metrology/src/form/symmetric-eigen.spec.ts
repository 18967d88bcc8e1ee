import fc from 'fast-check';
import { symmetricEigen3 } from './symmetric-eigen';

describe('symmetricEigen3', () => {
  // Definition: A·v = λ·v with orthonormal v, eigenvalues ascending.
  it('returns orthonormal eigenvectors with A·v = λ·v, eigenvalues ascending', () => {
    const entry = fc.double({ min: -100, max: 100, noNaN: true });
    fc.assert(
      fc.property(fc.tuple(entry, entry, entry, entry, entry, entry), (m) => {
        const { values, vectors } = symmetricEigen3(m);
        const A = [
          [m[0], m[1], m[2]],
          [m[1], m[3], m[4]],
          [m[2], m[4], m[5]],
        ];
        const scale = Math.max(1, ...m.map(Math.abs));
        expect(values[0]).toBeLessThanOrEqual(values[1]);
        expect(values[1]).toBeLessThanOrEqual(values[2]);
        for (let k = 0; k < 3; k++) {
          const v = vectors[k] as number[];
          for (let r = 0; r < 3; r++) {
            const Av = (A[r] as number[]).reduce((s, a, c) => s + a * (v[c] as number), 0);
            expect(Math.abs(Av - values[k]! * v[r]!)).toBeLessThanOrEqual(1e-10 * scale);
          }
          for (let j = 0; j < 3; j++) {
            const dot = v.reduce((s, a, c) => s + a * (vectors[j] as number[])[c]!, 0);
            expect(Math.abs(dot - (j === k ? 1 : 0))).toBeLessThanOrEqual(1e-12);
          }
        }
      }),
      { numRuns: 300 },
    );
  });
});
