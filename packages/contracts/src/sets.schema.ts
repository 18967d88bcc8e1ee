import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { displayUnitSchema } from './users.schema';

/*
 * Matched sets: the interchange window of a part number, proposals, allocation. Heights and
 * bands in answers are millimetres.
 *
 * Routes (roles):
 * - GET  /api/sets                         sales, service, engineer, admin  `setListQuerySchema` → Page<SetRow>
 * - GET  /api/sets/:id                     sales, service, engineer, admin  → SetDetail
 * - GET  /api/sets/stock                   sales, admin                     → StockByPartNumber[] (what can be built)
 * - POST /api/sets/proposal                sales, admin                     `proposalRequestSchema` → Proposal
 * - POST /api/sets                         sales, admin                     `allocateSetsSchema` → { items: SetRow[] }
 * - GET  /api/interchange/:partNumber      sales, service, engineer, admin  → Interchange
 */

export const heightWindowSchema = z.object({ low: z.number(), high: z.number() });
export type HeightWindowView = z.infer<typeof heightWindowSchema>;

/** The interchange window as a lot or a part sees it. */
export const windowSummarySchema = z.object({
  /** Null when nothing is sold yet or when sold sets disagree. */
  window: heightWindowSchema.nullable(),
  /** Sold sets leave no common height. */
  conflict: z.boolean(),
  soldSets: z.number().int(),
});
export type WindowSummary = z.infer<typeof windowSummarySchema>;

/** The interchange window of a part number and the sold sets it comes from. */
export const interchangeSchema = z.object({
  partNumber: z.string(),
  matchingBand: z.number(),
  displayUnit: displayUnitSchema,
  /** Sets sold so far (replacements excluded). */
  soldSets: z.array(
    z.object({
      id: z.string(),
      setNumber: z.string(),
      customerName: z.string(),
      low: z.number(),
      high: z.number(),
      /** The heights that match this set alone: [high − band, low + band]. */
      window: heightWindowSchema,
    }),
  ),
  /** Null when nothing is sold yet (every height matches) or when sold sets disagree (see `conflicting`). */
  window: heightWindowSchema.nullable(),
  /** When sold sets already disagree: the sets that leave no common height. */
  conflicting: z.array(z.object({ id: z.string(), setNumber: z.string() })),
  /** A plain sentence on where the window comes from or why there is none. */
  explanation: z.string(),
});
export type Interchange = z.infer<typeof interchangeSchema>;

/** A released part no set holds yet. */
export const freePartSchema = z.object({
  id: z.string(),
  serial: z.string(),
  lotNumber: z.string(),
  revision: z.string(),
  height: z.number(),
});
export type FreePart = z.infer<typeof freePartSchema>;

export const stockSchema = z.object({
  partNumber: z.string(),
  revision: z.string(),
  title: z.string(),
  setSize: z.number().int(),
  matchingBand: z.number(),
  displayUnit: displayUnitSchema,
  /** Released parts in no set, inside the interchange window. */
  available: z.number().int(),
  /** Released parts in no set that would not match sets sold before. */
  outsideWindow: z.number().int(),
  window: heightWindowSchema.nullable(),
  windowConflict: z.boolean(),
});
export type Stock = z.infer<typeof stockSchema>;

export const proposalRequestSchema = z.object({
  partNumber: z.string().trim().min(1, 'Choose a part number.'),
  setCount: z.coerce
    .number({ error: 'Enter how many sets, as a whole number.' })
    .int('Enter how many sets, as a whole number.')
    .min(1, 'Ask for at least one set.')
    .max(200, 'Ask for at most 200 sets at a time.'),
});
export type ProposalRequest = z.infer<typeof proposalRequestSchema>;

export const proposedSetSchema = z.object({ parts: z.array(freePartSchema), spread: z.number() });
export type ProposedSet = z.infer<typeof proposedSetSchema>;

/** The sets the system suggests, and the parts left to swap in by hand. */
export const proposalSchema = z.object({
  partNumber: z.string(),
  setSize: z.number().int(),
  matchingBand: z.number(),
  displayUnit: displayUnitSchema,
  requested: z.number().int(),
  /** Most sets the free stock inside the window can make (may exceed or fall short of `requested`). */
  possible: z.number().int(),
  sets: z.array(proposedSetSchema),
  /** Free parts inside the window not in a proposed set, ascending height. */
  spare: z.array(freePartSchema),
  window: heightWindowSchema.nullable(),
  explanation: z.string(),
});
export type Proposal = z.infer<typeof proposalSchema>;

export const allocateSetsSchema = z.object({
  partNumber: z.string().trim().min(1, 'Choose a part number.'),
  customerId: z.uuid({ error: 'Choose a customer.' }),
  orderReference: z
    .string({ error: 'Enter the order reference.' })
    .trim()
    .min(1, 'Enter the order reference.')
    .max(100, 'The order reference can be at most 100 characters.'),
  sets: z
    .array(
      z.object({
        partIds: z
          .array(z.uuid({ error: 'This is not a valid part id.' }))
          .min(1, 'A set needs parts.')
          .max(100, 'A set can hold at most 100 parts.'),
      }),
    )
    .min(1, 'Allocate at least one set.')
    .max(200, 'Allocate at most 200 sets at a time.'),
});
export type AllocateSetsInput = z.infer<typeof allocateSetsSchema>;

export const setRowSchema = z.object({
  id: z.string(),
  setNumber: z.string(),
  kind: z.enum(['set', 'replacement']),
  partNumber: z.string(),
  customerId: z.string(),
  customerName: z.string(),
  orderId: z.string(),
  orderReference: z.string(),
  serials: z.array(z.string()),
  spread: z.number(),
  matchingBand: z.number(),
  replacesSetNumber: z.string().nullable(),
  allocatedByName: z.string(),
  createdAt: z.string(),
});
export type SetRow = z.infer<typeof setRowSchema>;

export const setListQuerySchema = listQuerySchema.extend({
  partNumber: z.string().optional(),
  customerId: z.uuid({ error: 'This is not a valid customer id.' }).optional(),
});
export type SetListQuery = z.infer<typeof setListQuerySchema>;

export const setDetailSchema = setRowSchema.extend({
  displayUnit: displayUnitSchema,
  members: z.array(
    z.object({
      partId: z.string(),
      serial: z.string(),
      lotId: z.string(),
      lotNumber: z.string(),
      revision: z.string(),
      position: z.number().int(),
      height: z.number(),
    }),
  ),
  replacesSetId: z.string().nullable(),
  /** Replacement parts sent later to match this set. */
  replacements: z.array(z.object({ id: z.string(), setNumber: z.string(), serials: z.array(z.string()) })),
});
export type SetDetail = z.infer<typeof setDetailSchema>;
