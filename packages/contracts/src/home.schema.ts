import { z } from 'zod';
import { auditEntrySchema } from './audit.schema';
import { grindRequestStatusSchema } from './replacements.schema';
import { displayUnitSchema } from './users.schema';

/*
 * The home page: each of the signed-in person's roles gets its section of work waiting, counted
 * from the records. A section is present only for a role the person holds.
 *
 * Routes (roles):
 * - GET /api/home   every signed-in person  → Home
 */

const lotWaitingSchema = z.object({
  lotId: z.string(),
  lotNumber: z.string(),
  partNumber: z.string(),
  /** Registered parts with no inspection yet. */
  notInspected: z.number().int(),
  parts: z.number().int(),
});

const recentRunSchema = z.object({
  runId: z.string(),
  lotId: z.string(),
  lotNumber: z.string(),
  partNumber: z.string(),
  startedAt: z.string(),
  endedAt: z.string().nullable(),
  inspections: z.number().int(),
});

const partsAwaitingSchema = z.object({
  lotId: z.string(),
  lotNumber: z.string(),
  partNumber: z.string(),
  doesNotConform: z.number().int(),
  guardBand: z.number().int(),
  held: z.number().int(),
});

const masterDueSchema = z.object({
  id: z.string(),
  code: z.string(),
  description: z.string(),
  dueOn: z.string(),
  overdue: z.boolean(),
});

const grindRequestItemSchema = z.object({
  id: z.string(),
  requestNumber: z.string(),
  partNumber: z.string(),
  serial: z.string(),
  status: grindRequestStatusSchema,
  createdAt: z.string(),
});

export const homeSchema = z.object({
  inspector: z
    .object({
      lotsWaiting: z.array(lotWaitingSchema),
      /** The person's own runs, newest first. */
      recentRuns: z.array(recentRunSchema),
    })
    .optional(),
  engineer: z
    .object({
      /** Per lot, parts whose status calls for a decision. */
      awaitingDisposition: z.array(partsAwaitingSchema),
      /** Masters in service that are overdue or due within the due-soon window, soonest first. */
      mastersDue: z.array(masterDueSchema),
      /** Run-rule signals on the trend of each released part number (all inspections, lots as subgroups). */
      runRuleSignals: z.array(z.object({ partNumber: z.string(), signals: z.number().int() })),
      /** Grind requests still open or ground (not re-inspected yet). */
      grindRequests: z.object({ open: z.number().int(), ground: z.number().int() }),
    })
    .optional(),
  sales: z
    .object({
      stock: z.array(
        z.object({
          partNumber: z.string(),
          title: z.string(),
          setSize: z.number().int(),
          displayUnit: displayUnitSchema,
          /** Free released parts inside the interchange window. */
          available: z.number().int(),
          /** Most whole sets those parts make. */
          sets: z.number().int(),
        }),
      ),
      recentCertificates: z.array(
        z.object({
          id: z.string(),
          certificateNumber: z.string(),
          setId: z.string(),
          setNumber: z.string(),
          partNumber: z.string(),
          issuedAt: z.string(),
        }),
      ),
    })
    .optional(),
  service: z
    .object({
      /** Grind requests not re-inspected yet: replacement cases still open, oldest first. */
      openCases: z.array(grindRequestItemSchema),
      recentReplacements: z.array(
        z.object({
          id: z.string(),
          setNumber: z.string(),
          partNumber: z.string(),
          replacesSetNumber: z.string(),
          createdAt: z.string(),
        }),
      ),
    })
    .optional(),
  admin: z
    .object({
      people: z.object({ active: z.number().int(), inactive: z.number().int() }),
      /** Messages whose latest attempt failed (or that were never tried). */
      outboxFailures: z.number().int(),
      recentAudit: z.array(auditEntrySchema),
    })
    .optional(),
});
export type Home = z.infer<typeof homeSchema>;
