import { MM_PER_INCH } from '../common/units/lengths';

/*
 * Lengths on a certificate are decimal strings computed with integers, so no binary floating-point
 * noise can reach the signed facts. Stored lengths have 7 decimals of a millimetre (numeric(12,7)).
 */

const STORED_SCALE = 7;
const TEN = 10n;

/** A stored length in mm as an integer count of 1e-7 mm. */
export function toUnits(mm: number): bigint {
  return BigInt(Math.round(mm * 10 ** STORED_SCALE));
}

/** numerator/denominator rounded to an integer, halves away from zero (or always up with `up`). */
function divide(numerator: bigint, denominator: bigint, up: boolean): bigint {
  const negative = numerator < 0n !== denominator < 0n;
  const n = numerator < 0n ? -numerator : numerator;
  const d = denominator < 0n ? -denominator : denominator;
  const quotient = n / d;
  const rest = n % d;
  const bump = up ? rest > 0n : rest * 2n >= d;
  const magnitude = bump ? quotient + 1n : quotient;
  return negative ? -magnitude : magnitude;
}

function text(scaled: bigint, decimals: number): string {
  const negative = scaled < 0n;
  const digits = (negative ? -scaled : scaled).toString().padStart(decimals + 1, '0');
  const whole = digits.slice(0, digits.length - decimals);
  const fraction = digits.slice(digits.length - decimals);
  return `${negative ? '-' : ''}${whole}${decimals ? `.${fraction}` : ''}`;
}

/** 1e-7 mm units as a millimetre string with `decimals` digits. */
export function mmText(units: bigint, decimals: number, up = false): string {
  return text(divide(units * TEN ** BigInt(decimals), TEN ** BigInt(STORED_SCALE), up), decimals);
}

/** 1e-7 mm units as an inch string with `decimals` digits (1 in = 25.4 mm exactly). */
export function inchText(units: bigint, decimals: number, up = false): string {
  // inches = units / 1e7 / 25.4 = units * 10 / (254 * 1e7)
  const inchScale = BigInt(Math.round(MM_PER_INCH * 10));
  return text(divide(units * 10n * TEN ** BigInt(decimals), inchScale * TEN ** BigInt(STORED_SCALE), up), decimals);
}

/** The digits each unit is read to on a certificate: heights and the expanded uncertainty. */
export const DIGITS = {
  height: { in: 5, mm: 4 },
  uncertainty: { in: 6, mm: 5 },
} as const;

/** A length in the spec's unit and in mm; an uncertainty is rounded up, never down (GUM 7.2.6). */
export function lengthPair(units: bigint, unit: 'in' | 'mm', kind: keyof typeof DIGITS): { value: string; mm: string } {
  const up = kind === 'uncertainty';
  const digits = DIGITS[kind];
  return {
    value: unit === 'in' ? inchText(units, digits.in, up) : mmText(units, digits.mm, up),
    mm: mmText(units, digits.mm, up),
  };
}

/** A temperature stored with 2 decimals (°C), as text. */
export function celsiusText(value: number): string {
  return text(BigInt(Math.round(value * 100)), 2);
}
