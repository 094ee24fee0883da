import JSZip from 'jszip';

/** A zip of the given files, deflated, as a bundle download would be. */
export async function zipOf(files: Record<string, string | Buffer>): Promise<Buffer> {
  const zip = new JSZip();
  for (const [path, content] of Object.entries(files)) zip.file(path, content, { createFolders: false });
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}

/**
 * The same zip with one entry's declared uncompressed size rewritten to `size`, in its local
 * header and its central directory record: an archive that lies about how much it unpacks to.
 */
export function withDeclaredSize(zip: Buffer, entryName: string, size: number): Buffer {
  const out = Buffer.from(zip);
  const name = Buffer.from(entryName, 'utf8');
  for (let at = 0; at + 46 <= out.length; at++) {
    const signature = out.readUInt32LE(at);
    if (signature === 0x04034b50 && out.subarray(at + 30, at + 30 + name.length).equals(name))
      out.writeUInt32LE(size, at + 22);
    if (signature === 0x02014b50 && out.subarray(at + 46, at + 46 + name.length).equals(name))
      out.writeUInt32LE(size, at + 24);
  }
  return out;
}
