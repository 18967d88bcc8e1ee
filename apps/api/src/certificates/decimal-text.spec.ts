import { celsiusText, inchText, lengthPair, mmText, toUnits } from './decimal-text';

// 1 in = 25.4 mm exactly (NIST SP 811, App. B); expected strings worked by hand.
describe('certificate lengths as decimal text', () => {
  it('converts exactly: 38.1 mm is 1.50000 in, 0.00254 mm is one tenth (0.0001 in)', () => {
    expect(inchText(toUnits(38.1), 5)).toBe('1.50000');
    expect(inchText(toUnits(0.00254), 4)).toBe('0.0001');
    expect(mmText(toUnits(38.10008), 4)).toBe('38.1001');
  });

  it('rounds halves away from zero, and an uncertainty always up', () => {
    expect(mmText(toUnits(0.00005), 4)).toBe('0.0001');
    expect(mmText(toUnits(-0.00005), 4)).toBe('-0.0001');
    expect(mmText(toUnits(0.0000499), 4)).toBe('0.0000');
    // 0.00132 mm = 0.0000519685… in: 0.000052 rounded up at 6 decimals.
    expect(lengthPair(toUnits(0.00132), 'in', 'uncertainty')).toEqual({ value: '0.000052', mm: '0.00132' });
    expect(lengthPair(toUnits(0.001321), 'mm', 'uncertainty')).toEqual({ value: '0.00133', mm: '0.00133' });
  });

  it('never carries binary noise: 0.1 + 0.2 mm prints as 0.3000', () => {
    expect(mmText(toUnits(0.1) + toUnits(0.2), 4)).toBe('0.3000');
    expect(celsiusText(20.45)).toBe('20.45');
    expect(celsiusText(20)).toBe('20.00');
  });
});
