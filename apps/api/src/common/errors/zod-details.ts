import type { ApiErrorDetail } from '@evenset/contracts';
import { ZodError } from 'zod';

/**
 * Flattens a zod error into `{ path, message }` pairs that name the field at fault; an issue with
 * the input as a whole (an array or nothing where an object belongs) names the input, `whole`.
 */
export function zodDetails(error: unknown, whole = 'body'): ApiErrorDetail[] {
  if (!(error instanceof ZodError)) return [{ path: whole, message: 'The request is not valid.' }];
  return error.issues.map((issue) => ({
    path: issue.path.length > 0 ? issue.path.map(String).join('.') : whole,
    message: issue.message,
  }));
}
