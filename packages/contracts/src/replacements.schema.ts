import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { grindPassSchema, verdictSchema } from './lots.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Replacement checks and grind-to-target requests. Lengths in answers are millimetres.
 *
 * Routes (roles):
 * - GET  /api/replacements/lookup?q=             service, sales, engineer, admin  → ReplacementLookup
 * - POST /api/replacements                       service, sales                   `allocateReplacementSchema` → AllocatedReplacement
 * - GET  /api/grind-requests                     every role                       `grindRequestListQuerySchema` → Page<GrindRequestRow>
 * - POST /api/grind-requests                     service, engineer                `createGrindRequestSchema` → GrindRequestDetail
 * - GET  /api/grind-requests/:id                 every role                       → GrindRequestDetail
 * - POST /api/grind-requests/:id/steps           engineer, inspector, service     `grindRequestStepSchema` → GrindRequestDetail
 */

/**
 * The usual surface-grinding cautions, carried by every grind request and shown beside every
 * rework plan. They remind; they do not replace the shop's own rules.
 */
export const GRINDING_CAUTION_ITEMS = [
  'Use a wheel rated for the spindle speed, ring-tested before mounting, with its guard in place.',
  'Wear eye and face protection.',
  'Make sure the part is held on the magnetic chuck (or other workholding), and check the hold, before starting.',
  'Handle coolant as its safety data sheet says.',
  'Lift heavy parts with lifting aids, not by hand.',
  'Follow local codes, the machine maker’s instructions and licensed practice.',
] as const;

export const replacementLookupQuerySchema = z.object({
  q: z
    .string({ error: 'Enter a certificate number or a serial.' })
    .trim()
    .min(1, 'Enter a certificate number or a serial.')
    .max(100, 'Use at most 100 characters.'),
});
export type ReplacementLookupQuery = z.infer<typeof replacementLookupQuerySchema>;

export const GRIND_REQUEST_STATUSES = ['open', 'ground', 're-inspected'] as const;
export const grindRequestStatusSchema = z.enum(GRIND_REQUEST_STATUSES);
export type GrindRequestStatus = z.infer<typeof grindRequestStatusSchema>;

export const lengthRangeSchema = z.object({ low: z.number(), high: z.number() });
export type LengthRange = z.infer<typeof lengthRangeSchema>;

/** A released part in no set, as a candidate replacement. */
export const replacementCandidateSchema = z.object({
  id: z.string(),
  serial: z.string(),
  lotNumber: z.string(),
  revision: z.string(),
  height: z.number(),
  /** |height − window centre|. */
  distance: z.number(),
  /** For a part above the window: stock to grind off to reach the centre. */
  stockToCentre: z.number().nullable(),
});
export type ReplacementCandidate = z.infer<typeof replacementCandidateSchema>;

export const originalSetSchema = z.object({
  id: z.string(),
  setNumber: z.string(),
  kind: z.enum(['set', 'replacement']),
  customerId: z.string(),
  customerName: z.string(),
  orderReference: z.string(),
  partNumber: z.string(),
  /** Spec revision of the set's parts (the newest when they differ). */
  revision: z.string(),
  displayUnit: displayUnitSchema,
  matchingBand: z.number(),
  members: z.array(z.object({ partId: z.string(), serial: z.string(), height: z.number() })),
  createdAt: z.string(),
});
export type OriginalSet = z.infer<typeof originalSetSchema>;

/** A set that answered the search, when a serial sits in sets of several part numbers. */
export const lookupChoiceSchema = z.object({
  setId: z.string(),
  setNumber: z.string(),
  partNumber: z.string(),
  serial: z.string(),
  customerName: z.string(),
});
export type LookupChoice = z.infer<typeof lookupChoiceSchema>;

export const replacementCheckSchema = z.object({
  match: z.literal('set'),
  /** How the search found the set, in plain words. */
  foundBy: z.string(),
  set: originalSetSchema,
  /** Nominal and limits of the spec's tolerance band. */
  tolerance: z.object({ nominal: z.number(), low: z.number(), high: z.number() }),
  /** Heights that match the set within the matching band: [highest − band, lowest + band]. */
  setWindow: lengthRangeSchema.nullable(),
  /** `setWindow` ∩ the tolerance band; null when empty (see `explanation`). */
  window: lengthRangeSchema.nullable(),
  centre: z.number().nullable(),
  explanation: z.string(),
  /** Released free parts inside the window, closest to the centre first. */
  fits: z.array(replacementCandidateSchema),
  /** Released free parts above the window (grinding only removes stock), closest first. */
  grindable: z.array(replacementCandidateSchema),
  /** Replacements already sent for this set. */
  replacements: z.array(z.object({ id: z.string(), setNumber: z.string(), serial: z.string(), createdAt: z.string() })),
  /** Grind requests already raised against this set. */
  grindRequests: z.array(
    z.object({
      id: z.string(),
      requestNumber: z.string(),
      serial: z.string(),
      status: grindRequestStatusSchema,
      createdAt: z.string(),
    }),
  ),
});
export type ReplacementCheck = z.infer<typeof replacementCheckSchema>;

export const replacementLookupSchema = z.discriminatedUnion('match', [
  replacementCheckSchema,
  z.object({ match: z.literal('choices'), message: z.string(), choices: z.array(lookupChoiceSchema) }),
]);
export type ReplacementLookup = z.infer<typeof replacementLookupSchema>;

const reference = z
  .string({ error: 'Enter the order reference.' })
  .trim()
  .min(1, 'Enter the order reference.')
  .max(100, 'The order reference can be at most 100 characters.');

export const allocateReplacementSchema = z.object({
  originalSetId: z.uuid({ error: 'Choose the original set.' }),
  partId: z.uuid({ error: 'Choose a part.' }),
  orderReference: reference,
});
export type AllocateReplacementInput = z.infer<typeof allocateReplacementSchema>;

export const allocatedReplacementSchema = z.object({
  id: z.string(),
  setNumber: z.string(),
  originalSetId: z.string(),
  originalSetNumber: z.string(),
  customerName: z.string(),
  orderReference: z.string(),
  serial: z.string(),
  height: z.number(),
});
export type AllocatedReplacement = z.infer<typeof allocatedReplacementSchema>;

export const createGrindRequestSchema = z.object({
  originalSetId: z.uuid({ error: 'Choose the original set.' }),
  partId: z.uuid({ error: 'Choose a part.' }),
});
export type CreateGrindRequestInput = z.infer<typeof createGrindRequestSchema>;

export const grindRequestStepSchema = z.object({
  status: z.literal('ground', { error: 'Only "ground" can be recorded; re-inspection is recorded at the Bench.' }),
  note: z.string().trim().max(500, 'Use at most 500 characters for the note.').optional(),
});
export type GrindRequestStepInput = z.infer<typeof grindRequestStepSchema>;

export const grindRequestListQuerySchema = listQuerySchema.extend({ originalSetId: z.uuid().optional() });
export type GrindRequestListQuery = z.infer<typeof grindRequestListQuerySchema>;

export const grindRequestRowSchema = z.object({
  id: z.string(),
  requestNumber: z.string(),
  partId: z.string(),
  serial: z.string(),
  partNumber: z.string(),
  originalSetNumber: z.string(),
  currentHeight: z.number(),
  targetHeight: z.number(),
  stock: z.number(),
  status: grindRequestStatusSchema,
  requestedBy: z.string(),
  createdAt: z.string(),
});
export type GrindRequestRow = z.infer<typeof grindRequestRowSchema>;

export const grindRequestDetailSchema = grindRequestRowSchema.extend({
  lotId: z.string(),
  lotNumber: z.string(),
  revision: z.string(),
  originalSet: z.object({
    id: z.string(),
    setNumber: z.string(),
    customerName: z.string(),
    orderReference: z.string(),
    heights: z.array(z.object({ serial: z.string(), height: z.number() })),
  }),
  window: lengthRangeSchema,
  /** The spec's grinding parameters used for the passes; null when the spec names none. */
  grinding: z
    .object({
      roughDepth: z.number(),
      finishAllowance: z.number(),
      finishDepth: z.number(),
      sparkOutPasses: z.number(),
    })
    .nullable(),
  /** Passes in mm; empty when the spec names no grinding parameters. */
  passes: z.array(grindPassSchema),
  cautions: z.array(z.string()),
  steps: z.array(
    z.object({
      status: grindRequestStatusSchema,
      note: z.string().nullable(),
      recordedBy: z.string(),
      createdAt: z.string(),
    }),
  ),
  /** The Bench inspection of the part made after it was ground, when there is one. */
  reInspection: z
    .object({
      inspectionId: z.string(),
      height: z.number(),
      verdict: verdictSchema,
      insideWindow: z.boolean(),
      inspector: z.string(),
      inspectedAt: z.string(),
    })
    .nullable(),
});
export type GrindRequestDetail = z.infer<typeof grindRequestDetailSchema>;
