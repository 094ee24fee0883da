import { describe, expect, it } from 'vitest';
import { readZip, unsafePathReason, ZipRejected } from '@server/features/robot-files/zip-reader';
import { withDeclaredSize, zipOf } from '../../../../factories/zips';

const limits = { maxEntries: 10, maxTotalBytes: 1000 };

describe('paths inside an uploaded zip', () => {
  it('accepts plain relative paths', () => {
    expect(['config.json', 'robot/robot.ino', 'a/b/c.h', 'dots..in.name'].map(unsafePathReason)).toEqual([
      null,
      null,
      null,
      null,
    ]);
  });

  it('refuses climbing, roots, drives, backslashes and NUL', () => {
    expect(unsafePathReason('a/../../b')).toMatch(/climbs out/);
    expect(unsafePathReason('/etc/passwd')).toMatch(/absolute/);
    expect(unsafePathReason('C:/Windows/x')).toMatch(/absolute/);
    expect(unsafePathReason('a\\b')).toMatch(/backslashes/);
    expect(unsafePathReason('a\0b')).toMatch(/NUL/);
  });
});

describe('reading a zip', () => {
  it('gives every file by path', async () => {
    const files = readZip(await zipOf({ 'config.json': '{}', 'robot/robot.ino': 'void loop() {}' }), limits);
    expect([...files.keys()]).toEqual(['config.json', 'robot/robot.ino']);
    expect(files.get('robot/robot.ino')!.toString()).toBe('void loop() {}');
  });

  it('refuses the same path twice', async () => {
    const zip = await zipOf({ 'config.json': '{}', 'config.jsoN': '{}' });
    // Rename the second entry in place so both records carry the same name.
    const twice = Buffer.from(zip.toString('latin1').replaceAll('config.jsoN', 'config.json'), 'latin1');
    expect(() => readZip(twice, limits)).toThrow(new ZipRejected('The zip holds "config.json" twice'));
  });

  it('refuses more entries than allowed before reading any', async () => {
    const zip = await zipOf(Object.fromEntries(Array.from({ length: 11 }, (_, i) => [`${i}.txt`, 'x'])));
    expect(() => readZip(zip, limits)).toThrow(/holds 11 entries; at most 10/);
  });

  it('stops inflating at the limit even when the header says the entry is small', async () => {
    const zip = withDeclaredSize(await zipOf({ 'big.bin': Buffer.alloc(50_000) }), 'big.bin', 5);
    expect(() => readZip(zip, limits)).toThrow(/unpacks to more than/);
  });

  it('refuses an entry whose content does not match its checksum', async () => {
    const damaged = Buffer.from(await zipOf({ 'a.txt': 'hello hello hello' }));
    const central = damaged.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02])); // central directory record
    damaged.writeUInt32LE((damaged.readUInt32LE(central + 16) ^ 1) >>> 0, central + 16); // its CRC-32, one bit off
    expect(() => readZip(damaged, limits)).toThrow(
      new ZipRejected('The zip archive is damaged ("a.txt" fails its checksum)'),
    );
  });
});
