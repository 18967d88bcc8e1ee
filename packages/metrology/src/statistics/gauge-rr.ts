import { fUpperTail } from './distributions';

/** One row of an ANOVA table. */
export interface AnovaRow {
  source: 'part' | 'operator' | 'part × operator' | 'repeatability' | 'total';
  degreesOfFreedom: number;
  sumOfSquares: number;
  meanSquare: number;
  /** F ratio and its p-value; null for the error and total rows. */
  f: number | null;
  pValue: number | null;
}

/** Variance components (σ²), negative estimates set to 0. */
export interface VarianceComponents {
  part: number;
  operator: number;
  interaction: number;
  repeatability: number;
}

/** Gauge R&R by the ANOVA method. Standard deviations in the unit of the values. */
export interface GaugeRR {
  parts: number;
  operators: number;
  trials: number;
  anova: AnovaRow[];
  variance: VarianceComponents;
  /** σ of repeatability (equipment variation). */
  repeatability: number;
  /** σ of reproducibility: √(σ²_operator + σ²_part×operator). */
  reproducibility: number;
  /** σ of the measurement system: √(repeatability² + reproducibility²). */
  grr: number;
  /** σ between parts. */
  partVariation: number;
  /** √(grr² + partVariation²). */
  totalVariation: number;
  /** 100·grr / totalVariation. */
  pctGrrOfTotal: number;
  /** 100·6·grr / tolerance width, when a tolerance was given; otherwise null. */
  pctGrrOfTolerance: number | null;
  /** Number of distinct categories: floor(1.41·partVariation / grr). */
  ndc: number;
}

/** Input of {@link gaugeRR}. */
export interface GaugeRRInput {
  /** values[part][operator][trial]: every part measured by every operator the same number of times. */
  values: readonly (readonly (readonly number[])[])[];
  /** Tolerance width (upper − lower), for %GR&R of tolerance. */
  tolerance?: number;
}

/**
 * Gauge repeatability and reproducibility by the two-way crossed ANOVA with interaction
 * (random-effects model; Montgomery, Introduction to Statistical Quality Control, §8.7;
 * AIAG MSA 4th ed., ANOVA method). Sums of squares for parts, operators, part × operator and
 * error; expected mean squares give
 *   σ²_e = MS_E, σ²_po = (MS_PO − MS_E)/r, σ²_o = (MS_O − MS_PO)/(p·r), σ²_p = (MS_P − MS_PO)/(o·r),
 * each set to 0 when negative. The interaction is kept, not pooled. Parts and operators are
 * tested against the interaction mean square, the interaction against the error.
 * %GR&R of tolerance = 6·σ_grr / tolerance (the P/T ratio, as a percentage).
 */
export function gaugeRR(input: GaugeRRInput): GaugeRR {
  const { values, tolerance } = input;
  if (!Array.isArray(values) || values.length < 2) throw new RangeError('gauge R&R needs at least 2 parts');
  const p = values.length;
  const o = Array.isArray(values[0]) ? (values[0] as readonly (readonly number[])[]).length : 0;
  if (o < 2) throw new RangeError('gauge R&R needs at least 2 operators');
  const firstCell = (values[0] as readonly (readonly number[])[])[0];
  const r = Array.isArray(firstCell) ? firstCell.length : 0;
  if (r < 2) throw new RangeError('gauge R&R needs at least 2 trials per operator');
  if (tolerance !== undefined && !(tolerance > 0 && Number.isFinite(tolerance))) {
    throw new RangeError(`tolerance must be a positive width, got ${tolerance}`);
  }
  let total = 0;
  values.forEach((part, i) => {
    if (!Array.isArray(part) || part.length !== o)
      throw new RangeError(`part ${i} has ${Array.isArray(part) ? part.length : 0} operators; expected ${o}`);
    part.forEach((cell, j) => {
      if (!Array.isArray(cell) || cell.length !== r) {
        throw new RangeError(
          `part ${i}, operator ${j} has ${Array.isArray(cell) ? cell.length : 0} trials; expected ${r}`,
        );
      }
      cell.forEach((v, k) => {
        if (typeof v !== 'number' || !Number.isFinite(v))
          throw new RangeError(`part ${i}, operator ${j}, trial ${k} is not a finite number`);
        total += v;
      });
    });
  });
  const n = p * o * r;
  const grand = total / n;
  const at = (i: number, j: number, k: number): number =>
    (((values[i] as readonly (readonly number[])[])[j] as readonly number[])[k] as number) - grand;

  // Cell, part and operator means of the centred values.
  const cell = new Float64Array(p * o);
  const partMean = new Float64Array(p);
  const operatorMean = new Float64Array(o);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < o; j++) {
      let s = 0;
      for (let k = 0; k < r; k++) s += at(i, j, k);
      const m = s / r;
      cell[i * o + j] = m;
      partMean[i] = (partMean[i] as number) + m / o;
      operatorMean[j] = (operatorMean[j] as number) + m / p;
    }
  }
  let ssPart = 0;
  for (let i = 0; i < p; i++) ssPart += (partMean[i] as number) ** 2;
  ssPart *= o * r;
  let ssOperator = 0;
  for (let j = 0; j < o; j++) ssOperator += (operatorMean[j] as number) ** 2;
  ssOperator *= p * r;
  let ssInteraction = 0;
  let ssError = 0;
  let ssTotal = 0;
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < o; j++) {
      const m = cell[i * o + j] as number;
      ssInteraction += (m - (partMean[i] as number) - (operatorMean[j] as number)) ** 2;
      for (let k = 0; k < r; k++) {
        const v = at(i, j, k);
        ssError += (v - m) ** 2;
        ssTotal += v * v;
      }
    }
  }
  ssInteraction *= r;

  const dfPart = p - 1;
  const dfOperator = o - 1;
  const dfInteraction = dfPart * dfOperator;
  const dfError = p * o * (r - 1);
  const msPart = ssPart / dfPart;
  const msOperator = ssOperator / dfOperator;
  const msInteraction = ssInteraction / dfInteraction;
  const msError = ssError / dfError;
  const fPart = msPart / msInteraction;
  const fOperator = msOperator / msInteraction;
  const fInteraction = msInteraction / msError;

  const variance: VarianceComponents = {
    repeatability: msError,
    interaction: Math.max(0, (msInteraction - msError) / r),
    operator: Math.max(0, (msOperator - msInteraction) / (p * r)),
    part: Math.max(0, (msPart - msInteraction) / (o * r)),
  };
  const repeatability = Math.sqrt(variance.repeatability);
  const reproducibility = Math.sqrt(variance.operator + variance.interaction);
  const grr = Math.sqrt(variance.repeatability + variance.operator + variance.interaction);
  const partVariation = Math.sqrt(variance.part);
  const totalVariation = Math.hypot(grr, partVariation);
  const ratio = (num: number, den: number): number => (den > 0 ? num / den : Number.NaN);
  return {
    parts: p,
    operators: o,
    trials: r,
    anova: [
      {
        source: 'part',
        degreesOfFreedom: dfPart,
        sumOfSquares: ssPart,
        meanSquare: msPart,
        f: fPart,
        pValue: fUpperTail(fPart, dfPart, dfInteraction),
      },
      {
        source: 'operator',
        degreesOfFreedom: dfOperator,
        sumOfSquares: ssOperator,
        meanSquare: msOperator,
        f: fOperator,
        pValue: fUpperTail(fOperator, dfOperator, dfInteraction),
      },
      {
        source: 'part × operator',
        degreesOfFreedom: dfInteraction,
        sumOfSquares: ssInteraction,
        meanSquare: msInteraction,
        f: fInteraction,
        pValue: fUpperTail(fInteraction, dfInteraction, dfError),
      },
      {
        source: 'repeatability',
        degreesOfFreedom: dfError,
        sumOfSquares: ssError,
        meanSquare: msError,
        f: null,
        pValue: null,
      },
      {
        source: 'total',
        degreesOfFreedom: n - 1,
        sumOfSquares: ssTotal,
        meanSquare: ssTotal / (n - 1),
        f: null,
        pValue: null,
      },
    ],
    variance,
    repeatability,
    reproducibility,
    grr,
    partVariation,
    totalVariation,
    pctGrrOfTotal: 100 * ratio(grr, totalVariation),
    pctGrrOfTolerance: tolerance === undefined ? null : (100 * 6 * grr) / tolerance,
    ndc: grr > 0 ? Math.floor((1.41 * partVariation) / grr) : Infinity,
  };
}
