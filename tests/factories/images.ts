import { crc32, deflateSync } from 'node:zlib';

// Small images built byte by byte, for tests of the photo upload's content check.
// PNG: W3C "Portable Network Graphics (PNG) Specification (Third Edition)", §5.2 signature,
// §5.3 chunk layout with CRC-32, §11.2 IHDR/IDAT/IEND. JPEG: ITU-T T.81 Annex B (SOI, APP0
// "JFIF", EOI markers). WebP: RFC 9649 §2.5 RIFF header and §2.7 "VP8L" simple lossless format.

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

/** The markers that open every JFIF file (start of image, APP0 "JFIF" 1.1), then end of image. */
export function jpegHeaderImage(): Buffer {
  const app0 = [
    0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00,
  ];
  return Buffer.from([0xff, 0xd8, ...app0, 0xff, 0xd9]);
}

/** A 1 × 1 lossless WebP. */
export function webpImage(): Buffer {
  return Buffer.from('UklGRhoAAABXRUJQVlA4TA0AAAAvAAAAEAcQERGIiP4HAA==', 'base64');
}

/** A 1 × 1 GIF (GIF89a), which the photo upload must refuse. */
export function gifImage(): Buffer {
  return Buffer.from('R0lGODlhAQABAIAAAP///wAAACH5BAEAAAAALAAAAAABAAEAAAICRAEAOw==', 'base64');
}
