import { displayResolution, formatFixed, fromMillimetres, type LengthUnit } from '@evenset/metrology';

/**
 * A small length (an uncertainty, an instrument's resolution) in `unit` with at least the trade's
 * decimals and enough more to keep two significant digits, so 0.00007 mm reads 0.0000028 in and
 * not 0.00000 in. Two significant digits for an uncertainty: JCGM 100:2008 (GUM) 7.2.6.
 */
export function formatSmallLength(mm: number, unit: LengthUnit, withSymbol = false): string {
  const resolution = displayResolution(unit, 'fine');
  const value = fromMillimetres(mm, unit);
  const needed = value === 0 ? 0 : 1 - Math.floor(Math.log10(Math.abs(value)));
  const text = formatFixed(value, Math.min(12, Math.max(resolution.decimals, needed)));
  return withSymbol ? `${text} ${resolution.symbol}` : text;
}
