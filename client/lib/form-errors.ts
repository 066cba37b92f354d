import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/** Puts the server's 400 field issues onto the form's fields; returns the message for anything else. */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly string[]): string | undefined {
  if (!(error instanceof ApiError)) return 'Something went wrong. Check your connection and try again.';
  let unplaced = false;
  for (const issue of error.issues) {
    if (fields.includes(issue.path)) setError(issue.path as Path<T>, { type: 'server', message: issue.message });
    else unplaced = true;
  }
  if (error.issues.length && !unplaced) return undefined;
  if (error.status === 429 && error.retryAfterSeconds) return `${error.message}`;
  return error.message;
}
