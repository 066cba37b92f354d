import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { PHOTO_ACCEPTED_TYPES, PHOTO_FULL_PX, PHOTO_THUMB_PX } from '@shared/constants/photos';
import { errors } from '../../lib/app-error';

type AcceptedType = (typeof PHOTO_ACCEPTED_TYPES)[number];

export interface ProcessedPhoto {
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
  originalType: AcceptedType;
}

/** Enough for any phone camera; far below what would exhaust memory while decoding. */
const MAX_INPUT_PIXELS = 60_000_000;

// eslint-disable-next-line no-control-regex
const shown = (name: string) => `"${name.replace(/[\u0000-\u001f"\\]/g, '').slice(0, 80) || 'the file'}"`;

const isAccepted = (mime: string): mime is AcceptedType =>
  (PHOTO_ACCEPTED_TYPES as readonly string[]).includes(mime);

/**
 * Checks what the bytes are (never the name or the declared type, ASVS 5.2.2), then re-encodes to WebP: rotate()
 * applies the camera's orientation, and sharp writes no metadata unless asked, so EXIF and GPS are gone (ASVS 5.2.x).
 */
export async function processPhoto(
  file: { buffer: Buffer; originalname: string },
  index: number,
): Promise<ProcessedPhoto> {
  const path = `photos.${index}`;
  const type = await fileTypeFromBuffer(file.buffer);
  if (!type || !isAccepted(type.mime)) {
    throw errors.badRequest(`${shown(file.originalname)} is not a JPEG, PNG or WebP picture.`, [
      { path, message: 'Choose a JPEG, PNG or WebP picture.' },
    ]);
  }
  try {
    const source = sharp(file.buffer, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
    const fit = (px: number) => ({ width: px, height: px, fit: 'inside' as const, withoutEnlargement: true });
    const full = await source
      .clone()
      .resize(fit(PHOTO_FULL_PX))
      .webp({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await source.clone().resize(fit(PHOTO_THUMB_PX)).webp({ quality: 75 }).toBuffer();
    return {
      full: full.data,
      thumb,
      width: full.info.width,
      height: full.info.height,
      originalType: type.mime,
    };
  } catch {
    throw errors.badRequest(
      `${shown(file.originalname)} could not be read as a picture: it may be damaged.`,
      [{ path, message: 'Choose another picture.' }],
    );
  }
}
