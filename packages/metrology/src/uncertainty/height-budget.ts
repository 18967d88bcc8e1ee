import { mean, sampleStandardDeviation } from 'simple-statistics';
import { comparatorHeight, type ComparatorHeight } from '../comparison/comparator-height';
import {
  combineUncertainty,
  type CombinedUncertainty,
  type CoverageOptions,
  type UncertaintyComponent,
} from './combine-uncertainty';

/** Inputs of the product's standard budget for one height measured by comparison. Lengths in one unit. */
export interface HeightBudgetInput {
  /** Master's calibrated size at 20 °C. */
  masterSize: number;
  /** Expanded uncertainty of the master's calibration, and its coverage factor (from the certificate). */
  masterExpandedUncertainty: number;
  masterCoverageFactor: number;
  /** Degrees of freedom of the master's calibration uncertainty (default Infinity). */
  masterDegreesOfFreedom?: number;
  /** Smallest step of the indicator. */
  indicatorResolution: number;
  /** Readings on the part (one or more at the same place); their mean is used. */
  partReadings: readonly number[];
  /** Readings on the master (one or more); their mean is used. */
  masterReadings: readonly number[];
  /**
   * Repeatability standard deviation of one reading from a previous study (e.g. gauge R&R),
   * used when a side has a single reading; with several readings their own spread is used.
   */
  repeatability?: { standardDeviation: number; degreesOfFreedom?: number };
  partTemperature: number;
  masterTemperature: number;
  partExpansion: number;
  masterExpansion: number;
  /** Standard uncertainty of each temperature measurement, °C. */
  temperatureUncertainty: number;
  /** Standard uncertainty of the part's and the master's expansion coefficients, 1/°C. */
  partExpansionUncertainty: number;
  masterExpansionUncertainty: number;
}

/** A height with its uncertainty budget. */
export interface HeightBudget {
  height: ComparatorHeight;
  components: UncertaintyComponent[];
  uncertainty: CombinedUncertainty;
}

function checkReadings(readings: readonly number[], what: string): void {
  if (!Array.isArray(readings) || readings.length === 0) throw new RangeError(`${what} needs at least one reading`);
  readings.forEach((r, i) => {
    if (typeof r !== 'number' || !Number.isFinite(r))
      throw new RangeError(`${what}: reading ${i} is not a finite number (${String(r)})`);
  });
}

/**
 * The product's standard uncertainty budget for one height by comparison, so that the server
 * and the browser compute the same figures. Model: {@link comparatorHeight} (exact thermal
 * correction to 20 °C, ISO 1); sensitivities are its partial derivatives (JCGM 100:2008 §5.1.3).
 * Components (uncorrelated):
 * - master calibration: U/k from the certificate (normal);
 * - indicator resolution, once for the part reading and once for the master reading: a
 *   rectangular distribution of full width one step, u = res/√12 (JCGM 100:2008 F.2.2.1);
 * - repeatability of each side: s/√n of its readings with n − 1 degrees of freedom when n ≥ 2
 *   (Type A, JCGM 100:2008 §4.2), or a prior repeatability σ/√n when given;
 * - thermal: the part's and the master's temperature (u of the thermometer) and expansion
 *   coefficient (u of α). Near 20 °C the α terms have almost zero sensitivity; that is the
 *   first-order law and GUM H.1 shows the same, so temperatures should be stated honestly.
 * Combined by {@link combineUncertainty} with k = 2 unless a coverage option is given.
 */
export function heightUncertaintyBudget(input: HeightBudgetInput, options: CoverageOptions = {}): HeightBudget {
  checkReadings(input.partReadings, 'part');
  checkReadings(input.masterReadings, 'master');
  for (const [name, value] of [
    ['masterExpandedUncertainty', input.masterExpandedUncertainty],
    ['indicatorResolution', input.indicatorResolution],
    ['temperatureUncertainty', input.temperatureUncertainty],
    ['partExpansionUncertainty', input.partExpansionUncertainty],
    ['masterExpansionUncertainty', input.masterExpansionUncertainty],
  ] as const) {
    if (typeof value !== 'number' || !(value >= 0) || !Number.isFinite(value)) {
      throw new RangeError(`${name} must be a finite number >= 0, got ${String(value)}`);
    }
  }
  if (!(input.masterCoverageFactor > 0))
    throw new RangeError(`masterCoverageFactor must be positive, got ${input.masterCoverageFactor}`);

  const height = comparatorHeight({
    masterSize: input.masterSize,
    masterReading: mean(input.masterReadings as number[]),
    partReading: mean(input.partReadings as number[]),
    partTemperature: input.partTemperature,
    masterTemperature: input.masterTemperature,
    partExpansion: input.partExpansion,
    masterExpansion: input.masterExpansion,
  });
  const c = height.sensitivities;
  const resolution = input.indicatorResolution / Math.sqrt(12);
  const components: UncertaintyComponent[] = [
    {
      name: 'master calibration',
      value: input.masterExpandedUncertainty,
      distribution: 'normal',
      coverageFactor: input.masterCoverageFactor,
      sensitivity: c.masterSize,
      degreesOfFreedom: input.masterDegreesOfFreedom ?? Infinity,
    },
    { name: 'indicator resolution (part reading)', standardUncertainty: resolution, sensitivity: c.partReading },
    { name: 'indicator resolution (master reading)', standardUncertainty: resolution, sensitivity: c.masterReading },
  ];
  const repeatability = (readings: readonly number[], side: 'part' | 'master', sensitivity: number): void => {
    if (readings.length >= 2) {
      components.push({
        name: `repeatability (${side} readings)`,
        standardUncertainty: sampleStandardDeviation(readings as number[]) / Math.sqrt(readings.length),
        sensitivity,
        degreesOfFreedom: readings.length - 1,
      });
    } else if (input.repeatability !== undefined) {
      const s = input.repeatability.standardDeviation;
      if (!(s >= 0) || !Number.isFinite(s))
        throw new RangeError(`repeatability standard deviation must be >= 0, got ${s}`);
      components.push({
        name: `repeatability (${side}, from study)`,
        standardUncertainty: s / Math.sqrt(readings.length),
        sensitivity,
        degreesOfFreedom: input.repeatability.degreesOfFreedom ?? Infinity,
      });
    }
  };
  repeatability(input.partReadings, 'part', c.partReading);
  repeatability(input.masterReadings, 'master', c.masterReading);
  components.push(
    { name: 'part temperature', standardUncertainty: input.temperatureUncertainty, sensitivity: c.partTemperature },
    { name: 'master temperature', standardUncertainty: input.temperatureUncertainty, sensitivity: c.masterTemperature },
    {
      name: 'part expansion coefficient',
      standardUncertainty: input.partExpansionUncertainty,
      sensitivity: c.partExpansion,
    },
    {
      name: 'master expansion coefficient',
      standardUncertainty: input.masterExpansionUncertainty,
      sensitivity: c.masterExpansion,
    },
  );
  return { height, components, uncertainty: combineUncertainty(components, options) };
}
