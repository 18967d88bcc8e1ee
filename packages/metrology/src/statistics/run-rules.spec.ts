import { runRules } from './run-rules';

// Rules as listed in the NIST/SEMATECH e-Handbook §6.3.2 (Western Electric rules; from memory).
// Inputs are in units of sigma around a centre of 0.
describe('runRules', () => {
  it('flags one point beyond 3 sigma', () => {
    expect(runRules([0.5, -0.2, 3.2, 0.1], 0, 1)).toEqual([
      { rule: 1, index: 2, side: 'high', description: 'one point more than 3 sigma from the centre line (high side)' },
    ]);
    expect(runRules([0, -3.01], 0, 1)[0]).toMatchObject({ rule: 1, index: 1, side: 'low' });
  });

  it('flags 2 of 3 points beyond 2 sigma on one side, not on opposite sides', () => {
    expect(runRules([2.5, 0.3, 2.1], 0, 1)).toEqual([expect.objectContaining({ rule: 2, index: 2, side: 'high' })]);
    expect(runRules([2.5, 0.3, -2.1], 0, 1)).toEqual([]);
  });

  it('flags 4 of 5 points beyond 1 sigma on one side', () => {
    const signals = runRules([-1.5, -1.2, 0.2, -1.1, -1.8], 0, 1);
    expect(signals).toEqual([expect.objectContaining({ rule: 3, index: 4, side: 'low' })]);
  });

  it('flags 8 points in a row on one side; a point on the centre line breaks the run', () => {
    expect(runRules([0.1, 0.2, 0.3, 0.1, 0.5, 0.2, 0.4, 0.3], 0, 1)).toEqual([
      {
        rule: 4,
        index: 7,
        side: 'high',
        description: '8 points in a row on the same side of the centre line (high side)',
      },
    ]);
    expect(runRules([0.1, 0.2, 0.3, 0, 0.5, 0.2, 0.4, 0.3], 0, 1)).toEqual([]);
  });

  it('scales by the centre and sigma given', () => {
    expect(runRules([38.1, 38.1 + 3.5 * 0.0001], 38.1, 0.0001)).toEqual([
      expect.objectContaining({ rule: 1, index: 1, side: 'high' }),
    ]);
  });

  it('rejects a non-positive sigma', () => {
    expect(() => runRules([1], 0, 0)).toThrow(/sigma must be positive/);
  });
});
