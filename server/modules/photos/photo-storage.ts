import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { rename, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';

const KEY = /^[0-9a-f]{32}$/;

export type PhotoSize = 'full' | 'thumb';

export function newStorageKey(): string {
  return randomBytes(16).toString('hex');
}

/** The file of a stored photo; the key is checked again so no path can be built from anything else. */
export function photoPath(uploadsDir: string, key: string, size: PhotoSize): string {
  if (!KEY.test(key)) throw new Error('photo-storage: bad storage key');
  return join(uploadsDir, size === 'full' ? `${key}.webp` : `${key}.thumb.webp`);
}

export function ensureUploadsDir(uploadsDir: string): void {
  mkdirSync(uploadsDir, { recursive: true, mode: 0o700 });
}

export interface StagedFile {
  temp: string;
  final: string;
}

/** Writes under a temporary name ("….tmp-<random>"), so a crash never leaves a file under a real key. */
export async function stage(
  uploadsDir: string,
  key: string,
  size: PhotoSize,
  data: Buffer,
): Promise<StagedFile> {
  const final = photoPath(uploadsDir, key, size);
  const temp = `${final}.tmp-${randomBytes(6).toString('hex')}`;
  await writeFile(temp, data, { mode: 0o600, flag: 'wx' });
  return { temp, final };
}

export async function publish(files: readonly StagedFile[]): Promise<void> {
  for (const f of files) await rename(f.temp, f.final);
}

/** Removes staged and published files alike; missing files are fine. */
export async function discard(files: readonly StagedFile[]): Promise<void> {
  await Promise.all(files.flatMap((f) => [rm(f.temp, { force: true }), rm(f.final, { force: true })]));
}

export async function removePhotoFiles(uploadsDir: string, keys: readonly string[]): Promise<void> {
  await Promise.all(
    keys.flatMap((k) => [
      rm(photoPath(uploadsDir, k, 'full'), { force: true }),
      rm(photoPath(uploadsDir, k, 'thumb'), { force: true }),
    ]),
  );
}
