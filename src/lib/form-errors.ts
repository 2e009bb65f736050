import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { errorMessage, isApiError } from './api-client';

/** Said after the left-over messages when some of the server's messages went on fields. */
export const MARKED_FIELDS_NOTE = 'Check the fields marked ⚠ above.';

export interface ServerErrorOptions {
  /**
   * Add MARKED_FIELDS_NOTE to the alert when some messages went on fields: for a long form whose
   * marked fields may be out of sight above the alert.
   */
  pointToFields?: boolean;
}

/**
 * A failed save, for a form: puts the server's field errors on the matching fields and returns
 * what the form's alert says, in order. Messages for fields this form lacks come first; when
 * every message went on a field the alert has nothing to add (empty list); an error with no
 * field errors at all says its own message.
 */
export function serverErrorMessages<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  { pointToFields = false }: ServerErrorOptions = {},
): string[] {
  const fieldErrors = isApiError(error) ? error.fieldErrors : [];
  const leftOver: string[] = [];
  for (const { field, message } of fieldErrors) {
    const match = fields.find((name) => name === field);
    if (match) setError(match, { type: 'server', message }, { shouldFocus: true });
    else leftOver.push(message);
  }
  const placed = fieldErrors.length > leftOver.length;
  if (placed) return pointToFields ? [...leftOver, MARKED_FIELDS_NOTE] : leftOver;
  return leftOver.length > 0 ? leftOver : [errorMessage(error)];
}
