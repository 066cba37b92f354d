import type { RequestHandler } from 'express';
import multer from 'multer';
import { PHOTO_FIELD, PHOTO_MAX_BYTES, PHOTO_MAX_FILES } from '@shared/constants/photos';
import { AppError, errors } from '../../lib/app-error';

const MAX_TEXT_FIELDS = 8;

// multer's limits default to Infinity: every one is set (ASVS 5.2.1).
const upload = multer({
  storage: multer.memoryStorage(),
  limits: {
    fileSize: PHOTO_MAX_BYTES,
    files: PHOTO_MAX_FILES,
    fields: MAX_TEXT_FIELDS,
    parts: PHOTO_MAX_FILES + MAX_TEXT_FIELDS,
    fieldNameSize: 100,
    fieldSize: 4 * 1024,
    headerPairs: 100,
  },
}).array(PHOTO_FIELD, PHOTO_MAX_FILES);

function toAppError(err: unknown): AppError {
  if (err instanceof multer.MulterError) {
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return errors.tooLarge(
          `A photo is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB. Choose a smaller one.`,
        );
      case 'LIMIT_FILE_COUNT':
        return errors.badRequest(`Send at most ${PHOTO_MAX_FILES} photos at a time.`, [
          { path: PHOTO_FIELD, message: `At most ${PHOTO_MAX_FILES}.` },
        ]);
      case 'LIMIT_UNEXPECTED_FILE':
        return err.field === PHOTO_FIELD
          ? errors.badRequest(`Send at most ${PHOTO_MAX_FILES} photos at a time.`, [
              { path: PHOTO_FIELD, message: `At most ${PHOTO_MAX_FILES}.` },
            ])
          : errors.badRequest(`Send the pictures in the "${PHOTO_FIELD}" field.`, [
              { path: err.field ?? '(root)', message: 'Not expected here.' },
            ]);
      default:
        return errors.badRequest('The form has too many or too long fields.');
    }
  }
  return errors.badRequest('The upload was cut short or is not a valid form. Please try again.');
}

/** Reads a multipart upload into memory within the limits; any problem becomes a 400 or 413 with a clear message. */
export const receivePhotos: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) {
    return next(
      errors.badRequest('Send the photos as multipart/form-data.', [
        { path: PHOTO_FIELD, message: 'Choose a JPEG, PNG or WebP picture.' },
      ]),
    );
  }
  upload(req, res, (err?: unknown) => next(err ? toAppError(err) : undefined));
};
