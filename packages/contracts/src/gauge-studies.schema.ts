import { z } from 'zod';
import { reasonSchema } from './masters.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Gauge studies: several inspectors measure the same parts several times each, blind and in a
 * random order, so the spread of the gauge and of the people can be told from the spread of the
 * parts (gauge R&R by the ANOVA method). Lengths in answers are millimetres.
 *
 * A measurement is one indicator reading against the study's master (zeroed on it), in the body's
 * `unit`; the height is the master's calibrated size + the reading. No temperature correction:
 * every reading of a study is made on the same parts at the same plate, and a common offset does
 * not change the analysis.
 *
 * Routes (roles):
 * - GET  /api/gauge-studies                                   engineer   → { items: GaugeStudySummary[] }
 * - POST /api/gauge-studies                                   engineer   `createGaugeStudySchema` → GaugeStudyDetail
 * - GET  /api/gauge-studies/:id                               engineer   → GaugeStudyDetail (measurements, result when complete)
 * - GET  /api/gauge-studies/inspectors                        engineer   → { items: { id, displayName }[] } (active inspectors)
 * - GET  /api/gauge-studies/waiting                           inspector  → { items: WaitingGaugeStudy[] } (the caller's own)
 * - GET  /api/gauge-studies/:id/next                          inspector  → GaugeStudyTurn (the caller's next part; never a result)
 * - POST /api/gauge-studies/:id/measurements                  inspector  `gaugeMeasurementInputSchema` → GaugeStudyTurn
 * - POST /api/gauge-studies/:id/measurements/:measurementId/corrections
 *                                                             inspector  `gaugeCorrectionInputSchema` → GaugeStudyTurn
 * Measurements are never changed or deleted; a correction is a new record superseding one.
 */

/** Limits of a study's size: at least 2 of each so the ANOVA has degrees of freedom; at most what a shift can measure. */
export const GAUGE_STUDY_LIMITS = {
  parts: { min: 2, max: 20 },
  inspectors: { min: 2, max: 5 },
  trials: { min: 2, max: 5 },
} as const;

const count = (what: string, { min, max }: { min: number; max: number }) => `Choose between ${min} and ${max} ${what}.`;

export const createGaugeStudySchema = z.object({
  name: z
    .string({ error: 'Name the study.' })
    .trim()
    .min(3, 'Use at least 3 characters for the name.')
    .max(120, 'Use at most 120 characters for the name.'),
  /** A released spec revision: its part number names the parts, its band is the tolerance. */
  specId: z.uuid({ error: 'Choose a released spec revision.' }),
  partIds: z
    .array(z.uuid({ error: 'This is not a valid part id.' }), { error: 'Choose the parts.' })
    .min(GAUGE_STUDY_LIMITS.parts.min, count('parts', GAUGE_STUDY_LIMITS.parts))
    .max(GAUGE_STUDY_LIMITS.parts.max, count('parts', GAUGE_STUDY_LIMITS.parts))
    .refine((ids) => new Set(ids).size === ids.length, 'Choose each part once.'),
  inspectorIds: z
    .array(z.uuid({ error: 'This is not a valid person id.' }), { error: 'Choose the inspectors.' })
    .min(GAUGE_STUDY_LIMITS.inspectors.min, count('inspectors', GAUGE_STUDY_LIMITS.inspectors))
    .max(GAUGE_STUDY_LIMITS.inspectors.max, count('inspectors', GAUGE_STUDY_LIMITS.inspectors))
    .refine((ids) => new Set(ids).size === ids.length, 'Choose each inspector once.'),
  trials: z
    .number({ error: 'Enter the number of trials.' })
    .int('The number of trials must be a whole number.')
    .min(GAUGE_STUDY_LIMITS.trials.min, count('trials', GAUGE_STUDY_LIMITS.trials))
    .max(GAUGE_STUDY_LIMITS.trials.max, count('trials', GAUGE_STUDY_LIMITS.trials)),
  instrumentId: z.uuid({ error: 'Choose an instrument.' }),
  masterId: z.uuid({ error: 'Choose a master gauge.' }),
});
export type CreateGaugeStudyInput = z.infer<typeof createGaugeStudySchema>;

const readingSchema = z.number({ error: 'Enter the reading as a number.' });

/** One reading for the caller's current slot (the `slotId` the turn named, so a double Enter saves once). */
export const gaugeMeasurementInputSchema = z.object({
  slotId: z.uuid({ error: 'This is not a valid slot id.' }),
  unit: displayUnitSchema,
  reading: readingSchema,
});
export type GaugeMeasurementInput = z.infer<typeof gaugeMeasurementInputSchema>;

export const gaugeCorrectionInputSchema = z.object({
  unit: displayUnitSchema,
  reading: readingSchema,
  reason: reasonSchema,
});
export type GaugeCorrectionInput = z.infer<typeof gaugeCorrectionInputSchema>;

const gaugeRef = z.object({ id: z.string(), code: z.string() });
const personRef = z.object({ id: z.string(), displayName: z.string() });

export const gaugeStudySummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  partNumber: z.string(),
  revision: z.string(),
  parts: z.number(),
  inspectors: z.array(personRef),
  trials: z.number(),
  /** Measurements in force (not superseded) and the number the schedule asks for. */
  measured: z.number(),
  planned: z.number(),
  complete: z.boolean(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type GaugeStudySummary = z.infer<typeof gaugeStudySummarySchema>;

export const anovaRowSchema = z.object({
  source: z.enum(['part', 'operator', 'part × operator', 'repeatability', 'total']),
  degreesOfFreedom: z.number(),
  sumOfSquares: z.number(),
  meanSquare: z.number(),
  f: z.number().nullable(),
  pValue: z.number().nullable(),
});
export type AnovaTableRow = z.infer<typeof anovaRowSchema>;

/** The usual reading of %GR&R (common practice): under 10 %, 10–30 %, over 30 %. */
export const grrVerdictSchema = z.enum(['acceptable', 'may-be-acceptable', 'not-acceptable']);
export type GrrVerdict = z.infer<typeof grrVerdictSchema>;

export function grrVerdict(percent: number): GrrVerdict {
  if (percent < 10) return 'acceptable';
  if (percent <= 30) return 'may-be-acceptable';
  return 'not-acceptable';
}

/** The analysis of a complete study; sums of squares in mm², standard deviations in mm. */
export const gaugeStudyResultSchema = z.object({
  anova: z.array(anovaRowSchema),
  variance: z.object({ part: z.number(), operator: z.number(), interaction: z.number(), repeatability: z.number() }),
  /** σ of repeatability (equipment variation, EV). */
  repeatability: z.number(),
  /** σ of reproducibility (appraiser variation with the interaction, AV). */
  reproducibility: z.number(),
  grr: z.number(),
  partVariation: z.number(),
  totalVariation: z.number(),
  pctGrrOfTotal: z.number(),
  /** 6·σ_GRR over the spec band's width (P/T), %. */
  pctGrrOfTolerance: z.number(),
  tolerance: z.number(),
  ndc: z.number(),
  verdictOfTotal: grrVerdictSchema,
  verdictOfTolerance: grrVerdictSchema,
});
export type GaugeStudyResult = z.infer<typeof gaugeStudyResultSchema>;

export const gaugeStudyMeasurementSchema = z.object({
  id: z.string(),
  slotId: z.string(),
  partId: z.string(),
  serial: z.string(),
  inspectorId: z.string(),
  trial: z.number(),
  sequence: z.number(),
  readingMm: z.number(),
  heightMm: z.number(),
  supersedesId: z.string().nullable(),
  supersededById: z.string().nullable(),
  reason: z.string().nullable(),
  recordedBy: z.string(),
  createdAt: z.string(),
});
export type GaugeStudyMeasurement = z.infer<typeof gaugeStudyMeasurementSchema>;

export const gaugeStudyDetailSchema = gaugeStudySummarySchema.extend({
  specId: z.string(),
  nominalMm: z.number(),
  bandLowerMm: z.number(),
  bandUpperMm: z.number(),
  instrument: gaugeRef,
  master: gaugeRef.extend({ calibratedSizeMm: z.number(), certificateNumber: z.string() }),
  /** The seed of the schedule's shuffle, kept so the order can be drawn again. */
  seed: z.number(),
  partList: z.array(z.object({ id: z.string(), serial: z.string() })),
  progress: z.array(personRef.extend({ measured: z.number(), planned: z.number() })),
  /** Every measurement, superseded ones included, oldest first. */
  measurements: z.array(gaugeStudyMeasurementSchema),
  result: gaugeStudyResultSchema.nullable(),
});
export type GaugeStudyDetail = z.infer<typeof gaugeStudyDetailSchema>;

export const waitingGaugeStudySchema = z.object({
  id: z.string(),
  name: z.string(),
  partNumber: z.string(),
  instrument: z.string(),
  master: z.string(),
  measured: z.number(),
  planned: z.number(),
});
export type WaitingGaugeStudy = z.infer<typeof waitingGaugeStudySchema>;

/**
 * What the Bench shows an inspector: the next part by serial, and nothing measured before. The
 * last saved measurement is named (not its value) so a typing slip can be corrected.
 */
export const gaugeStudyTurnSchema = z.object({
  studyId: z.string(),
  name: z.string(),
  partNumber: z.string(),
  instrument: z.string(),
  master: z.string(),
  measured: z.number(),
  planned: z.number(),
  /** For the typo guard only: the reading a mid-band part gives against the master, and the band's width (mm). */
  expectedReadingMm: z.number(),
  bandWidthMm: z.number(),
  next: z.object({ slotId: z.string(), serial: z.string(), trial: z.number(), sequence: z.number() }).nullable(),
  lastSaved: z.object({ measurementId: z.string(), serial: z.string(), sequence: z.number() }).nullable(),
});
export type GaugeStudyTurn = z.infer<typeof gaugeStudyTurnSchema>;
