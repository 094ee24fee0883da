import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';

// Small images for tests of the photo upload, built byte by byte where the bytes matter.
// PNG: W3C "Portable Network Graphics (PNG) Specification (Third Edition)", §5.2 signature,
// §5.3 chunk layout with CRC-32, §11.2 IHDR/IDAT/IEND. WebP: RFC 9649 §2.5 RIFF header and
// §2.7 "VP8L" simple lossless format.

function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A real `size` × `size` RGB PNG filled with one colour. */
export function pngImage(size = 2, rgb: [number, number, number] = [42, 111, 115]): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit, truecolour, deflate, no filter method, no interlace
  const row = Buffer.concat([Buffer.from([0]), Buffer.from(Array.from({ length: size }, () => rgb).flat())]);
  const pixels = deflateSync(Buffer.concat(Array.from({ length: size }, () => row)));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', pixels),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/**
 * A PNG whose header (IHDR) declares `width` × `height` pixels but which holds almost no pixel
 * data: what a decompression bomb looks like before anyone decodes it.
 */
export function pngDeclaring(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(Buffer.alloc(64))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/**
 * A real JPEG of one colour carrying EXIF: the camera's make and a GPS position (the GPS IFD,
 * tag 0x8825, of the EXIF 2.32 specification, written by sharp's `withExif`).
 */
export function jpegWithLocation(width = 64, height = 48): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: { r: 40, g: 120, b: 90 } } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Larkspur Camera', Model: 'Club 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer();
}

/** A 1 × 1 lossless WebP. */
export function webpImage(): Buffer {
  return Buffer.from('UklGRhoAAABXRUJQVlA4TA0AAAAvAAAAEAcQERGIiP4HAA==', 'base64');
}

/** A 1 × 1 GIF (GIF89a), which the photo upload must refuse. */
export function gifImage(): Buffer {
  return Buffer.from('R0lGODlhAQABAIAAAP///wAAACH5BAEAAAAALAAAAAABAAEAAAICRAEAOw==', 'base64');
}
