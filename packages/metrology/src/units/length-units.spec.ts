import fc from 'fast-check';
import { fromMillimetres, isLengthUnit, LENGTH_UNITS, toMillimetres } from './length-units';

describe('length units', () => {
  // NIST SP 811 (2008), Appendix B: 1 in = 2.54 cm = 25.4 mm exactly (1959 international agreement).
  it('converts one inch to exactly 25.4 mm and back', () => {
    expect(toMillimetres(1, 'in')).toBe(25.4);
    expect(fromMillimetres(25.4, 'in')).toBe(1);
  });

  // SI prefix definition: 1 µm = 1e-3 mm (NIST SP 811 / SI Brochure).
  it('converts micrometres by the SI prefix', () => {
    expect(toMillimetres(2.5, 'um')).toBe(0.0025);
    expect(fromMillimetres(0.0025, 'um')).toBe(2.5);
    expect(toMillimetres(12.7, 'mm')).toBe(12.7);
  });

  // Property: the three units are related by 25.4 mm/in and 1000 µm/mm; round trips are exact to rounding.
  it('round-trips every unit to within rounding', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.constantFrom(...LENGTH_UNITS), (value, unit) => {
        const back = fromMillimetres(toMillimetres(value, unit), unit);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(4 * Number.EPSILON * Math.max(1, Math.abs(value)));
      }),
    );
  });

  it('rejects unknown units and non-finite values with a RangeError', () => {
    expect(() => toMillimetres(Number.NaN, 'mm')).toThrow(RangeError);
    expect(() => fromMillimetres(Infinity, 'in')).toThrow(/finite/);
    expect(() => toMillimetres(1, 'cm' as never)).toThrow(/unknown length unit "cm"/);
    expect(isLengthUnit('in')).toBe(true);
    expect(isLengthUnit('thou')).toBe(false);
  });
});
