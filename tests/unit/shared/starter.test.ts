import { describe, expect, it } from 'vitest';
import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { DRIVER_KIND_IDS } from '@shared/schemas/ids';
import { RobotConfigSchema } from '@shared/schemas/robot-config';
import { buildStarterConfig, STARTER_CHANNELS } from '@shared/starter';
import { choiceName, everyStarterChoice } from '../../fixtures/starter-options';

describe('starter configurations', () => {
  it('builds a valid configuration for every layout, board, input and driver', () => {
    for (const choice of everyStarterChoice()) {
      expect(RobotConfigSchema.safeParse(buildStarterConfig(choice)).success, choiceName(choice)).toBe(true);
    }
  });

  it('uses the defaults uno, rc-pwm and dual-pwm', () => {
    const config = buildStarterConfig({ layout: 'trio-omni' });
    expect(config.wiring.board).toBe('uno');
    expect(config.controls.source).toBe('rc-pwm');
    expect(config.wiring.drivers.every((d) => d.kind === 'dual-pwm')).toBe(true);
    expect(config.name).toBe('Trio omni robot');
  });

  it("calibrates every channel with the input source's defaults", () => {
    const config = buildStarterConfig({ layout: 'quad-mecanum', input: 'sbus' });
    for (const channel of config.controls.channels)
      expect(channel).toMatchObject(INPUT_SOURCES.sbus.defaultCalibration);
  });

  it('maps strafe to channel 1, forward to 2, yaw to 4, the rate switch to 5 and arming to 6', () => {
    const { controls, safety } = buildStarterConfig({ layout: 'quad-mecanum' });
    expect(controls.axes.strafe.channel).toBe(STARTER_CHANNELS.strafe);
    expect([controls.axes.strafe.channel, controls.axes.forward.channel, controls.axes.yaw.channel]).toEqual([1, 2, 4]);
    expect(controls.rateSwitch.channel).toBe(5);
    expect(controls.armingSwitch.channel).toBe(6);
    expect(safety.armingRequired).toBe(true);
    expect(controls.channels.map((c) => c.number)).toEqual([1, 2, 4, 5, 6]);
  });

  it('leaves strafe unmapped on a layout that cannot strafe', () => {
    const { controls } = buildStarterConfig({ layout: 'differential' });
    expect(controls.axes.strafe.channel).toBeNull();
    expect(controls.channels.map((c) => c.number)).toEqual([2, 4, 5, 6]);
  });

  it("groups motors onto drivers by the driver kind's channel count", () => {
    for (const driver of DRIVER_KIND_IDS) {
      const { wiring, motors } = buildStarterConfig({ layout: 'quad-mecanum', driver });
      const perDriver = DRIVER_KINDS[driver].channels;
      expect(wiring.drivers).toHaveLength(Math.ceil(4 / perDriver));
      expect(wiring.drivers.flatMap((d) => d.motors)).toEqual(motors.map((m) => m.name));
    }
    const trio = buildStarterConfig({ layout: 'trio-omni', driver: 'pwm-dir' });
    expect(trio.wiring.drivers.map((d) => d.motors.length)).toEqual([2, 1]);
  });

  it('leaves every pin for the pin plan to choose', () => {
    const { wiring } = buildStarterConfig({ layout: 'h-drive', driver: 'pwm-in1-in2-stby', input: 'nrf24' });
    for (const driver of wiring.drivers) {
      expect(Object.keys(driver.pins)).toEqual(driverPinRoles(driver.kind, driver.motors.length).map((r) => r.id));
      expect(Object.values(driver.pins).every((p) => p.pin === null && !p.locked)).toBe(true);
    }
    expect(Object.keys(wiring.inputPins)).toEqual(['ce', 'csn']);
    expect(Object.values(wiring.inputPins).every((p) => p.pin === null)).toBe(true);
  });
});
