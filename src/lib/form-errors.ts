import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

/**
 * Puts the server's field errors on the matching form fields. Returns the messages that belong
 * to no field of this form, so the caller can show them in an alert.
 */
export function applyServerFieldErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): string[] {
  if (!isApiError(error)) return [];
  const leftOver: string[] = [];
  for (const { field, message } of error.fieldErrors) {
    const match = fields.find((name) => name === field);
    if (match) setError(match, { type: 'server', message }, { shouldFocus: true });
    else leftOver.push(message);
  }
  return leftOver;
}
