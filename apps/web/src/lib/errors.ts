import { ApiError } from './api-client';

/** One sentence for people, never a stack trace; the reference lets support find the log line. */
export function describeError(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong on this page. Reload the page and try again.';
  if (error.status >= 500 && error.requestId) return `${error.message} (Reference: ${error.requestId})`;
  return error.message;
}
