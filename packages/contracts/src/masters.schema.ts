import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { materialSchema } from './materials.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Lengths in a request are in the request's `unit` and converted once to millimetres by the
 * server; answers give millimetres.
 */

/**
 * Where a gauge stands, derived from its calibration due date and today: due soon within
 * `DUE_SOON_DAYS`, overdue after the due date, retired when taken out of use.
 */
export const GAUGE_STATUSES = ['in-service', 'due-soon', 'overdue', 'retired', 'not-calibrated'] as const;
export const gaugeStatusSchema = z.enum(GAUGE_STATUSES);
export type GaugeStatus = z.infer<typeof gaugeStatusSchema>;

/** Warning period before a calibration falls due (common practice: 30 days). */
export const DUE_SOON_DAYS = 30;

/** Largest calibration certificate accepted. */
export const MAX_CERTIFICATE_BYTES = 10 * 1024 * 1024;

export const isoDateSchema = (what: string) => z.iso.date({ error: `Enter ${what} as a date, YYYY-MM-DD.` });

export const gaugeCodeSchema = z
  .string({ error: 'Enter an id code.' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9.\-/]{0,39}$/, 'Use letters, digits, ".", "-" or "/" (at most 40), e.g. MG-1.500-A.');

const descriptionSchema = z
  .string({ error: 'Enter a description.' })
  .trim()
  .min(1, 'Enter a description.')
  .max(200, 'Use at most 200 characters.');

export const reasonSchema = z
  .string({ error: 'Give a reason.' })
  .trim()
  .min(3, 'Give a reason of at least 3 characters.')
  .max(500, 'Use at most 500 characters.');

export const retireSchema = z.object({ reason: reasonSchema });
export type RetireInput = z.infer<typeof retireSchema>;

/** `?usable=true` lists only gauges that may be used at the Bench. */
export const gaugeListQuerySchema = listQuerySchema.extend({
  usable: z
    .enum(['true', 'false'], { error: 'Use true or false.' })
    .transform((v) => v === 'true')
    .optional(),
});
export type GaugeListQuery = z.infer<typeof gaugeListQuerySchema>;

export const createMasterSchema = z.object({
  code: gaugeCodeSchema,
  description: descriptionSchema,
  unit: displayUnitSchema,
  nominal: z
    .number({ error: 'Enter the nominal size as a number.' })
    .positive('The nominal size must be greater than zero.'),
  materialId: z.uuid({ error: 'Choose a material.' }),
});
export type CreateMasterInput = z.infer<typeof createMasterSchema>;

/**
 * The fields of a calibration, sent as multipart form fields beside the certificate file (field
 * `certificate`), hence numbers given as text. A correction names the record it supersedes and why.
 */
export const calibrationFormSchema = z
  .object({
    calibratedOn: isoDateSchema('the calibration date'),
    dueOn: isoDateSchema('the due date'),
    unit: displayUnitSchema,
    calibratedSize: z.coerce
      .number({ error: 'Enter the calibrated size as a number.' })
      .positive('The calibrated size must be greater than zero.'),
    expandedUncertainty: z.coerce
      .number({ error: 'Enter the expanded uncertainty as a number.' })
      .positive('The expanded uncertainty must be greater than zero.'),
    coverageFactor: z.coerce
      .number({ error: 'Enter the coverage factor k as a number.' })
      .min(1, 'The coverage factor k must be at least 1.')
      .max(4, 'The coverage factor k can be at most 4.')
      .default(2),
    certificateNumber: z
      .string({ error: 'Enter the certificate number.' })
      .trim()
      .min(1, 'Enter the certificate number.')
      .max(100, 'Use at most 100 characters.'),
    supersedesId: z.uuid({ error: 'This is not a valid calibration id.' }).optional(),
    reason: reasonSchema.optional(),
  })
  .superRefine((form, ctx) => {
    if (form.dueOn <= form.calibratedOn)
      ctx.addIssue({ code: 'custom', path: ['dueOn'], message: 'The due date must be after the calibration date.' });
    if (form.supersedesId && !form.reason)
      ctx.addIssue({ code: 'custom', path: ['reason'], message: 'Say why the earlier calibration is corrected.' });
    if (!form.supersedesId && form.reason)
      ctx.addIssue({
        code: 'custom',
        path: ['supersedesId'],
        message: 'A reason goes with a correction: name the calibration it supersedes.',
      });
  });
export type CalibrationForm = z.infer<typeof calibrationFormSchema>;

export const calibrationSchema = z.object({
  id: z.string(),
  calibratedOn: z.string(),
  dueOn: z.string(),
  /** mm */
  calibratedSize: z.number(),
  /** mm, at coverage factor `coverageFactor` */
  expandedUncertainty: z.number(),
  coverageFactor: z.number(),
  certificateNumber: z.string(),
  certificate: z.object({ filename: z.string(), contentType: z.string(), sizeBytes: z.number() }),
  supersedesId: z.string().nullable(),
  supersededById: z.string().nullable(),
  reason: z.string().nullable(),
  recordedBy: z.string(),
  createdAt: z.string(),
});
export type Calibration = z.infer<typeof calibrationSchema>;

export const masterSchema = z.object({
  id: z.string(),
  code: z.string(),
  description: z.string(),
  /** mm */
  nominal: z.number(),
  material: materialSchema,
  status: gaugeStatusSchema,
  /** The calibration in force: the latest that no correction superseded. */
  current: calibrationSchema.nullable(),
  retiredAt: z.string().nullable(),
  retiredReason: z.string().nullable(),
  createdAt: z.string(),
});
export type Master = z.infer<typeof masterSchema>;

export const masterDetailSchema = masterSchema.extend({
  /** Every calibration ever recorded, newest first; superseded ones included. */
  calibrations: z.array(calibrationSchema),
});
export type MasterDetail = z.infer<typeof masterDetailSchema>;
