import { rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The client built once for this run of the browser tests. */
    clientDir: string;
  }
}

const root = fileURLToPath(new URL('../../..', import.meta.url));
const outDir = fileURLToPath(new URL('../../../.cache/e2e-client', import.meta.url));

/** Builds the web client once per run, so browser tests use what production serves. */
export default async function setup(project: TestProject): Promise<void> {
  rmSync(outDir, { recursive: true, force: true });
  await build({
    root,
    configFile: `${root}/vite.config.ts`,
    logLevel: 'warn',
    build: { outDir, emptyOutDir: true },
  });
  project.provide('clientDir', outDir);
}
