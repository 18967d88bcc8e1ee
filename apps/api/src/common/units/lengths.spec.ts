import { MM_PER_INCH, toMm, toMmOrNull } from './lengths';

describe('lengths', () => {
  // 1 in = 25.4 mm exactly: NIST SP 811 (2008), Appendix B.
  it('converts inches to millimetres exactly at the stored scale', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(toMm(1.5, 'in')).toBe(38.1); // 1.5 × 25.4 is 38.099999… in binary floating point
    expect(toMm(0.0001, 'in')).toBe(0.00254); // a "tenth"
    expect(toMm(-0.0004, 'in')).toBe(-0.01016);
    expect(toMm(0.000001, 'in')).toBe(0.0000254);
    expect(toMm(6, 'in')).toBe(152.4);
  });

  it('keeps millimetres as they are, rounded to 0.1 nm', () => {
    expect(toMm(40, 'mm')).toBe(40);
    expect(toMm(0.00123456789, 'mm')).toBe(0.0012346);
  });

  it('passes a missing length through as null', () => {
    expect(toMmOrNull(undefined, 'in')).toBeNull();
    expect(toMmOrNull(null, 'mm')).toBeNull();
    expect(toMmOrNull(0.0002, 'in')).toBe(0.00508);
  });
});
