import { fromMillimetres, type LengthUnit } from './length-units';

/** How finely a length is shown: the step and the number of decimals in one unit. */
export interface DisplayResolution {
  unit: LengthUnit;
  /** Smallest step shown, in `unit`. */
  step: number;
  decimals: number;
  /** Symbol printed after the number. */
  symbol: string;
}

/** `standard` shows inch to a tenth (0.0001 in); `fine` to 0.00001 in. Metric units have one resolution. */
export type ResolutionLevel = 'standard' | 'fine';

const SYMBOLS: Readonly<Record<LengthUnit, string>> = { mm: 'mm', um: 'µm', in: 'in' };

/**
 * The display resolution of a unit, after the trade's habits (common practice):
 * inch to 0.0001 in (a "tenth") or, fine, 0.00001 in; millimetre to 0.0001 mm; micrometre to 0.1 µm.
 */
export function displayResolution(unit: LengthUnit, level: ResolutionLevel = 'standard'): DisplayResolution {
  switch (unit) {
    case 'in':
      return level === 'fine'
        ? { unit, step: 0.00001, decimals: 5, symbol: SYMBOLS.in }
        : { unit, step: 0.0001, decimals: 4, symbol: SYMBOLS.in };
    case 'mm':
      return { unit, step: 0.0001, decimals: 4, symbol: SYMBOLS.mm };
    case 'um':
      return { unit, step: 0.1, decimals: 1, symbol: SYMBOLS.um };
    default:
      throw new RangeError(`unknown length unit "${String(unit)}" (expected mm, um or in)`);
  }
}

/**
 * Rounds `value` to `decimals` places, half away from zero, and prints it without binary
 * artefacts: the scaled value is first cut to 15 significant digits, so 1.50015 prints as
 * 1.50015 and not 1.50014.
 */
export function formatFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) throw new RangeError(`cannot format ${String(value)}`);
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 12) {
    throw new RangeError(`decimals must be an integer from 0 to 12, got ${decimals}`);
  }
  const scaled = Number((Math.abs(value) * 10 ** decimals).toPrecision(15));
  const units = Math.round(scaled);
  if (!Number.isSafeInteger(units)) return value.toFixed(decimals);
  const digits = String(units).padStart(decimals + 1, '0');
  const whole = digits.slice(0, digits.length - decimals);
  const fraction = digits.slice(digits.length - decimals);
  const sign = value < 0 && units !== 0 ? '-' : '';
  return decimals === 0 ? `${sign}${whole}` : `${sign}${whole}.${fraction}`;
}

/** Options of {@link formatLength}. */
export interface FormatLengthOptions {
  level?: ResolutionLevel;
  /** Print the unit symbol after the number (default true). */
  withSymbol?: boolean;
  /** Print a plus sign on positive values, for deviations (default false). */
  signed?: boolean;
}

/**
 * Shows a length stored in millimetres in the user's unit at the trade's resolution
 * ({@link displayResolution}): 38.10381 mm in inch is "1.50015 in" (fine) or "1.5002 in",
 * 0.0025 mm in micrometres is "2.5 µm".
 */
export function formatLength(mm: number, unit: LengthUnit, options: FormatLengthOptions = {}): string {
  const resolution = displayResolution(unit, options.level ?? 'standard');
  const text = formatFixed(fromMillimetres(mm, unit), resolution.decimals);
  const signed = options.signed === true && !text.startsWith('-') && /[1-9]/.test(text) ? `+${text}` : text;
  return options.withSymbol === false ? signed : `${signed} ${resolution.symbol}`;
}

/**
 * Shows a small inch length in the shop's words: "thou" (0.001 in) to one decimal, or
 * "tenths" (0.0001 in) to one decimal. 0.0001 in is "0.1 thou" or "1 tenth" (common practice).
 */
export function formatInchTrade(mm: number, style: 'thou' | 'tenths'): string {
  const inches = fromMillimetres(mm, 'in');
  const count = style === 'thou' ? inches * 1000 : inches * 10000;
  const text = formatFixed(count, 1).replace(/\.0$/, '');
  if (style === 'thou') return `${text} thou`;
  return `${text} ${text === '1' || text === '-1' ? 'tenth' : 'tenths'}`;
}
