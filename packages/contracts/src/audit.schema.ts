import { z } from 'zod';
import { listQuerySchema } from './list.schema';
import { isoDateSchema } from './masters.schema';

/*
 * The audit log: who changed what and when, with the record before and after. Read only; entries
 * are written by the change itself and never altered.
 *
 * Routes (roles):
 * - GET /api/audit          engineer, admin  `auditListQuerySchema` → Page<AuditEntry> (newest first)
 * - GET /api/audit/facets   engineer, admin  → AuditFacets (the values the filters offer)
 */

const filterText = (what: string) =>
  z
    .string()
    .trim()
    .max(100, `The ${what} filter can be at most 100 characters.`)
    .optional()
    .transform((v) => v || undefined);

export const auditListQuerySchema = listQuerySchema
  .extend({
    /** Exact action, e.g. `lot.create`. */
    action: filterText('action'),
    actorId: z.uuid({ error: 'This is not a valid person id.' }).optional(),
    subjectType: filterText('subject type'),
    subjectId: filterText('subject id'),
    /** Inclusive calendar days (UTC). */
    from: isoDateSchema('the first day').optional(),
    to: isoDateSchema('the last day').optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ['to'],
    message: 'The last day cannot be before the first day.',
  });
export type AuditListQuery = z.infer<typeof auditListQuerySchema>;

export const auditEntrySchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  actorId: z.string().nullable(),
  actorName: z.string(),
  action: z.string(),
  subjectType: z.string(),
  subjectId: z.string(),
  reason: z.string().nullable(),
  before: z.record(z.string(), z.unknown()).nullable(),
  after: z.record(z.string(), z.unknown()).nullable(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditFacetsSchema = z.object({
  actions: z.array(z.string()),
  subjectTypes: z.array(z.string()),
  actors: z.array(z.object({ id: z.string(), name: z.string() })),
});
export type AuditFacets = z.infer<typeof auditFacetsSchema>;
