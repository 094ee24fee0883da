import { randomBytes } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { HttpError } from '@server/lib/http-error';

/** Largest upload accepted, in bytes. */
export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
/**
 * Largest picture accepted, by the size its header declares: 50 megapixels covers the biggest
 * phone cameras, and decoding it takes about 150 MB. A tiny file can declare far more (a
 * "decompression bomb"), so this is checked before any pixel is decoded.
 */
export const PHOTO_MAX_PIXELS = 50_000_000;
/** The stored photo's longest side: plenty for a robot card and a bench printout. */
export const PHOTO_STORED_SIDE = 2048;

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

function refuse(status: number, code: string, message: string): HttpError {
  return new HttpError(status, message, { code, fields: { photo: message } });
}

/** The picture's declared size, read from its header without decoding it. */
async function declaredSize(data: Buffer): Promise<{ width: number; height: number }> {
  let width: number | undefined;
  let height: number | undefined;
  try {
    // Reading the header decodes no pixels, so no pixel limit applies yet: the size is judged below.
    ({ width, height } = await sharp(data, { limitInputPixels: false }).metadata());
  } catch {
    width = undefined;
  }
  if (!width || !height) throw refuse(422, 'photo_unreadable', 'The photo could not be read; it may be damaged');
  return { width, height };
}

/**
 * The photo as it will be stored: its type checked by content, its declared size checked before
 * decoding, then decoded and written anew (turned upright, at most PHOTO_STORED_SIDE pixels on
 * its longest side). Re-encoding keeps only pixels: camera details, GPS location, comments and
 * anything appended after the image are gone.
 */
export async function preparePhoto(upload: Buffer): Promise<{ data: Buffer; type: PhotoType }> {
  const type = await photoType(upload);
  const { width, height } = await declaredSize(upload);
  if (width * height > PHOTO_MAX_PIXELS) {
    const megapixels = Math.round((width * height) / 1e6);
    throw refuse(
      422,
      'photo_too_many_pixels',
      `The photo is ${width} × ${height} pixels (${megapixels} megapixels); at most ${PHOTO_MAX_PIXELS / 1e6} megapixels are accepted`,
    );
  }
  const image = sharp(upload, { limitInputPixels: PHOTO_MAX_PIXELS, failOn: 'error' })
    .rotate()
    .resize({ width: PHOTO_STORED_SIDE, height: PHOTO_STORED_SIDE, fit: 'inside', withoutEnlargement: true });
  const encoded =
    type === 'image/jpeg'
      ? image.jpeg({ quality: 85, mozjpeg: true })
      : type === 'image/png'
        ? image.png({ compressionLevel: 9 })
        : image.webp({ quality: 85 });
  try {
    return { data: await encoded.toBuffer(), type };
  } catch {
    throw refuse(422, 'photo_unreadable', 'The photo could not be read; it may be damaged');
  }
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
