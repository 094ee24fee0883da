import { randomBytes } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileTypeFromBuffer } from 'file-type';
import { HttpError } from '@server/lib/http-error';

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;

const ACCEPTED = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
} as const;
export type PhotoType = keyof typeof ACCEPTED;

/**
 * The photo's type from its first bytes (file-type reads the signatures), never from the name
 * or the type the browser claimed; anything but JPEG, PNG or WebP is refused.
 */
export async function photoType(data: Buffer): Promise<PhotoType> {
  const detected = await fileTypeFromBuffer(data);
  if (detected && detected.mime in ACCEPTED) return detected.mime as PhotoType;
  const what = detected ? `a ${detected.ext.toUpperCase()} file` : 'not an image this app recognises';
  const message = `The photo must be a JPEG, PNG or WebP image; this file is ${what}`;
  throw new HttpError(415, message, { code: 'unsupported_photo', fields: { photo: message } });
}

export function photosFolder(dataDir: string): string {
  return join(dataDir, 'photos');
}

/** Writes the photo under a random name (never the uploaded one) and returns that name. */
export async function storePhoto(dataDir: string, data: Buffer, type: PhotoType): Promise<string> {
  const folder = photosFolder(dataDir);
  await mkdir(folder, { recursive: true });
  const fileName = `${randomBytes(16).toString('hex')}.${ACCEPTED[type]}`;
  await writeFile(join(folder, fileName), data, { flag: 'wx' });
  return fileName;
}

export async function removePhotoFile(dataDir: string, fileName: string): Promise<void> {
  // Only names this module made are ever removed; a stray name cannot point elsewhere.
  if (!/^[0-9a-f]{32}\.(jpg|png|webp)$/.test(fileName)) throw new Error(`Not a stored photo name: ${fileName}`);
  await rm(join(photosFolder(dataDir), fileName), { force: true });
}
