import type { DisplayUnit } from '@evenset/contracts';

/** 1 in = 25.4 mm exactly (international inch, 1959; NIST SP 811 App. B). */
export const MM_PER_INCH = 25.4;

/**
 * Lengths are stored as numeric(12,7) millimetres: exact decimals, so 0.0001 in (0.00254 mm) and
 * any inch value with up to six decimals come back digit for digit, which floating point would not
 * promise; 7 decimals is 0.1 nm, far below any reading the shop makes.
 */
export const LENGTH_COLUMN = { precision: 12, scale: 7 } as const;
const SCALE = 10 ** LENGTH_COLUMN.scale;

/** A length given in `unit`, in millimetres rounded to the stored scale. */
export function toMm(value: number, unit: DisplayUnit): number {
  const mm = unit === 'in' ? value * MM_PER_INCH : value;
  return Math.round(mm * SCALE) / SCALE;
}

/** Like `toMm`, passing null and undefined through as null. */
export function toMmOrNull(value: number | null | undefined, unit: DisplayUnit): number | null {
  return value == null ? null : toMm(value, unit);
}
