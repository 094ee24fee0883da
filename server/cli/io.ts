import { readFile } from 'node:fs/promises';
import { z } from 'zod';
import { AnyVersionConfigSchema } from '@shared/schemas/migrate-config';
import type { RobotConfig } from '@shared/schemas/robot-config';

/** A failure the command line reports as a message and a non-zero exit code. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode = 1,
  ) {
    super(message);
  }
}

/** Reads and validates a configuration file; the error names the field path. */
export async function readConfigFile(path: string | undefined): Promise<RobotConfig> {
  if (!path) throw new CliError('Missing argument: the path of a configuration file (config.json)', 2);
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch {
    throw new CliError(`Cannot read ${path}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new CliError(`${path} is not valid JSON: ${(error as Error).message}`);
  }
  return parseConfig(json, path);
}

/** Validates a configuration of any schema version this app reads, older ones migrated forward. */
export function parseConfig(json: unknown, source = 'configuration'): RobotConfig {
  const result = AnyVersionConfigSchema.safeParse(json);
  if (!result.success) throw new CliError(`${source} is not a valid configuration:\n${formatIssues(result.error)}`);
  return result.data;
}

export function formatIssues(error: z.ZodError): string {
  return error.issues
    .map((issue) => `  ${issue.path.length ? issue.path.join('.') : '(root)'}: ${issue.message}`)
    .join('\n');
}

export function printJson(value: unknown): void {
  process.stdout.write(`${JSON.stringify(value, null, 2)}\n`);
}

/** Reads a numeric option such as `--forward 0.5`, naming the option when it is not a number. */
export function numberOption(values: Record<string, unknown>, name: string, fallback?: number): number {
  const raw = values[name];
  if (raw === undefined) {
    if (fallback !== undefined) return fallback;
    throw new CliError(`Missing option --${name}`, 2);
  }
  const value = Number(raw);
  if (typeof raw !== 'string' || raw.trim() === '' || !Number.isFinite(value)) {
    throw new CliError(`--${name} must be a number, got "${String(raw)}"`, 2);
  }
  return value;
}
