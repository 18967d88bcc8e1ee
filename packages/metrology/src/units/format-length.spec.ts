import { displayResolution, formatFixed, formatInchTrade, formatLength } from './format-length';
import { toMillimetres } from './length-units';

describe('formatLength', () => {
  // Trade resolution (common practice): inch to 0.0001 in or 0.00001 in, mm to 0.0001 mm, µm to 0.1 µm.
  it('gives the display resolution per unit', () => {
    expect(displayResolution('in')).toMatchObject({ step: 0.0001, decimals: 4, symbol: 'in' });
    expect(displayResolution('in', 'fine')).toMatchObject({ step: 0.00001, decimals: 5 });
    expect(displayResolution('mm')).toMatchObject({ step: 0.0001, decimals: 4, symbol: 'mm' });
    expect(displayResolution('um')).toMatchObject({ step: 0.1, decimals: 1, symbol: 'µm' });
  });

  // 1 in = 25.4 mm exactly (NIST SP 811), so 1.50015 in is stored as 38.10381 mm.
  it('shows a stored millimetre length in inch at the fine and standard resolution', () => {
    const mm = toMillimetres(1.50015, 'in');
    expect(formatLength(mm, 'in', { level: 'fine' })).toBe('1.50015 in');
    expect(formatLength(mm, 'in')).toBe('1.5002 in');
    expect(formatLength(mm, 'mm')).toBe('38.1038 mm');
  });

  it('shows micrometres to one decimal with the micro sign', () => {
    expect(formatLength(0.0025, 'um')).toBe('2.5 µm');
    expect(formatLength(-0.00004, 'um', { signed: true })).toBe('0.0 µm');
    expect(formatLength(0.0012, 'um', { signed: true, withSymbol: false })).toBe('+1.2');
  });

  // Common practice: one "thou" is 0.001 in and one "tenth" is 0.0001 in.
  it('names small inch lengths in thou and tenths', () => {
    const tenth = toMillimetres(0.0001, 'in');
    expect(formatInchTrade(tenth, 'thou')).toBe('0.1 thou');
    expect(formatInchTrade(tenth, 'tenths')).toBe('1 tenth');
    expect(formatInchTrade(toMillimetres(0.00025, 'in'), 'tenths')).toBe('2.5 tenths');
    expect(formatInchTrade(toMillimetres(0.002, 'in'), 'thou')).toBe('2 thou');
  });

  it('rounds half away from zero without binary artefacts', () => {
    expect(formatFixed(1.000005, 5)).toBe('1.00001');
    expect(formatFixed(-1.000005, 5)).toBe('-1.00001');
    expect(formatFixed(-0.00004, 4)).toBe('0.0000');
    expect(formatFixed(0.1 + 0.2, 1)).toBe('0.3');
    expect(() => formatFixed(Number.NaN, 2)).toThrow(RangeError);
  });
});
