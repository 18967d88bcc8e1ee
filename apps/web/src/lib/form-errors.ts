import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';
import { describeError } from './errors';

interface ServerErrorMapping<T extends FieldValues> {
  /** Form fields the server may name in `details[].path`. */
  fields: readonly Path<T>[];
  /** Refusals without details that still belong to one field, e.g. USER_EMAIL_TAKEN → email. */
  codes?: Readonly<Record<string, Path<T>>>;
  /**
   * Put each message on the exact path the server named (e.g. `definition.plan.stations.2.name`)
   * rather than on the top-level field, for forms with nested fields and lists.
   */
  exactPaths?: boolean;
}

/**
 * Puts a refused request's messages where the person will look: on the named fields, and
 * anything that fits no field on `root.server` for the form's alert.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  { fields, codes = {}, exactPaths = false }: ServerErrorMapping<T>,
): void {
  const fieldFor = (path: string): Path<T> | undefined => {
    const field = fields.find((name) => path.split('.')[0] === name);
    return field && exactPaths ? (path as Path<T>) : field;
  };
  if (error instanceof ApiError) {
    const unplaced = error.details.filter((detail) => {
      const field = fieldFor(detail.path);
      if (field) setError(field, { type: error.code, message: detail.message });
      return !field;
    });
    const codeField = codes[error.code];
    if (codeField && error.details.length === 0) {
      setError(codeField, { type: error.code, message: error.message });
      return;
    }
    if (error.details.length > 0 && unplaced.length === 0) return;
  }
  // The code travels as the error's type, so a form can pick a tone (e.g. warning for throttling).
  setError('root.server', { type: error instanceof ApiError ? error.code : 'UNKNOWN', message: describeError(error) });
}
