import { formatSmallLength } from './small-length';

describe('formatSmallLength', () => {
  it('keeps two significant digits of an uncertainty below the display resolution', () => {
    // 0.00007 mm = 2.7559… µin; shown to two significant digits (JCGM 100:2008 7.2.6).
    expect(formatSmallLength(0.00007, 'in')).toBe('0.0000028');
    expect(formatSmallLength(0.00007, 'mm')).toBe('0.000070');
  });

  it('never shows fewer decimals than the trade reads', () => {
    expect(formatSmallLength(0.00254, 'in')).toBe('0.00010');
    expect(formatSmallLength(0.5, 'mm', true)).toBe('0.5000 mm');
  });

  it('shows zero plainly', () => {
    expect(formatSmallLength(0, 'in')).toBe('0.00000');
  });
});
