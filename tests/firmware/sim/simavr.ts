import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, readFile, rename } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runTool } from '@server/features/firmware/toolchain/run-tool';
import { DEFAULT_CACHE_ROOT } from '@server/features/firmware/toolchain/toolchain-paths';

const RUNNER_SOURCE = fileURLToPath(new URL('./runner.c', import.meta.url));

/** One thing the simulated world does at a chosen simulated cycle. */
export type SimEvent =
  | { kind: 'uart'; cycle: number; bytes: number[] }
  | { kind: 'pin'; port: string; bit: number; cycle: number; level: 0 | 1 }
  | { kind: 'dump'; cycle: number; tag: string };

/** A pin whose every level change is recorded. */
export interface WatchedPin {
  port: string;
  bit: number;
}

export interface SimScript {
  mcu: 'atmega328p' | 'atmega2560';
  limitCycles: number;
  /** Data-space addresses read at each dump. */
  registers?: number[];
  /** I/O data-space address whose writes are recorded (GPIOR0 = 0x3E); 0xFF written there stops the run. */
  markAddress?: number;
  watch?: WatchedPin[];
  events: SimEvent[];
}

export interface SimDump {
  tag: string;
  cycle: number;
  regs: Record<number, number>;
}

export interface SimResult {
  cycles: number;
  reason: 'limit' | 'marker' | 'done' | 'crashed';
  uart: Buffer;
  marks: [number, number][];
  /** Level changes of watched pins: cycle, pin (port letter code × 8 + bit), level. */
  edges: [number, number, number][];
  dumps: SimDump[];
}

/** The pin number in `edges` for a port letter and bit. */
export const edgePin = (port: string, bit: number) => port.charCodeAt(0) * 8 + bit;

export const F_CPU = 16_000_000;
export const cyclesPerMs = F_CPU / 1000;

let built: Promise<string> | undefined;

/** Builds the libsimavr runner once per source version into the git-ignored cache. */
export function buildRunner(): Promise<string> {
  built ??= (async () => {
    const source = await readFile(RUNNER_SOURCE);
    const key = createHash('sha256').update(source).digest('hex').slice(0, 12);
    const dir = join(DEFAULT_CACHE_ROOT, 'sim');
    const binary = join(dir, `runner-${key}`);
    if (existsSync(binary)) return binary;
    await mkdir(dir, { recursive: true });
    const temp = `${binary}.${process.pid}.tmp`;
    const result = await runTool('gcc', ['-O2', '-Wall', '-Wextra', '-Werror', '-o', temp, RUNNER_SOURCE, '-lsimavr'], {
      timeoutMs: 60_000,
    });
    if (result.code !== 0) throw new Error(`Building the simavr runner failed:\n${result.stderr}`);
    await rename(temp, binary);
    return binary;
  })();
  return built;
}

function scriptText(script: SimScript): string {
  const lines = [`limit ${Math.round(script.limitCycles)}`];
  if (script.registers?.length) lines.push(`regs ${script.registers.map((r) => r.toString(16)).join(' ')}`);
  if (script.markAddress !== undefined) lines.push(`mark ${script.markAddress.toString(16)}`);
  for (const pin of script.watch ?? []) lines.push(`watch ${pin.port} ${pin.bit}`);
  for (const event of script.events) {
    const cycle = Math.round(event.cycle);
    if (event.kind === 'uart') {
      for (let i = 0; i < event.bytes.length; i += 64) {
        lines.push(
          `uart ${cycle} ${event.bytes
            .slice(i, i + 64)
            .map((b) => b.toString(16))
            .join(' ')}`,
        );
      }
    } else if (event.kind === 'pin') {
      lines.push(`pin ${event.port} ${event.bit} ${cycle} ${event.level}`);
    } else {
      lines.push(`dump ${cycle} ${event.tag}`);
    }
  }
  return `${lines.join('\n')}\n`;
}

/** Runs a firmware ELF in simavr with the given script of events. */
export async function simulate(elfPath: string, script: SimScript): Promise<SimResult> {
  const runner = await buildRunner();
  const result = await runTool(runner, [script.mcu, String(F_CPU), elfPath], {
    input: scriptText(script),
    timeoutMs: 240_000,
  });
  if (result.code !== 0) throw new Error(`The simulator failed (${result.code}):\n${result.stderr}`);
  const parsed = JSON.parse(result.stdout) as Omit<SimResult, 'uart'> & { uart: string };
  return { ...parsed, uart: Buffer.from(parsed.uart, 'hex') };
}
