import type { ApiErrorDetail } from '@evenset/contracts';
import { ZodError } from 'zod';

/** Flattens a zod error into `{ path, message }` pairs that name the field at fault. */
export function zodDetails(error: unknown): ApiErrorDetail[] {
  if (!(error instanceof ZodError)) return [{ path: '', message: 'The request is not valid.' }];
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
}
