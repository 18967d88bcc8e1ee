import { z } from 'zod';

/** The one error shape every API refusal uses. `details` names the fields at fault. */
export const apiErrorDetailSchema = z.object({
  path: z.string(),
  message: z.string(),
});
export const apiErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  details: z.array(apiErrorDetailSchema).optional(),
  requestId: z.string().optional(),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;
export type ApiErrorDetail = z.infer<typeof apiErrorDetailSchema>;
