import { z } from 'zod';
import { windowSummarySchema } from './sets.schema';
import { dispositionSchema, lotSchema, partStatusSchema, verdictSchema } from './lots.schema';
import { masterDetailSchema, reasonSchema } from './masters.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Bench runs, inspections and their computed results. Readings in a request are indicator
 * readings in the body's `unit`; answers give millimetres. The server recomputes every result
 * from the raw readings; nothing computed by a client is accepted.
 *
 * Routes (roles):
 * - POST /api/runs                          inspector            `createRunSchema` → Run
 * - GET  /api/runs/:id                      engineer, inspector  → Run
 * - POST /api/runs/:id/end                  inspector            `endRunSchema` → Run (drift and flag)
 * - POST /api/runs/:id/inspections          inspector            `createInspectionSchema` → Inspection
 * - POST /api/runs/:id/readings/preview     inspector            multipart `file` (CSV) → ReadingsPreview
 * - POST /api/runs/:id/readings/import      inspector            multipart `file` (CSV) → ReadingsImport
 * - GET  /api/parts/:id                     engineer, inspector  → PartDetail
 * Inspections, readings and results are never changed or deleted: there is no route for it, and
 * the database refuses it. A correction is a new inspection naming the one it supersedes.
 */

const temperature = (what: string) =>
  z
    .number({ error: `Enter the ${what} temperature in °C.` })
    .min(0, `The ${what} temperature looks wrong: below 0 °C.`)
    .max(50, `The ${what} temperature looks wrong: above 50 °C.`);

const reading = (what: string) => z.number({ error: `Enter the ${what} as a number.` });

/** Starts a run: one inspector, one lot, one usable master and one usable instrument. */
export const createRunSchema = z.object({
  lotId: z.uuid({ error: 'Choose a lot.' }),
  masterId: z.uuid({ error: 'Choose a master gauge.' }),
  instrumentId: z.uuid({ error: 'Choose an instrument.' }),
  unit: displayUnitSchema,
  masterTemperature: temperature('master'),
  partTemperature: temperature('part'),
  /** The indicator reading on the master at the start (the zero). */
  masterStartReading: reading('master check reading'),
});
export type CreateRunInput = z.infer<typeof createRunSchema>;

/** The master check at the end of the run. */
export const endRunSchema = z.object({
  unit: displayUnitSchema,
  masterEndReading: reading('master check reading'),
});
export type EndRunInput = z.infer<typeof endRunSchema>;

export const runSchema = z.object({
  id: z.string(),
  lot: lotSchema.pick({ id: true, lotNumber: true }),
  spec: z.object({ id: z.string(), partNumber: z.string(), revision: z.string() }),
  master: z.object({ id: z.string(), code: z.string(), calibrationId: z.string() }),
  instrument: z.object({ id: z.string(), code: z.string(), resolution: z.number() }),
  inspector: z.string(),
  /** °C */
  masterTemperature: z.number(),
  partTemperature: z.number(),
  /** mm */
  masterStartReading: z.number(),
  masterEndReading: z.number().nullable(),
  /** end − start, mm; null until the end check. */
  drift: z.number().nullable(),
  driftLimit: z.number(),
  /** |drift| beyond the limit: every inspection of the run carries the flag. */
  flagged: z.boolean(),
  endedAt: z.string().nullable(),
  inspections: z.number(),
  createdAt: z.string(),
});
export type Run = z.infer<typeof runSchema>;

/**
 * Station names: top-face and datum stations by their plan names; runout positions as
 * `<circle>:<n>`, n = 1…positions in the order they were read (e.g. `R1:3`).
 */
export const stationReadingSchema = z.object({
  station: z.string({ error: 'Name the station.' }).trim().min(1, 'Name the station.').max(40),
  reading: reading('reading'),
});
export type StationReading = z.infer<typeof stationReadingSchema>;

/** One part measured in the run: a reading for every station of the plan. */
export const createInspectionSchema = z
  .object({
    partId: z.uuid({ error: 'Choose a part.' }),
    unit: displayUnitSchema,
    readings: z.array(stationReadingSchema, { error: 'List the readings.' }).min(1, 'Enter the readings.').max(2000),
    /** A correction names the inspection it supersedes, and why. */
    supersedesId: z.uuid({ error: 'This is not a valid inspection id.' }).optional(),
    reason: reasonSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (body.supersedesId && !body.reason)
      ctx.addIssue({ code: 'custom', path: ['reason'], message: 'Say why the earlier inspection is corrected.' });
    if (!body.supersedesId && body.reason)
      ctx.addIssue({ code: 'custom', path: ['supersedesId'], message: 'A reason goes with a correction.' });
  });
export type CreateInspectionInput = z.infer<typeof createInspectionSchema>;

export const decisionSchema = z.object({
  verdict: verdictSchema,
  side: z.enum(['low', 'high']).nullable(),
  /** The acceptance zone applied, mm (open ends as null). */
  acceptance: z.object({ lower: z.number().nullable(), upper: z.number().nullable() }),
  message: z.string(),
});
export type DecisionView = z.infer<typeof decisionSchema>;

export const budgetComponentSchema = z.object({
  name: z.string(),
  /** mm (or °C, 1/°C for thermal inputs), times `sensitivity` gives `contribution` in mm. */
  standardUncertainty: z.number(),
  sensitivity: z.number(),
  contribution: z.number(),
});

/** Computed from the readings by the server (mm). Append-only: a recomputation is a new result. */
export const inspectionResultSchema = z.object({
  id: z.string(),
  /** Why it was computed: the inspection itself, or e.g. a master calibration correction. */
  reason: z.string(),
  masterCalibrationId: z.string(),
  height: z.number(),
  /** Master size + (part − master reading), before the correction to 20 °C. */
  heightUncorrected: z.number(),
  combinedUncertainty: z.number(),
  expandedUncertainty: z.number(),
  coverageFactor: z.number(),
  budget: z.array(budgetComponentSchema),
  flatness: z
    .object({
      minimumZone: z.number(),
      leastSquares: z.number(),
      /** Stations touching the minimum zone's planes. */
      contacts: z.array(z.string()),
      /** Each top station's distance above the zone's lower plane, for the face picture. */
      deviations: z.array(z.object({ station: z.string(), x: z.number(), y: z.number(), deviation: z.number() })),
    })
    .nullable(),
  parallelism: z.object({ value: z.number(), datum: z.enum(['surface plate', 'datum points']) }).nullable(),
  runout: z
    .object({
      circles: z.array(
        z.object({
          circle: z.string(),
          circularRunout: z.number(),
          eccentricity: z.number(),
          roundnessLeastSquares: z.number(),
          roundnessMinimumZone: z.number(),
        }),
      ),
      total: z.number(),
    })
    .nullable(),
  decisions: z.object({
    height: decisionSchema,
    flatness: decisionSchema.nullable(),
    parallelism: decisionSchema.nullable(),
    runout: decisionSchema.nullable(),
  }),
  /** The worst of the decisions. */
  verdict: verdictSchema,
  createdAt: z.string(),
});
export type InspectionResult = z.infer<typeof inspectionResultSchema>;

export const inspectionSchema = z.object({
  id: z.string(),
  partId: z.string(),
  serial: z.string(),
  runId: z.string(),
  specId: z.string(),
  masterCalibrationId: z.string(),
  instrumentId: z.string(),
  /** mm */
  instrumentResolution: z.number(),
  masterTemperature: z.number(),
  partTemperature: z.number(),
  /** Expansion coefficients used, 1e-6/K: the spec's frozen one for the part, the master's material. */
  partExpansionPerK: z.number(),
  masterExpansionPerK: z.number(),
  inspector: z.string(),
  /** The run this inspection belongs to drifted beyond its limit. */
  runFlagged: z.boolean(),
  supersedesId: z.string().nullable(),
  supersededById: z.string().nullable(),
  reason: z.string().nullable(),
  readings: z.array(z.object({ station: z.string(), kind: z.enum(['top', 'datum', 'runout']), reading: z.number() })),
  /** The newest result. */
  result: inspectionResultSchema,
  /** Every result, newest first (more than one after a recomputation). */
  results: z.array(inspectionResultSchema),
  createdAt: z.string(),
});
export type Inspection = z.infer<typeof inspectionSchema>;

export const partDetailSchema = z.object({
  id: z.string(),
  serial: z.string(),
  partNumber: z.string(),
  lot: lotSchema.pick({ id: true, lotNumber: true }),
  status: partStatusSchema,
  /** Newest first; superseded ones included and marked. */
  inspections: z.array(inspectionSchema),
  /** Newest first. */
  dispositions: z.array(dispositionSchema),
  /** The part number's interchange window, and whether this part's height lies outside it (null: not measured). */
  interchange: windowSummarySchema.extend({ outside: z.boolean().nullable() }),
  /** The set the part was allocated to, if any. */
  set: z.object({ id: z.string(), setNumber: z.string(), kind: z.enum(['set', 'replacement']) }).nullable(),
  createdAt: z.string(),
});
export type PartDetail = z.infer<typeof partDetailSchema>;

/** CSV upload limits. */
export const MAX_READINGS_FILE_BYTES = 20 * 1024 * 1024;
export const MAX_READINGS_ROWS = 200_000;

/** A problem on one row of an uploaded file (`row` 1-based, counting the header line as row 1). */
export const rowErrorSchema = z.object({
  row: z.number(),
  column: z.string().nullable(),
  value: z.string().nullable(),
  message: z.string(),
});
export type RowError = z.infer<typeof rowErrorSchema>;

/** What an upload would save: readings grouped by part, and every row-level problem. */
export const readingsPreviewSchema = z.object({
  rows: z.number(),
  parts: z.array(
    z.object({
      partId: z.string(),
      serial: z.string(),
      /** mm */
      readings: z.array(z.object({ row: z.number(), station: z.string(), reading: z.number() })),
      missingStations: z.array(z.string()),
    }),
  ),
  errors: z.array(rowErrorSchema),
});
export type ReadingsPreview = z.infer<typeof readingsPreviewSchema>;

export const readingsImportSchema = z.object({
  inspections: z.number(),
  readings: z.number(),
  parts: z.array(
    z.object({ partId: z.string(), serial: z.string(), inspectionId: z.string(), verdict: verdictSchema }),
  ),
});
export type ReadingsImport = z.infer<typeof readingsImportSchema>;

/**
 * Parts whose verdict changed when a master calibration was corrected and their heights recomputed,
 * and the certificates whose facts that changes.
 */
export const correctionImpactSchema = z.object({
  recomputed: z.number(),
  changed: z.array(
    z.object({
      partId: z.string(),
      serial: z.string(),
      lotNumber: z.string(),
      inspectionId: z.string(),
      heightBefore: z.number(),
      heightAfter: z.number(),
      before: verdictSchema,
      after: verdictSchema,
    }),
  ),
  /** Certificates of sets holding a recomputed part: their facts would no longer read the same. */
  certificates: z.array(
    z.object({
      id: z.string(),
      certificateNumber: z.string(),
      setId: z.string(),
      setNumber: z.string(),
      customerName: z.string(),
      revoked: z.boolean(),
    }),
  ),
});
export type CorrectionImpact = z.infer<typeof correctionImpactSchema>;

/**
 * Answer of `POST /api/masters/:id/calibrations`: the master, and for a correction the impact
 * report of the recomputation (null for a plain calibration).
 */
export const calibrationRecordedSchema = masterDetailSchema.extend({ impact: correctionImpactSchema.nullable() });
export type CalibrationRecorded = z.infer<typeof calibrationRecordedSchema>;
