/** The record was saved but its photos were not: the form keeps the photos so the upload alone can be retried. */
export class PhotoUploadError extends Error {
  constructor(override readonly cause: unknown) {
    super(cause instanceof Error ? cause.message : 'The photo did not upload.');
    this.name = 'PhotoUploadError';
  }
}
