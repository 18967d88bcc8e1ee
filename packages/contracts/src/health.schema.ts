import { z } from 'zod';

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  app: z.object({ name: z.string(), version: z.string(), uptimeSeconds: z.number() }),
  database: z.object({ status: z.enum(['up', 'down']), latencyMs: z.number().optional() }),
});
export type Health = z.infer<typeof healthSchema>;
