import { crc32, inflateRawSync } from 'node:zlib';

// A small, suspicious reader for uploaded zip archives. It checks the entry count and every
// path before it inflates anything, and it counts the bytes it actually inflates against the
// limit instead of believing the sizes the archive declares.
// Format: PKWARE "APPNOTE.TXT — .ZIP File Format Specification" 6.3.x, §4.3.6 (layout),
// §4.3.7 (local file header), §4.3.12 (central directory header), §4.3.16 (end of central
// directory record), §4.4.4 (general purpose flags: bit 0 encrypted, bit 11 UTF-8 names).

export interface ZipLimits {
  maxEntries: number;
  /** Total of every file's inflated bytes. */
  maxTotalBytes: number;
}

/** Why an archive was refused, in words for the person who uploaded it. */
export class ZipRejected extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ZipRejected';
  }
}

interface Entry {
  name: string;
  method: number;
  flags: number;
  crc: number;
  compressedSize: number;
  declaredSize: number;
  localOffset: number;
}

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;

const megabytes = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;

function findEndRecord(zip: Buffer): number {
  // The record is 22 bytes plus a comment of at most 65535 bytes, at the very end.
  const earliest = Math.max(0, zip.length - 22 - 0xffff);
  for (let at = zip.length - 22; at >= earliest; at--) {
    if (zip.readUInt32LE(at) === EOCD) return at;
  }
  throw new ZipRejected('The file is not a readable zip archive (no end-of-archive record)');
}

/** A path that stays inside the archive's own folder: no `..`, no root, no drive, no backslash. */
export function unsafePathReason(name: string): string | null {
  if (name.includes('\\')) return `"${name}" uses backslashes`;
  if (name.includes('\0')) return `"${name}" holds a NUL character`;
  if (name.startsWith('/') || /^[A-Za-z]:/.test(name)) return `"${name}" is an absolute path`;
  if (name.split('/').some((part) => part === '..')) return `"${name}" climbs out of the archive with ..`;
  return null;
}

function readDirectory(zip: Buffer, limits: ZipLimits): Entry[] {
  const end = findEndRecord(zip);
  const count = zip.readUInt16LE(end + 10);
  const size = zip.readUInt32LE(end + 12);
  const offset = zip.readUInt32LE(end + 16);
  if (zip.readUInt16LE(end + 4) !== 0 || zip.readUInt16LE(end + 8) !== count)
    throw new ZipRejected('Archives split over several files are not accepted');
  if (count === 0xffff || offset === 0xffffffff)
    throw new ZipRejected('ZIP64 archives are not accepted; a Mixwright bundle is far smaller');
  if (count > limits.maxEntries)
    throw new ZipRejected(`The zip holds ${count} entries; at most ${limits.maxEntries} are accepted`);
  if (offset + size > end) throw new ZipRejected('The zip archive is damaged (its directory lies outside the file)');
  const entries: Entry[] = [];
  let at = offset;
  while (at < offset + size) {
    // Count what is really there, not only what the end record claims.
    if (entries.length >= limits.maxEntries)
      throw new ZipRejected(`The zip holds more than ${limits.maxEntries} entries`);
    if (at + 46 > zip.length || zip.readUInt32LE(at) !== CENTRAL)
      throw new ZipRejected('The zip archive is damaged (bad directory entry)');
    const flags = zip.readUInt16LE(at + 8);
    const nameLength = zip.readUInt16LE(at + 28);
    const next = at + 46 + nameLength + zip.readUInt16LE(at + 30) + zip.readUInt16LE(at + 32);
    if (next > offset + size)
      throw new ZipRejected('The zip archive is damaged (directory entry runs past the directory)');
    const nameBytes = zip.subarray(at + 46, at + 46 + nameLength);
    entries.push({
      name: nameBytes.toString(flags & 0x800 ? 'utf8' : 'latin1'),
      method: zip.readUInt16LE(at + 10),
      flags,
      crc: zip.readUInt32LE(at + 16),
      compressedSize: zip.readUInt32LE(at + 20),
      declaredSize: zip.readUInt32LE(at + 24),
      localOffset: zip.readUInt32LE(at + 42),
    });
    at = next;
  }
  return entries;
}

function checkEntries(entries: Entry[], limits: ZipLimits): void {
  const seen = new Set<string>();
  for (const entry of entries) {
    if (seen.has(entry.name)) throw new ZipRejected(`The zip holds "${entry.name}" twice`);
    seen.add(entry.name);
    const unsafe = unsafePathReason(entry.name);
    if (unsafe) throw new ZipRejected(`The zip has an unsafe path: ${unsafe}`);
    if (entry.flags & 0x1) throw new ZipRejected(`"${entry.name}" is encrypted; upload an archive without a password`);
    if (entry.method !== 0 && entry.method !== 8) {
      throw new ZipRejected(
        `"${entry.name}" uses compression method ${entry.method}; only stored and deflated entries are read`,
      );
    }
  }
  const declared = entries.reduce((sum, e) => sum + e.declaredSize, 0);
  if (declared > limits.maxTotalBytes) {
    throw new ZipRejected(
      `The zip unpacks to ${megabytes(declared)}; at most ${megabytes(limits.maxTotalBytes)} are accepted`,
    );
  }
}

function inflateEntry(zip: Buffer, entry: Entry, budget: number, limit: number): Buffer {
  const at = entry.localOffset;
  if (at + 30 > zip.length || zip.readUInt32LE(at) !== LOCAL)
    throw new ZipRejected(`The zip archive is damaged ("${entry.name}" has no local header)`);
  const start = at + 30 + zip.readUInt16LE(at + 26) + zip.readUInt16LE(at + 28);
  if (start + entry.compressedSize > zip.length)
    throw new ZipRejected(`The zip archive is damaged ("${entry.name}" runs past the end)`);
  const raw = zip.subarray(start, start + entry.compressedSize);
  const tooLarge = () =>
    new ZipRejected(`The zip unpacks to more than ${megabytes(limit)}; at most ${megabytes(limit)} are accepted`);
  let data: Buffer;
  if (entry.method === 0) {
    if (raw.length > budget) throw tooLarge();
    data = Buffer.from(raw);
  } else {
    try {
      // maxOutputLength stops inflating at the budget, whatever the header said.
      data = inflateRawSync(raw, { maxOutputLength: Math.max(1, budget) });
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ERR_BUFFER_TOO_LARGE') throw tooLarge();
      throw new ZipRejected(`The zip archive is damaged ("${entry.name}" does not inflate)`);
    }
  }
  if (data.length > budget) throw tooLarge();
  if (data.length !== entry.declaredSize)
    throw new ZipRejected(`The zip archive is damaged ("${entry.name}" is not the size it declares)`);
  if (crc32(data) !== entry.crc)
    throw new ZipRejected(`The zip archive is damaged ("${entry.name}" fails its checksum)`);
  return data;
}

/**
 * Every file of a zip archive by path, after checking the entry count, every path and the
 * total inflated size. Throws ZipRejected with the reason; nothing is read past a failed check.
 */
export function readZip(zip: Buffer, limits: ZipLimits): Map<string, Buffer> {
  if (zip.length < 22) throw new ZipRejected('The file is too short to be a zip archive');
  const entries = readDirectory(zip, limits);
  checkEntries(entries, limits);
  const files = new Map<string, Buffer>();
  let total = 0;
  for (const entry of entries) {
    if (entry.name.endsWith('/')) continue;
    const data = inflateEntry(zip, entry, limits.maxTotalBytes - total, limits.maxTotalBytes);
    total += data.length;
    files.set(entry.name, data);
  }
  return files;
}
