import { useState } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';
import { PhotoUploadError } from './save-with-photos';

/** Maps an API/schema path to the form field showing it; null puts the message at the top of the form. */
export type FieldOf = (path: string) => string | null;

/** For forms whose fields are named like the API's: those paths, and nothing else, land on a field. */
export const fieldsIn =
  (fields: readonly string[]): FieldOf =>
  (path) =>
    fields.includes(path) ? path : null;

/**
 * Puts a server 400's issues on the form's fields; returns the message for the top of the form when something is
 * left to say (an issue no field shows, or an error that is not about fields at all).
 */
export function placeServerErrors<T extends FieldValues>(
  error: unknown,
  fieldOf: FieldOf,
  setError: UseFormSetError<T>,
): string | undefined {
  if (!(error instanceof ApiError))
    return 'Could not reach Shoalwise. Check your connection and try again: what you entered is still here.';
  let unplaced = error.issues.length === 0;
  for (const issue of error.issues) {
    const field = fieldOf(issue.path);
    if (field) setError(field as Path<T>, { type: 'server', message: issue.message });
    else unplaced = true;
  }
  return unplaced ? error.message : undefined;
}

/**
 * What a form shows after trying to save: the server's field errors on their fields and the rest at the top, or,
 * once the record is saved but a photo is not, the upload's problem (the form offers to retry it).
 */
export function useSaveErrors<T extends FieldValues>(fieldOf: FieldOf, setError: UseFormSetError<T>) {
  const [formError, setFormError] = useState<string>();
  const [photoError, setPhotoError] = useState<string>();
  const attempt = async (save: () => Promise<unknown>) => {
    setFormError(undefined);
    setPhotoError(undefined);
    try {
      await save();
    } catch (error) {
      if (error instanceof PhotoUploadError) setPhotoError(error.message);
      else setFormError(placeServerErrors(error, fieldOf, setError));
    }
  };
  return { formError, photoError, attempt };
}
