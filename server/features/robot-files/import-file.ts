import { HttpError } from '@server/lib/http-error';
import { readZip, ZipRejected, type ZipLimits } from './zip-reader';

/** Limits on what an import may be; a firmware bundle is a few dozen files and well under 1 MB. */
export const IMPORT_LIMITS = {
  uploadBytes: 1024 * 1024,
  zip: { maxEntries: 100, maxTotalBytes: 4 * 1024 * 1024 } satisfies ZipLimits,
};

export interface ImportedJson {
  json: unknown;
  kind: 'json' | 'bundle';
}

const isZip = (data: Buffer) => data.length >= 4 && data.readUInt32LE(0) === 0x04034b50;
const isEmptyZip = (data: Buffer) => data.length >= 4 && data.readUInt32LE(0) === 0x06054b50;

function rejected(message: string): HttpError {
  return new HttpError(400, message, { code: 'import_rejected', fields: { file: message } });
}

function parseJson(text: string, where: string): unknown {
  try {
    return JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    throw rejected(`${where} is not valid JSON: ${(error as Error).message}`);
  }
}

/** config.json at the top of the archive, or inside its one top folder (a re-zipped bundle). */
function configEntry(files: Map<string, Buffer>): [string, Buffer] {
  const top = files.get('config.json');
  if (top) return ['config.json', top];
  const nested = [...files.entries()].filter(([path]) => /^[^/]+\/config\.json$/.test(path));
  if (nested.length === 1) return nested[0];
  if (nested.length > 1)
    throw rejected(`The zip holds ${nested.length} config.json files; upload one robot's bundle at a time`);
  throw rejected(
    'The zip has no config.json; upload a firmware bundle from Mixwright or the configuration file itself',
  );
}

/**
 * The configuration JSON inside an uploaded file: a JSON file as it is, or `config.json` from a
 * firmware bundle zip, after the zip's entry count, paths and unpacked size have been checked.
 */
export function readImportFile(data: Buffer): ImportedJson {
  if (data.length === 0) throw rejected('The file is empty');
  if (isZip(data) || isEmptyZip(data)) {
    let files: Map<string, Buffer>;
    try {
      files = readZip(data, IMPORT_LIMITS.zip);
    } catch (error) {
      if (error instanceof ZipRejected) throw rejected(error.message);
      throw error;
    }
    const [path, content] = configEntry(files);
    return { json: parseJson(content.toString('utf8'), path), kind: 'bundle' };
  }
  return { json: parseJson(data.toString('utf8'), 'The file'), kind: 'json' };
}
