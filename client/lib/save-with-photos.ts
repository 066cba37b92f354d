import { useRef } from 'react';

/** The record was saved but its photos were not: the form keeps the photos so the upload alone can be retried. */
export class PhotoUploadError extends Error {
  constructor(override readonly cause: unknown) {
    super(cause instanceof Error ? cause.message : 'The photo did not upload.');
    this.name = 'PhotoUploadError';
  }
}

/**
 * Saves a record, then its photos. The record is stored once whatever happens next: a second tap while the first
 * save is on its way joins it, and a submit after a failed upload sends only the photos again. A failed save (the
 * record was not stored) may be tried again. A failed upload throws PhotoUploadError.
 */
export function useSaveWithPhotos<I, S>(
  save: (input: I) => Promise<S>,
  upload: (saved: S, photos: File[]) => Promise<unknown>,
) {
  const record = useRef<Promise<S> | undefined>(undefined);
  const running = useRef<Promise<S> | undefined>(undefined);
  const run = async (input: I, photos: File[]): Promise<S> => {
    try {
      record.current ??= save(input).catch((error: unknown) => {
        record.current = undefined;
        throw error;
      });
      const saved = await record.current;
      if (photos.length) {
        try {
          await upload(saved, photos);
        } catch (error) {
          throw new PhotoUploadError(error);
        }
      }
      return saved;
    } finally {
      running.current = undefined;
    }
  };
  return (input: I, photos: File[]): Promise<S> => (running.current ??= run(input, photos));
}
