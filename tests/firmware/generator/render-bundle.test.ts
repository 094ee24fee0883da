import { createHash } from 'node:crypto';
import JSZip from 'jszip';
import { describe, expect, it } from 'vitest';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { FIRMWARE_GENERATOR_VERSION } from '@server/features/firmware/generator-version';
import { FirmwareConfigError } from '@server/features/firmware/model/firmware-config-error';
import { configHash } from '@server/features/firmware/model/config-hash';
import { renderBundle, type BundleFile } from '@server/features/firmware/render-bundle';
import { zipBundle } from '@server/features/firmware/zip-bundle';
import { getBoard } from '@shared/boards/boards';
import { assignPins } from '@shared/pins/assign-pins';
import { INPUT_SOURCE_IDS } from '@shared/schemas/ids';
import { buildStarterConfig } from '@shared/starter';
import { sampleConfig } from '../../factories/robot-config';

const file = (files: BundleFile[], path: string) => {
  const found = files.find((f) => f.path === path);
  if (!found) throw new Error(`No ${path} in the bundle`);
  return found.content;
};

function issuesOf(run: () => unknown) {
  try {
    run();
  } catch (error) {
    if (error instanceof FirmwareConfigError) return error.issues;
    throw error;
  }
  throw new Error('Expected a FirmwareConfigError');
}

describe('the firmware bundle', () => {
  const config = sampleConfig();
  const files = renderBundle(config, { revision: 3 });

  it('holds a sketch folder named by the Arduino rules with the sketch, its headers and the documents', () => {
    expect(files.map((f) => f.path)).toEqual([
      'garden_hauler/garden_hauler.ino',
      'garden_hauler/mw_platform.h',
      'garden_hauler/mw_config.h',
      'garden_hauler/mw_frame.h',
      'garden_hauler/mw_mixer.h',
      'garden_hauler/mw_safety.h',
      'garden_hauler/mw_input.h',
      'garden_hauler/mw_outputs.h',
      'garden_hauler/mw_console.h',
      'garden_hauler/mw_status.h',
      'garden_hauler/mw_ibus.h',
      'garden_hauler/mw_driver_pwm_in1_in2_stby.h',
      'README.md',
      'config.json',
      'manifest.json',
    ]);
  });

  it('includes only the decoder of the chosen input and the headers of the chosen driver kinds', () => {
    const sbus = renderBundle(sampleConfig({ controls: { ...sampleConfig().controls, source: 'sbus' } }), {
      revision: 1,
    });
    const paths = sbus.map((f) => f.path);
    expect(paths).toContain('garden_hauler/mw_sbus.h');
    expect(paths.filter((p) => /mw_(ibus|ppm|rc_pulse|nrf24)\.h$/.test(p))).toEqual([]);
    expect(paths.filter((p) => p.includes('mw_driver_'))).toEqual(['garden_hauler/mw_driver_pwm_in1_in2_stby.h']);
  });

  it('writes the robot name, revision, hash and generator version into the configuration header', () => {
    const header = file(files, 'garden_hauler/mw_config.h');
    expect(header).toContain('#define MW_ROBOT_NAME "Garden Hauler"');
    expect(header).toContain('#define MW_REVISION 3UL');
    expect(header).toContain(`#define MW_CONFIG_HASH "${configHash(config)}"`);
    expect(header).toContain(`#define MW_GENERATOR_VERSION "${FIRMWARE_GENERATOR_VERSION}"`);
  });

  it('defines every assigned pin with the code the core uses', () => {
    const header = file(files, 'garden_hauler/mw_config.h');
    for (const line of [
      'MW_PIN_M0_LEFT_PWM 9',
      'MW_PIN_M0_LEFT_IN1 7',
      'MW_PIN_M1_RIGHT_IN2 4',
      'MW_PIN_DRV0_MAIN_DRIVER_STBY 6',
      'MW_PIN_STATUS_LED 13',
    ]) {
      expect(header).toContain(`#define ${line}`);
    }
  });

  it('holds the differential mixing rows in Q15: forward and yaw with opposite yaw signs', () => {
    const header = file(files, 'garden_hauler/mw_config.h');
    expect(header).toMatch(/\{ 32767, 0, 32767 \},\s+\/\/ motor 0/);
    expect(header).toMatch(/\{ 32767, 0, -32767 \},\s+\/\/ motor 1/);
  });

  it('carries the exact configuration as config.json, which imports back unchanged', () => {
    expect(RobotConfigSchema.parse(JSON.parse(file(files, 'config.json')))).toEqual(config);
  });

  it('lists every other file in manifest.json with its SHA-256, the revision and the generator version', () => {
    const manifest = JSON.parse(file(files, 'manifest.json'));
    expect(manifest).toMatchObject({
      revision: 3,
      generatorVersion: FIRMWARE_GENERATOR_VERSION,
      configHash: configHash(config),
    });
    const others = files.filter((f) => f.path !== 'manifest.json');
    expect(manifest.files.map((f: { path: string }) => f.path)).toEqual(others.map((f) => f.path));
    for (const entry of manifest.files) {
      expect(entry.sha256).toBe(createHash('sha256').update(file(files, entry.path)).digest('hex'));
    }
  });

  it('puts the safety cautions into the README', () => {
    const readme = file(files, 'README.md');
    expect(readme).toContain('Test with the wheels off the ground first.');
    expect(readme).toContain('verify it by switching the remote off');
    expect(readme).toContain('fuse on the battery line');
    expect(readme).toContain('Charge lithium packs supervised');
  });

  it('keeps where a figure comes from out of the README, for every input source', () => {
    for (const input of INPUT_SOURCE_IDS) {
      const assigned = assignPins(
        buildStarterConfig({ layout: 'quad-mecanum', board: 'mega2560', input, driver: 'pwm-in1-in2-stby' }),
      );
      if (!assigned.ok) throw new Error(`No pins for ${input}: ${assigned.reason}`);
      const readme = file(renderBundle(assigned.config, { revision: 1 }), 'README.md');
      expect(readme, input).not.toMatch(/from memory|common practice/i);
    }
  });

  it('renders the same bytes for the same configuration and revision', () => {
    expect(renderBundle(config, { revision: 3 })).toEqual(files);
  });

  it('zips to the same bytes every time, with the files inside unchanged', async () => {
    const [a, b] = await Promise.all([zipBundle(files), zipBundle(files)]);
    expect(a.equals(b)).toBe(true);
    const zip = await JSZip.loadAsync(a);
    expect(await zip.file('garden_hauler/mw_config.h')!.async('string')).toBe(file(files, 'garden_hauler/mw_config.h'));
  });
});

describe('a configuration that cannot become firmware', () => {
  it('names the driver pin that is not chosen', () => {
    const config = sampleConfig();
    config.wiring.drivers[0].pins['a.in1'] = { pin: null, locked: false };
    expect(issuesOf(() => renderBundle(config, { revision: 1 }))).toContainEqual({
      path: ['wiring', 'drivers', 0, 'pins', 'a.in1', 'pin'],
      message: expect.stringContaining('has no pin'),
    });
  });

  it('names a pin that the board does not have', () => {
    const config = sampleConfig();
    config.wiring.drivers[0].pins['b.pwm'] = { pin: 'D99', locked: false };
    expect(issuesOf(() => renderBundle(config, { revision: 1 }))).toContainEqual({
      path: ['wiring', 'drivers', 0, 'pins', 'b.pwm', 'pin'],
      message: expect.stringContaining(`D99 (for Main driver B PWM) is not a pin of the ${getBoard('uno').shortName}`),
    });
  });

  it('names a serial receiver wired to a pin that cannot receive', () => {
    const config = sampleConfig();
    config.wiring.inputPins.rx = { pin: 'D5', locked: false };
    expect(issuesOf(() => renderBundle(config, { revision: 1 }))[0]).toMatchObject({
      path: ['wiring', 'inputPins', 'rx', 'pin'],
      message: expect.stringContaining('not a serial receive pin'),
    });
  });

  it('asks for an arming channel when arming is required', () => {
    const config = sampleConfig();
    config.safety.armingRequired = true;
    expect(issuesOf(() => renderBundle(config, { revision: 1 }))).toContainEqual({
      path: ['controls', 'armingSwitch', 'channel'],
      message: expect.stringContaining('arming switch'),
    });
  });

  it('refuses a channel the input source does not carry', () => {
    const config = sampleConfig();
    config.controls.channels[2].number = 15;
    config.controls.rateSwitch.channel = 15;
    expect(issuesOf(() => renderBundle(config, { revision: 1 }))).toContainEqual({
      path: ['controls', 'channels', 2, 'number'],
      message: 'iBUS serial receiver carries channels 1 to 14, not 15',
    });
  });

  it('refuses a motor that is on no driver', () => {
    const config = sampleConfig();
    config.wiring.drivers[0].motors = ['Left'];
    expect(issuesOf(() => renderBundle(config, { revision: 1 })).map((i) => i.message)).toContain(
      'Motor "Right" is not connected to any driver',
    );
  });
});
