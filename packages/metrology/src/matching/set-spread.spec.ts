import { fitsBand, setSpread } from './set-spread';

describe('setSpread', () => {
  // Definition (brief, "Matching"): a set's spread is highest − lowest height.
  it('is the highest minus the lowest height', () => {
    expect(setSpread([1.5001, 1.4999, 1.5002, 1.5])).toBeCloseTo(0.0003, 15);
    expect(setSpread([38.1])).toBe(0);
  });

  it('rejects empty sets and non-finite heights', () => {
    expect(() => setSpread([])).toThrow(/set has no heights/);
    expect(() => setSpread([1, Number.NaN])).toThrow(/height 1 is not a finite number/);
  });
});

describe('fitsBand', () => {
  // Decimal heights stored as doubles: 1.5011 − 1.5009 is 0.00020000000000020002 in binary, and
  // a band of 0.0002 in must still hold it; a real step of 0.00001 in must not.
  it('absorbs binary rounding of decimal heights but nothing larger', () => {
    expect(1.5011 - 1.5009 > 0.0002).toBe(true);
    expect(fitsBand(1.5009, 1.5011, 0.0002)).toBe(true);
    expect(fitsBand(1.5009, 1.50111, 0.0002)).toBe(false);
    expect(fitsBand(38.10254, 38.10762, 0.00508)).toBe(true);
  });
});
