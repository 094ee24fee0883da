import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { CURRENT_SCHEMA_VERSION, RobotConfigSchema } from '@shared/schemas/robot-config';
import {
  ConfigVersionError,
  migrateConfig,
  migrateConfigWithNotes,
  parseAnyVersion,
} from '@shared/schemas/migrate-config';
import { robotConfig } from '../../../factories/robot-config';

// Files written by Mixwright while the schema was at version 1 (the demo robots as that
// version exported them), plus one hand-written file that version 1 refused.
const v1File = (name: string): Record<string, any> =>
  JSON.parse(readFileSync(join(__dirname, '../../../fixtures/configs/v1', name), 'utf8'));

describe('migrating version 1 files', () => {
  it('is at version 2 now', () => {
    expect(CURRENT_SCHEMA_VERSION).toBe(2);
  });

  it('drops the rate switch positions and keeps a two-position switch as two rates', () => {
    const v1 = v1File('greenhouse-cart.json');
    expect(v1.controls.rateSwitch).toEqual({ channel: 6, positions: 2, rates: [0.5, 1] });
    const config = parseAnyVersion(v1);
    expect(config.schemaVersion).toBe(2);
    expect(config.controls.rateSwitch).toEqual({ channel: 6, rates: [0.5, 1] });
  });

  it('keeps a three-position switch as three rates', () => {
    const config = parseAnyVersion(v1File('aisle-scout.json'));
    expect(config.controls.rateSwitch).toEqual({ channel: 6, rates: [0.35, 0.65, 1] });
  });

  it('changes nothing but the version and the rate switch', () => {
    const v1 = v1File('aisle-scout.json');
    const migrated = migrateConfig(v1) as Record<string, any>;
    const { rateSwitch: _old, ...controlsBefore } = v1.controls;
    const { rateSwitch: _new, ...controlsAfter } = migrated.controls;
    expect(controlsAfter).toEqual(controlsBefore);
    expect({ ...migrated, controls: null, schemaVersion: null }).toEqual({
      ...v1,
      controls: null,
      schemaVersion: null,
    });
  });

  it('gives a three-position file without rates a third rate copied from the last default', () => {
    const v1 = v1File('three-positions-no-rates.json');
    expect(v1.controls.rateSwitch).toEqual({ channel: 6, positions: 3 });
    const { json, notes } = migrateConfigWithNotes(v1);
    expect(RobotConfigSchema.parse(json).controls.rateSwitch.rates).toEqual([0.5, 1, 1]);
    expect(notes).toEqual([
      'Rate switch: 3 positions but no rates (so the default two); position 3 uses the last rate (100 %)',
    ]);
  });

  it('truncates extra rates to the old number of positions', () => {
    const v1 = v1File('greenhouse-cart.json');
    v1.controls.rateSwitch = { channel: 6, positions: 2, rates: [0.3, 0.6, 1] };
    const { json, notes } = migrateConfigWithNotes(v1);
    expect(RobotConfigSchema.parse(json).controls.rateSwitch.rates).toEqual([0.3, 0.6]);
    expect(notes[0]).toMatch(/2 positions but 3 rates; kept the first 2/);
  });

  it('reads a missing positions field as version 1 did, as two positions', () => {
    const v1 = v1File('greenhouse-cart.json');
    v1.controls.rateSwitch = { channel: 6, rates: [0.4, 0.7, 1] };
    expect(parseAnyVersion(v1).controls.rateSwitch.rates).toEqual([0.4, 0.7]);
  });

  it('leaves a file without a rate switch to the defaults', () => {
    const v1 = v1File('greenhouse-cart.json');
    delete v1.controls.rateSwitch;
    expect(parseAnyVersion(v1).controls.rateSwitch).toEqual({ channel: null, rates: [0.5, 1] });
  });

  it('does not change the object it was given', () => {
    const v1 = v1File('aisle-scout.json');
    const copy = structuredClone(v1);
    migrateConfig(v1);
    expect(v1).toEqual(copy);
  });
});

describe('files of the current version', () => {
  it('pass through unchanged', () => {
    const config = robotConfig();
    expect(migrateConfigWithNotes(config)).toEqual({ json: config, fromVersion: 2, notes: [] });
  });

  it('refuse a rate switch with one rate, naming the field', () => {
    const result = RobotConfigSchema.safeParse({
      ...robotConfig(),
      controls: { ...robotConfig().controls, rateSwitch: { channel: null, rates: [1] } },
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({
      path: ['controls', 'rateSwitch', 'rates'],
      message: 'A rate switch has 2 or 3 positions: give 2 or 3 rates',
    });
  });
});

describe('files that cannot be migrated', () => {
  it('refuses a file from a newer version, saying so', () => {
    expect(() => migrateConfig({ ...robotConfig(), schemaVersion: 7 })).toThrow(
      new ConfigVersionError('The file has schemaVersion 7, made by a newer Mixwright; this one reads up to version 2'),
    );
  });

  it('refuses a file without a version', () => {
    const { schemaVersion: _v, ...rest } = robotConfig();
    expect(() => migrateConfig(rest)).toThrow(/has no schemaVersion/);
  });

  it('refuses something that is not an object', () => {
    expect(() => migrateConfig([1, 2])).toThrow(/must be a JSON object/);
  });

  it('reports a version problem at schemaVersion when parsing', () => {
    try {
      parseAnyVersion({ ...robotConfig(), schemaVersion: 'one' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ZodError);
      expect((error as ZodError).issues[0]).toMatchObject({
        path: ['schemaVersion'],
        message: 'schemaVersion must be a whole number from 1, got "one"',
      });
    }
  });
});
