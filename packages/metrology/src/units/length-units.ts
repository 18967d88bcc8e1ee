/** A length unit the product shows or accepts. The product stores millimetres. */
export type LengthUnit = 'mm' | 'um' | 'in';

/** Millimetres in one unit. The inch is exactly 25.4 mm (NIST SP 811, Appendix B; 1959 agreement). */
const MILLIMETRES_PER_UNIT: Readonly<Record<LengthUnit, number>> = {
  mm: 1,
  um: 0.001,
  in: 25.4,
};

/** The units accepted by the conversion and formatting functions. */
export const LENGTH_UNITS: readonly LengthUnit[] = ['mm', 'um', 'in'];

/** Type guard for a unit name coming from user input or a stored setting. */
export function isLengthUnit(value: unknown): value is LengthUnit {
  return value === 'mm' || value === 'um' || value === 'in';
}

function checkFinite(value: number, name: string): void {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
}

function checkUnit(unit: string): asserts unit is LengthUnit {
  if (!isLengthUnit(unit)) {
    throw new RangeError(`unknown length unit "${unit}" (expected mm, um or in)`);
  }
}

/**
 * Converts a length given in `unit` to millimetres, the product's stored unit.
 * Definition: 1 in = 25.4 mm exactly (NIST SP 811, App. B), 1 µm = 0.001 mm.
 * Micrometres are divided by 1000 rather than multiplied by 0.001 so that
 * decimal inputs such as 2.5 µm give the nearest double to 0.0025 mm.
 */
export function toMillimetres(value: number, unit: LengthUnit): number {
  checkFinite(value, 'length');
  checkUnit(unit);
  if (unit === 'um') return value / 1000;
  return value * MILLIMETRES_PER_UNIT[unit];
}

/**
 * Converts a length in millimetres to `unit`.
 * Definition: inverse of {@link toMillimetres}; 1 in = 25.4 mm exactly (NIST SP 811).
 */
export function fromMillimetres(mm: number, unit: LengthUnit): number {
  checkFinite(mm, 'length');
  checkUnit(unit);
  if (unit === 'um') return mm * 1000;
  if (unit === 'in') return mm / 25.4;
  return mm;
}
