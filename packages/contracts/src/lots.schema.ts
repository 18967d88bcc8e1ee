import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { isoDateSchema, reasonSchema } from './masters.schema';
import { windowSummarySchema } from './sets.schema';
import { decisionRuleSchema } from './specs.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Lots, parts, their review and their dispositions. Lengths in answers are millimetres; a request
 * carrying lengths names their unit in one `unit` field.
 *
 * Routes (roles):
 * - GET  /api/lots                      engineer, inspector  `lotListQuerySchema` → Page<Lot>
 * - POST /api/lots                      engineer             `createLotSchema` → Lot
 * - GET  /api/lots/:id                  engineer, inspector  → LotDetail (spec summary, counts, spread)
 * - GET  /api/lots/:id/parts            engineer, inspector  `partListQuerySchema` → Page<PartRow>
 * - POST /api/lots/:id/parts/preview    engineer             `serialPatternSchema` → SerialPreview
 * - POST /api/lots/:id/parts            engineer             `createPartsSchema` → { items: PartRow[] }
 * - GET  /api/parts/:id                 engineer, inspector  → PartDetail (every inspection, newest first)
 * - POST /api/parts/:id/dispositions    engineer             `dispositionInputSchema` → Disposition
 * - POST /api/parts/:id/release         engineer             `releaseInputSchema` → Disposition
 */

export const lotNumberSchema = z
  .string({ error: 'Enter a lot number.' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9.\-/]{0,39}$/, 'Use letters, digits, ".", "-" or "/" (at most 40), e.g. L-2026-041.');

export const serialSchema = z
  .string({ error: 'Enter a serial.' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9.\-/]{0,39}$/, 'Use letters, digits, ".", "-" or "/" (at most 40) for a serial.');

const notesSchema = z.string().trim().max(2000, 'Use at most 2000 characters for the notes.');

export const createLotSchema = z.object({
  lotNumber: lotNumberSchema,
  /** A released spec revision. */
  specId: z.uuid({ error: 'Choose a released spec revision.' }),
  quantity: z
    .number({ error: 'Enter the quantity as a whole number.' })
    .int('The quantity must be a whole number.')
    .min(1, 'The quantity must be at least 1.')
    .max(10000, 'The quantity can be at most 10,000.'),
  grindDate: isoDateSchema('the grind date'),
  notes: notesSchema.optional(),
});
export type CreateLotInput = z.infer<typeof createLotSchema>;

export const lotListQuerySchema = listQuerySchema.extend({
  specId: z.uuid({ error: 'This is not a valid spec id.' }).optional(),
});
export type LotListQuery = z.infer<typeof lotListQuerySchema>;

export const specSummarySchema = z.object({
  id: z.string(),
  partNumber: z.string(),
  revision: z.string(),
  title: z.string(),
  displayUnit: displayUnitSchema,
});
export type SpecSummary = z.infer<typeof specSummarySchema>;

export const lotSchema = z.object({
  id: z.string(),
  lotNumber: z.string(),
  spec: specSummarySchema,
  quantity: z.number(),
  grindDate: z.string(),
  notes: z.string().nullable(),
  /** Parts registered in the lot so far. */
  partCount: z.number(),
  createdAt: z.string(),
});
export type Lot = z.infer<typeof lotSchema>;

/**
 * Where a part stands, derived from its newest record (never stored): not inspected yet; the
 * verdict of its current inspection (`held` when that inspection's run is flagged for master
 * drift); or the newest disposition or release when it came after that inspection.
 */
export const PART_STATUSES = [
  'not-inspected',
  'conforms',
  'does-not-conform',
  'guard-band',
  'held',
  'rework',
  'scrap',
  'use-as-is',
  'released',
] as const;
export const partStatusSchema = z.enum(PART_STATUSES);
export type PartStatus = z.infer<typeof partStatusSchema>;

export const VERDICTS = ['conforms', 'does-not-conform', 'guard-band'] as const;
export const verdictSchema = z.enum(VERDICTS);
export type Verdict = z.infer<typeof verdictSchema>;

export const lotDetailSchema = lotSchema.extend({
  spec: specSummarySchema.extend({
    /** mm */
    nominal: z.number(),
    band: z.object({ lower: z.number(), upper: z.number() }),
    matchingBand: z.number(),
    flatness: z.number().nullable(),
    parallelism: z.number().nullable(),
    runout: z.number().nullable(),
    decisionRule: decisionRuleSchema,
  }),
  /** Parts per status (every status listed, zero included). */
  counts: z.record(partStatusSchema, z.number()),
  /** Spread of the current heights of the inspected parts, mm; null before any inspection. */
  heightSpread: z.object({ lowest: z.number(), highest: z.number(), spread: z.number(), parts: z.number() }).nullable(),
  /** The part number's interchange window (sets sold before), and this lot's parts outside it. */
  interchange: windowSummarySchema.extend({ outsideSerials: z.array(z.string()) }),
});
export type LotDetail = z.infer<typeof lotDetailSchema>;

/** Serials made from a pattern: prefix + start number counted up, zero-padded to `digits`. */
export const serialPatternSchema = z
  .object({
    prefix: z
      .string()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z0-9.\-/]{0,30}$/, 'Use letters, digits, ".", "-" or "/" (at most 30) for the prefix.'),
    start: z
      .number({ error: 'Enter the first number.' })
      .int('The first number must be a whole number.')
      .min(0, 'The first number cannot be negative.'),
    count: z
      .number({ error: 'Enter how many serials to make.' })
      .int('The count must be a whole number.')
      .min(1, 'Make at least 1 serial.')
      .max(1000, 'Make at most 1000 serials at once.'),
    digits: z
      .number({ error: 'Enter the number of digits.' })
      .int('The number of digits must be a whole number.')
      .min(1, 'Use at least 1 digit.')
      .max(9, 'Use at most 9 digits.'),
  })
  .superRefine((p, ctx) => {
    if (String(p.start + p.count - 1).length > p.digits)
      ctx.addIssue({
        code: 'custom',
        path: ['digits'],
        message: `The last number (${p.start + p.count - 1}) needs more than ${p.digits} digits.`,
      });
  });
export type SerialPattern = z.infer<typeof serialPatternSchema>;

/** The serials a pattern makes, and those of them the part number already has. */
export const serialPreviewSchema = z.object({ serials: z.array(z.string()), taken: z.array(z.string()) });
export type SerialPreview = z.infer<typeof serialPreviewSchema>;

/** Parts for a lot: from a pattern, or listed one by one (exactly one of the two). */
export const createPartsSchema = z
  .object({
    pattern: serialPatternSchema.optional(),
    serials: z.array(serialSchema).min(1, 'List at least one serial.').max(1000).optional(),
  })
  .superRefine((body, ctx) => {
    if (!body.pattern === !body.serials)
      ctx.addIssue({
        code: 'custom',
        path: ['serials'],
        message: 'Give either a serial pattern or a list of serials.',
      });
    body.serials?.forEach((serial, index) => {
      if (body.serials?.indexOf(serial) !== index)
        ctx.addIssue({ code: 'custom', path: ['serials', index], message: `Serial ${serial} is listed twice.` });
    });
  });
export type CreatePartsInput = z.infer<typeof createPartsSchema>;

export const DISPOSITION_KINDS = ['rework', 'scrap', 'use-as-is', 'release'] as const;
export const dispositionKindSchema = z.enum(DISPOSITION_KINDS);
export type DispositionKind = z.infer<typeof dispositionKindSchema>;

/**
 * Disposition of a part that does not conform, is in a guard band or is held: rework (target
 * height in `unit`, the middle of the band when left out), scrap or use as is (both with a reason).
 */
export const dispositionInputSchema = z
  .object({
    kind: z.enum(['rework', 'scrap', 'use-as-is'], { error: 'Choose rework, scrap or use as is.' }),
    unit: displayUnitSchema.optional(),
    targetHeight: z
      .number({ error: 'Enter the target height as a number.' })
      .positive('The target height must be greater than zero.')
      .optional(),
    reason: reasonSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (body.kind !== 'rework' && !body.reason)
      ctx.addIssue({ code: 'custom', path: ['reason'], message: 'Say why the part is scrapped or used as is.' });
    if (body.kind !== 'rework' && body.targetHeight !== undefined)
      ctx.addIssue({ code: 'custom', path: ['targetHeight'], message: 'A target height goes with a rework only.' });
    if (body.targetHeight !== undefined && !body.unit)
      ctx.addIssue({ code: 'custom', path: ['unit'], message: 'Say whether the target height is in in or mm.' });
  });
export type DispositionInput = z.infer<typeof dispositionInputSchema>;

export const releaseInputSchema = z.object({ note: z.string().trim().max(500).optional() });
export type ReleaseInput = z.infer<typeof releaseInputSchema>;

export const grindPassSchema = z.object({
  pass: z.number(),
  kind: z.enum(['rough', 'finish', 'spark-out']),
  /** mm */
  depth: z.number(),
  remaining: z.number(),
});

/** An append-only disposition or release record of a part. */
export const dispositionSchema = z.object({
  id: z.string(),
  partId: z.string(),
  kind: dispositionKindSchema,
  reason: z.string().nullable(),
  /** The inspection the decision was made on. */
  inspectionId: z.string().nullable(),
  /** Rework only, mm: current height, target and stock to remove. */
  rework: z
    .object({
      currentHeight: z.number(),
      targetHeight: z.number(),
      stockToRemove: z.number(),
      /** Null when the spec has no grinding parameters. */
      passes: z.array(grindPassSchema).nullable(),
      /** Grinding safety notes to show beside the plan. */
      cautions: z.string(),
    })
    .nullable(),
  decidedBy: z.string(),
  createdAt: z.string(),
});
export type Disposition = z.infer<typeof dispositionSchema>;

export const partListQuerySchema = listQuerySchema.extend({ status: partStatusSchema.optional() });
export type PartListQuery = z.infer<typeof partListQuerySchema>;

/** One row of a lot's part list: the part's current inspection result, lengths in mm. */
export const partRowSchema = z.object({
  id: z.string(),
  serial: z.string(),
  status: partStatusSchema,
  height: z.number().nullable(),
  flatness: z.number().nullable(),
  parallelism: z.number().nullable(),
  /** Largest circular runout of the part's circles. */
  runout: z.number().nullable(),
  totalRunout: z.number().nullable(),
  /** Expanded uncertainty of the height (k = 2). */
  expandedUncertainty: z.number().nullable(),
  verdict: verdictSchema.nullable(),
  verdicts: z.object({
    height: verdictSchema.nullable(),
    flatness: verdictSchema.nullable(),
    parallelism: verdictSchema.nullable(),
    runout: verdictSchema.nullable(),
  }),
  /** The current inspection's run drifted beyond its limit. */
  runFlagged: z.boolean(),
  inspectedAt: z.string().nullable(),
  /** The newest disposition or release, whatever came after it. */
  disposition: dispositionKindSchema.nullable(),
  /** The height would not match sets sold before; null when not measured. */
  outsideWindow: z.boolean().nullable(),
});
export type PartRow = z.infer<typeof partRowSchema>;
