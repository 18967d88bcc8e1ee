import { z } from 'zod';

/**
 * Server-side paging, shaped like the DataGrid's own models:
 * `?page=0&pageSize=25&sort=field:asc&q=text` → `{ items, total }`.
 */
export const listQuerySchema = z.object({
  page: z.coerce.number({ error: 'Page must be a whole number.' }).int().min(0).default(0),
  pageSize: z.coerce
    .number({ error: 'Page size must be a whole number.' })
    .int()
    .min(1, 'Page size must be at least 1.')
    .max(500, 'Page size can be at most 500.')
    .default(25),
  sort: z
    .string()
    .regex(/^[A-Za-z][A-Za-z0-9]*:(asc|desc)$/, 'Sort must look like "field:asc" or "field:desc".')
    .optional(),
  q: z.string().max(200, 'Search text can be at most 200 characters.').optional(),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

export const pageOf = <T extends z.ZodType>(item: T) =>
  z.object({ items: z.array(item), total: z.number().int().min(0) });
export type Page<T> = { items: T[]; total: number };
