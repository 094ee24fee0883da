import { describe, expect, it } from 'vitest';
import { checkPinPlan } from '@shared/pins/check-pins';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';
import { withPins } from '../fixtures/robot-config-factory';
import { cli, useScratchDir } from './support/run-cli';

const { file } = useScratchDir('mixwright-pins-cli-');

/** A starter: its motors and battery suit its driver kind, so it raises no power warning. */
const starter = buildStarterConfig;

describe('the pin commands', { timeout: 60_000 }, () => {
  it('check lists the problems of a starter with no pins and exits 1', async () => {
    const out = await cli(
      'check',
      await file('empty.json', starter({ layout: 'differential', input: 'ppm', driver: 'pwm-dir' })),
    );
    expect(out.code).toBe(1);
    const { problems } = JSON.parse(out.stdout);
    expect(problems[0]).toEqual({
      severity: 'error',
      code: 'pin-missing',
      pins: [],
      message: 'Driver 1 A PWM has no pin.',
      hint: 'Pins that can: D9, D5, D6, D10, D11, D3.',
    });
    for (const p of problems) expect(Object.keys(p)).toEqual(['severity', 'code', 'pins', 'message', 'hint']);
  });

  it('assign fills every pin, and check then exits 0', async () => {
    const out = await cli(
      'assign',
      await file(
        'to-assign.json',
        starter({ layout: 'quad-mecanum', board: 'mega2560', input: 'nrf24', driver: 'dual-pwm' }),
      ),
    );
    expect(out.code).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(result.ok).toBe(true);
    const config = RobotConfigSchema.parse(result.config);
    expect(checkPinPlan(config).filter((p) => p.severity === 'error')).toEqual([]);
    const checked = await cli('check', await file('assigned.json', config));
    expect(checked.code).toBe(0);
    expect(JSON.parse(checked.stdout).problems.filter((p: { severity: string }) => p.severity === 'error')).toEqual([]);
  });

  it('check exits 0 when only warnings remain', async () => {
    const config = withPins(starter({ layout: 'differential', input: 'ppm', driver: 'pwm-dir' }), {
      'Driver 1/a.pwm': 'D9',
      'Driver 1/a.dir': 'D8',
      'Driver 1/b.pwm': 'D10',
      'Driver 1/b.dir': 'D7',
      'input/ppm': 'D2',
      'status-led': null,
    });
    const out = await cli('check', await file('warnings.json', config));
    expect(out.code).toBe(0);
    expect(JSON.parse(out.stdout).problems.map((p: { code: string }) => p.code)).toEqual(['status-led-missing']);
  });

  it('assign explains an impossible layout and exits 1', async () => {
    const out = await cli(
      'assign',
      await file('impossible.json', starter({ layout: 'quad-mecanum', input: 'ppm', driver: 'dual-pwm' })),
    );
    expect(out.code).toBe(1);
    expect(JSON.parse(out.stdout)).toEqual({ ok: false, reason: 'The Uno has 6 PWM pins, this layout needs 8.' });
  });

  it('check includes the drive engine’s problems', async () => {
    const config = starter({ layout: 'differential', input: 'ppm', driver: 'pwm-dir' });
    config.controls.axes.forward.channel = null;
    const out = await cli('check', await file('engine.json', config));
    const codes = JSON.parse(out.stdout).problems.map((p: { code: string }) => p.code);
    expect(codes).toContain('axis-without-channel');
  });

  it('refuses a file that is not a configuration, naming the field', async () => {
    const out = await cli('assign', await file('bad.json', { schemaVersion: 1, name: 'x' }));
    expect(out.code).not.toBe(0);
    expect(out.stdout).toBe('');
    expect(out.stderr).toMatch(/chassis/);
  });
});
