/** ISO 1:2022 standard reference temperature for geometrical product specification, °C. */
export const REFERENCE_TEMPERATURE = 20;

/** Inputs of a height measured by comparison with a master gauge. Lengths in one unit, temperatures in °C. */
export interface ComparatorInput {
  /** Calibrated size of the master at 20 °C (from its calibration certificate). */
  masterSize: number;
  /** Indicator reading on the master (zeroing reading). */
  masterReading: number;
  /** Indicator reading on the part. */
  partReading: number;
  /** Part temperature, °C. */
  partTemperature: number;
  /** Master temperature, °C. */
  masterTemperature: number;
  /** Part's linear thermal expansion coefficient, 1/°C (e.g. 11.5e-6 for gauge steel). */
  partExpansion: number;
  /** Master's linear thermal expansion coefficient, 1/°C. */
  masterExpansion: number;
}

/** A height by comparison and the parts it is made of. */
export interface ComparatorHeight {
  /** The part's height at 20 °C. */
  height: number;
  /** Master size plus the reading difference, with no temperature correction. */
  uncorrected: number;
  /** partReading − masterReading. */
  difference: number;
  /** The master's length at its measured temperature. */
  masterAtTemperature: number;
  /** The part's length at its measured temperature (= masterAtTemperature + difference). */
  partAtTemperature: number;
  /** height − uncorrected: what the temperature correction changed. */
  thermalCorrection: number;
  /** Partial derivatives of `height` with respect to each input (GUM sensitivity coefficients). */
  sensitivities: ComparatorSensitivities;
}

/** ∂height/∂input for each input of {@link comparatorHeight}. */
export interface ComparatorSensitivities {
  masterSize: number;
  masterReading: number;
  partReading: number;
  partTemperature: number;
  masterTemperature: number;
  partExpansion: number;
  masterExpansion: number;
}

function finite(value: number, name: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
  return value;
}

/**
 * Height of a part measured by comparison with a master gauge, referred to 20 °C (ISO 1).
 * The comparator shows the difference of the two lengths at their own temperatures:
 *   L_part(t_P) − L_master(t_M) = partReading − masterReading = d,
 * with L(t) = L₂₀·(1 + α·(t − 20)). Hence the model (exact, not linearised):
 *   height = (masterSize·(1 + α_M·(t_M − 20)) + d) / (1 + α_P·(t_P − 20)).
 * To first order this is the GUM H.1 model l = l_S + d − l_S·(δα·θ + α_S·δθ) (JCGM 100:2008).
 * Sensitivities are the exact partial derivatives of this model.
 */
export function comparatorHeight(input: ComparatorInput): ComparatorHeight {
  const masterSize = finite(input.masterSize, 'masterSize');
  const masterReading = finite(input.masterReading, 'masterReading');
  const partReading = finite(input.partReading, 'partReading');
  const tP = finite(input.partTemperature, 'partTemperature') - REFERENCE_TEMPERATURE;
  const tM = finite(input.masterTemperature, 'masterTemperature') - REFERENCE_TEMPERATURE;
  const aP = finite(input.partExpansion, 'partExpansion');
  const aM = finite(input.masterExpansion, 'masterExpansion');
  const difference = partReading - masterReading;
  const masterGrowth = 1 + aM * tM;
  const partGrowth = 1 + aP * tP;
  if (!(partGrowth > 0) || !(masterGrowth > 0)) {
    throw new RangeError('expansion coefficient and temperature give a non-physical length');
  }
  const masterAtTemperature = masterSize * masterGrowth;
  const partAtTemperature = masterAtTemperature + difference;
  const height = partAtTemperature / partGrowth;
  const uncorrected = masterSize + difference;
  return {
    height,
    uncorrected,
    difference,
    masterAtTemperature,
    partAtTemperature,
    thermalCorrection: height - uncorrected,
    sensitivities: {
      masterSize: masterGrowth / partGrowth,
      masterReading: -1 / partGrowth,
      partReading: 1 / partGrowth,
      masterTemperature: (masterSize * aM) / partGrowth,
      masterExpansion: (masterSize * tM) / partGrowth,
      partTemperature: (-height * aP) / partGrowth,
      partExpansion: (-height * tP) / partGrowth,
    },
  };
}
