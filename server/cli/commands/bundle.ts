import { mkdir, writeFile } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import { FirmwareConfigError } from '@server/features/firmware/model/firmware-config-error';
import { renderBundle, type BundleFile } from '@server/features/firmware/render-bundle';
import { verifyBundle } from '@server/features/firmware/verify-bundle';
import { zipBundle } from '@server/features/firmware/zip-bundle';
import { CliError, printJson, readConfigFile } from '../io';
import { parseCliArgs } from './mix';

const OPTIONS = {
  out: { type: 'string', short: 'o' },
  dir: { type: 'string' },
  revision: { type: 'string' },
  verify: { type: 'boolean' },
} as const;

function revisionOption(raw: unknown): number {
  if (raw === undefined) return 1;
  const value = Number(raw);
  if (typeof raw !== 'string' || !/^\d+$/.test(raw) || !Number.isSafeInteger(value)) {
    throw new CliError(`--revision must be a whole number, 0 or more, got "${String(raw)}"`, 2);
  }
  return value;
}

async function writeFolder(root: string, files: BundleFile[]): Promise<void> {
  for (const file of files) {
    const path = join(root, file.path);
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, file.content);
  }
}

/** `bundle <config.json> (-o out.zip | --dir out/) [--revision N] [--verify]` */
export async function run(args: string[]): Promise<number> {
  const { values, positionals } = parseCliArgs(args, OPTIONS);
  const out = values.out as string | undefined;
  const dir = values.dir as string | undefined;
  if (!out && !dir) throw new CliError('Give -o <file.zip> or --dir <folder> for the bundle', 2);
  const config = await readConfigFile(positionals[0]);
  const revision = revisionOption(values.revision);
  let files: BundleFile[];
  try {
    files = renderBundle(config, { revision });
  } catch (error) {
    if (error instanceof FirmwareConfigError) throw new CliError(error.message);
    throw error;
  }
  if (out) {
    await mkdir(dirname(resolve(out)), { recursive: true });
    await writeFile(out, await zipBundle(files));
  }
  if (dir) await writeFolder(resolve(dir), files);
  const verify = values.verify ? await verifyBundle(files) : undefined;
  printJson({
    revision,
    files: files.map((f) => f.path),
    ...(out ? { zip: out } : {}),
    ...(dir ? { dir } : {}),
    ...(verify ? { verify } : {}),
  });
  return verify && verify.sketches.some((s) => s.ok === false) ? 1 : 0;
}
