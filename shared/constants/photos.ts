/** Upload limits; the server enforces them and the client's file picker uses them. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTO_MAX_FILES = 4;
export const PHOTO_ACCEPTED_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
/** Longest side of the stored picture and of its thumbnail, pixels. */
export const PHOTO_FULL_PX = 1600;
export const PHOTO_THUMB_PX = 320;
/** The multipart field that carries the files. */
export const PHOTO_FIELD = 'photos';
