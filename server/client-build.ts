import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/**
 * What the built client is made from: its own folders, the shared pure code it imports, and
 * the files that configure the build. A change to any of them makes the build out of date.
 */
export const CLIENT_SOURCES = [
  'src',
  'shared',
  'public',
  'index.html',
  'vite.config.ts',
  'tsconfig.json',
  'package-lock.json',
];

/** The newest modification time (ms) of any file under `path`; 0 when it does not exist. */
function newestChange(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestChange(join(path, entry)));
  return newest;
}

export type ClientBuildState = 'missing' | 'stale' | 'fresh';

/** Whether `outDir` holds a build at least as new as every client source under `root`. */
export function clientBuildState(root: string, outDir: string): ClientBuildState {
  const index = join(outDir, 'index.html');
  if (!existsSync(index)) return 'missing';
  const built = statSync(index).mtimeMs;
  const sources = Math.max(...CLIENT_SOURCES.map((source) => newestChange(join(root, source))));
  return sources > built ? 'stale' : 'fresh';
}

/**
 * Builds the client into `outDir` when the build is missing or older than its sources, so the
 * main command always serves what the sources say without anyone remembering `npm run build`.
 */
export async function ensureClientBuild(options: {
  root: string;
  outDir: string;
  log: (line: string) => void;
}): Promise<ClientBuildState> {
  const state = clientBuildState(options.root, options.outDir);
  if (state === 'fresh') return state;
  options.log(
    state === 'missing'
      ? 'Building the web client (first start); this takes a minute…'
      : 'The web client changed since it was last built; building it again, this takes a minute…',
  );
  const started = Date.now();
  const { build } = await import('vite');
  await build({
    root: options.root,
    configFile: join(options.root, 'vite.config.ts'),
    logLevel: 'warn',
    build: { outDir: options.outDir, emptyOutDir: true },
  });
  options.log(`Web client built in ${Math.round((Date.now() - started) / 1000)} s.`);
  return state;
}
