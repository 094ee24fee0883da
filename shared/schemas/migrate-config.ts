import { z } from 'zod';
import { CURRENT_SCHEMA_VERSION, RobotConfigSchema, type RobotConfig } from './robot-config';

/**
 * Older configuration files brought forward, one schema version at a time, by code. Every
 * place that reads a configuration it did not just validate itself — imports, stored
 * revisions, the command line — goes through `migrateConfig` before `RobotConfigSchema`.
 *
 * Version history:
 * - 1 → 2: `controls.rateSwitch.positions` is gone; the number of rates is the number of
 *   positions. Version 1 stored both, so a file could say three positions with two rates and
 *   be refused.
 */

/** A file that cannot be brought forward: no version, or a version newer than this app reads. */
export class ConfigVersionError extends Error {
  readonly path = ['schemaVersion'];
  constructor(message: string) {
    super(message);
    this.name = 'ConfigVersionError';
  }
}

type Json = Record<string, unknown>;

interface StepResult {
  json: Json;
  notes: string[];
}

const isObject = (value: unknown): value is Json =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** Version 1's defaults for the rate switch, needed to read what a version 1 file meant. */
const V1_DEFAULT_POSITIONS = 2;
const V1_DEFAULT_RATES = [0.5, 1];

/** Rates fitted to `count` positions: extra rates dropped, missing ones copy the last rate. */
function fitRates(rates: unknown[], count: number): unknown[] {
  if (rates.length >= count) return rates.slice(0, count);
  const last = rates.length > 0 ? rates[rates.length - 1] : 1;
  return [...rates, ...Array.from({ length: count - rates.length }, () => last)];
}

function percent(value: unknown): string {
  return typeof value === 'number' ? `${Math.round(value * 100)} %` : String(value);
}

function rateSwitchV1ToV2(rateSwitch: Json): { rateSwitch: Json; notes: string[] } {
  const { positions: rawPositions, ...rest } = rateSwitch;
  const positions = rawPositions === undefined ? V1_DEFAULT_POSITIONS : rawPositions;
  if (positions !== 2 && positions !== 3) {
    // Version 1 refused this file too; the rates alone now decide, and the schema judges them.
    return {
      rateSwitch: rest,
      notes: [`Rate switch: "positions" was ${JSON.stringify(positions)}, not 2 or 3; the rates now set the positions`],
    };
  }
  const given = Array.isArray(rest.rates) ? rest.rates : V1_DEFAULT_RATES;
  const rates = fitRates(given, positions);
  const notes: string[] = [];
  if (given.length > positions) {
    notes.push(`Rate switch: ${positions} positions but ${given.length} rates; kept the first ${positions}`);
  } else if (given.length < positions) {
    const what = Array.isArray(rest.rates) ? `${given.length} rates` : 'no rates (so the default two)';
    notes.push(
      `Rate switch: ${positions} positions but ${what}; position ${positions} uses the last rate (${percent(rates[positions - 1])})`,
    );
  }
  return { rateSwitch: { ...rest, rates }, notes };
}

function v1ToV2(json: Json): StepResult {
  const controls = json.controls;
  if (!isObject(controls) || !isObject(controls.rateSwitch)) return { json: { ...json, schemaVersion: 2 }, notes: [] };
  const { rateSwitch, notes } = rateSwitchV1ToV2(controls.rateSwitch);
  return { json: { ...json, schemaVersion: 2, controls: { ...controls, rateSwitch } }, notes };
}

/** Step from version N (the key) to N + 1. */
const STEPS: Record<number, (json: Json) => StepResult> = { 1: v1ToV2 };

export interface MigratedConfig {
  /** The configuration in the current schema version, not yet validated. */
  json: unknown;
  fromVersion: number;
  /** One sentence per change that was not a pure renaming, for the person importing the file. */
  notes: string[];
}

function versionOf(json: unknown): number {
  if (!isObject(json)) throw new ConfigVersionError('A configuration must be a JSON object');
  const version = json.schemaVersion;
  if (version === undefined)
    throw new ConfigVersionError('The file has no schemaVersion; it is not a Mixwright configuration');
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    throw new ConfigVersionError(`schemaVersion must be a whole number from 1, got ${JSON.stringify(version)}`);
  }
  if (version > CURRENT_SCHEMA_VERSION) {
    throw new ConfigVersionError(
      `The file has schemaVersion ${version}, made by a newer Mixwright; this one reads up to version ${CURRENT_SCHEMA_VERSION}`,
    );
  }
  return version;
}

/** Brings a configuration of any earlier schema version to the current one, with notes. */
export function migrateConfigWithNotes(input: unknown): MigratedConfig {
  const fromVersion = versionOf(input);
  let json = input as Json;
  const notes: string[] = [];
  for (let version = fromVersion; version < CURRENT_SCHEMA_VERSION; version += 1) {
    const step = STEPS[version](json);
    json = step.json;
    notes.push(...step.notes);
  }
  return { json, fromVersion, notes };
}

/** Brings a configuration of any earlier schema version to the current one (not yet validated). */
export function migrateConfig(input: unknown): unknown {
  return migrateConfigWithNotes(input).json;
}

/**
 * The configuration schema for files of any version this app reads: migration first, then
 * RobotConfigSchema. A version problem is reported at `schemaVersion`.
 */
export const AnyVersionConfigSchema = z.preprocess((value, ctx) => {
  try {
    return migrateConfig(value);
  } catch (error) {
    if (!(error instanceof ConfigVersionError)) throw error;
    ctx.addIssue({ code: 'custom', path: ['schemaVersion'], message: error.message, input: value });
    return z.NEVER;
  }
}, RobotConfigSchema);

/** A stored or imported configuration in the current version, defaults filled; throws a ZodError. */
export function parseAnyVersion(json: unknown): RobotConfig {
  return AnyVersionConfigSchema.parse(json);
}
