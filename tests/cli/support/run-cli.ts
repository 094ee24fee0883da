import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';

export interface Outcome {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs the real command line, as a user would: `npx tsx server/cli/index.ts ...`. */
export function cli(...args: string[]): Promise<Outcome> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'server/cli/index.ts', ...args], { cwd: process.cwd() }, (error, stdout, stderr) => {
      resolve({ code: error ? (typeof error.code === 'number' ? error.code : 1) : 0, stdout, stderr });
    });
  });
}

export interface ScratchDir {
  /** A path inside the folder. */
  path: (name: string) => string;
  /** Writes a file into the folder (text as is, anything else as JSON) and returns its path. */
  file: (name: string, value: unknown) => Promise<string>;
}

/** A temporary folder for the test file's inputs and outputs, made before its tests and removed after. */
export function useScratchDir(prefix: string): ScratchDir {
  let dir = '';
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), prefix));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });
  const path = (name: string) => join(dir, name);
  return {
    path,
    file: async (name, value) => {
      await writeFile(path(name), typeof value === 'string' ? value : JSON.stringify(value));
      return path(name);
    },
  };
}
