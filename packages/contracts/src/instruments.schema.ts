import { z } from 'zod';
import { gaugeCodeSchema, gaugeStatusSchema, isoDateSchema } from './masters.schema';
import { displayUnitSchema } from './users.schema';

export const INSTRUMENT_KINDS = ['indicator', 'height-gauge', 'electronic-probe', 'other'] as const;
export const instrumentKindSchema = z.enum(INSTRUMENT_KINDS, {
  error: 'Choose indicator, height gauge, electronic probe or other.',
});
export type InstrumentKind = z.infer<typeof instrumentKindSchema>;

/** Resolution in the body's `unit`, converted once to millimetres by the server. */
export const instrumentInputSchema = z.object({
  code: gaugeCodeSchema,
  kind: instrumentKindSchema,
  description: z
    .string({ error: 'Enter a description.' })
    .trim()
    .min(1, 'Enter a description.')
    .max(200, 'Use at most 200 characters.'),
  unit: displayUnitSchema,
  resolution: z
    .number({ error: 'Enter the resolution as a number.' })
    .positive('The resolution must be greater than zero.'),
  calibrationDueOn: isoDateSchema('the calibration due date'),
});
export type InstrumentInput = z.infer<typeof instrumentInputSchema>;

export const instrumentSchema = z.object({
  id: z.string(),
  code: z.string(),
  kind: instrumentKindSchema,
  description: z.string(),
  /** mm */
  resolution: z.number(),
  calibrationDueOn: z.string(),
  status: gaugeStatusSchema,
  retiredAt: z.string().nullable(),
  retiredReason: z.string().nullable(),
  createdAt: z.string(),
});
export type Instrument = z.infer<typeof instrumentSchema>;
