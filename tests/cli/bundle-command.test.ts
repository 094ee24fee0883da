import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleConfigInput } from '../factories/robot-config';

function cli(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'server/cli/index.ts', ...args], { cwd: process.cwd() }, (error, stdout, stderr) => {
      resolve({ code: error ? (typeof error.code === 'number' ? error.code : 1) : 0, stdout, stderr });
    });
  });
}

let dir: string;
let configPath: string;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'mixwright-bundle-'));
  configPath = join(dir, 'robot.json');
  await writeFile(configPath, JSON.stringify(sampleConfigInput()));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('the bundle command', { timeout: 60_000 }, () => {
  it('writes the bundle as a zip and lists its files', async () => {
    const out = join(dir, 'out.zip');
    const result = await cli('bundle', configPath, '-o', out, '--revision', '5');
    expect(result.code).toBe(0);
    const summary = JSON.parse(result.stdout);
    expect(summary).toMatchObject({ revision: 5, zip: out });
    const zip = await JSZip.loadAsync(await readFile(out));
    expect(Object.keys(zip.files).sort()).toEqual([...summary.files].sort());
    expect(await zip.file('garden_hauler/mw_config.h')!.async('string')).toContain('#define MW_REVISION 5UL');
  });

  it('writes the bundle into a folder', async () => {
    const out = join(dir, 'folder');
    expect((await cli('bundle', configPath, '--dir', out)).code).toBe(0);
    expect(await readFile(join(out, 'garden_hauler', 'garden_hauler.ino'), 'utf8')).toContain('void loop()');
  });

  it('asks where to write when neither -o nor --dir is given', async () => {
    const result = await cli('bundle', configPath);
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('-o <file.zip> or --dir <folder>');
  });

  it('names the field when the configuration cannot become firmware', async () => {
    const config = sampleConfigInput();
    config.wiring.drivers[0].pins = {};
    const path = join(dir, 'unwired.json');
    await writeFile(path, JSON.stringify(config));
    const result = await cli('bundle', path, '-o', join(dir, 'x.zip'));
    expect(result.code).toBe(1);
    expect(result.stderr).toContain('wiring.drivers.0.pins.a.pwm.pin');
  });

  it('refuses a revision that is not a whole number', async () => {
    const result = await cli('bundle', configPath, '-o', join(dir, 'y.zip'), '--revision', 'two');
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('--revision must be a whole number');
  });
});
