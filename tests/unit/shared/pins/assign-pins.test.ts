import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { getBoard } from '@shared/boards/boards';
import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import { assignPins } from '@shared/pins/assign-pins';
import { checkPinPlan } from '@shared/pins/check-pins';
import { collectDemands } from '@shared/pins/pin-demands';
import { BOARD_IDS, DRIVE_LAYOUT_IDS, DRIVER_KIND_IDS, INPUT_SOURCE_IDS } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';
import { buildConfig, withPins, type ConfigOptions } from '../../../fixtures/robot-config-factory';

const COMBOS: ConfigOptions[] = DRIVE_LAYOUT_IDS.flatMap((layout) =>
  INPUT_SOURCE_IDS.flatMap((source) =>
    BOARD_IDS.flatMap((board) => DRIVER_KIND_IDS.map((driver) => ({ layout, source, board, driver, switches: true }))),
  ),
);

/** The engine's starter configuration for a combination: the real presets, channels and drivers. */
const starter = (o: ConfigOptions) =>
  buildStarterConfig({ layout: o.layout!, board: o.board, input: o.source, driver: o.driver });

const pinsOf = (config: RobotConfig) => collectDemands(config).map((d) => [d.roleName, d.pin, d.locked]);
const isOneSentence = (text: string) => /^[A-Z“].*[.]$/.test(text) && !/[.] [A-Z]/.test(text);

/** PWM roles of a configuration, counted from the driver catalogue (independent of the pin plan). */
function pwmRoleCount(config: RobotConfig): number {
  return config.wiring.drivers.reduce(
    (sum, d) => sum + driverPinRoles(d.kind, d.motors.length).filter((r) => r.need === 'pwm' && !r.optional).length,
    0,
  );
}

describe('automatic assignment over every starter layout, input source, board and driver kind', () => {
  const results = COMBOS.map((options) => ({
    options,
    config: starter(options),
    result: assignPins(starter(options)),
  }));

  it('passes the pin check whenever it finds a plan, with every required role filled', () => {
    for (const { options, result } of results) {
      if (!result.ok) continue;
      const errors = checkPinPlan(result.config).filter((p) => p.severity === 'error');
      expect(errors, JSON.stringify(options)).toEqual([]);
      for (const d of collectDemands(result.config))
        if (d.required) expect(d.pin, `${JSON.stringify(options)} ${d.roleName}`).not.toBeNull();
    }
  });

  it('finds a plan for every combination on the Mega, the ESP32 and the Pico', () => {
    const failed = results.filter(
      ({ options, result }) => options.board !== 'uno' && options.board !== 'nano' && !result.ok,
    );
    expect(
      failed.map(({ options, result }) => `${JSON.stringify(options)}: ${result.ok ? '' : result.reason}`),
    ).toEqual([]);
  });

  it('gives one sentence naming the board whenever it finds none', () => {
    const failed = results.filter(({ result }) => !result.ok);
    expect(failed.length).toBeGreaterThan(0);
    for (const { options, result } of failed) {
      if (result.ok) continue;
      expect(isOneSentence(result.reason), result.reason).toBe(true);
      expect(result.reason).toContain(getBoard(options.board!).shortName);
    }
  });

  it('backs every PWM shortage it reports with the board’s and the layout’s own counts', () => {
    for (const { config, result } of results) {
      if (result.ok) continue;
      const match = /^The (Uno|Nano) has (\d+) PWM pins, (?:\d+ once .*; )?this layout needs (\d+)[.]$/.exec(
        result.reason,
      );
      if (!match) continue;
      const board = getBoard(config.wiring.board);
      expect(Number(match[2])).toBe(board.pins.filter((p) => p.pwm).length);
      expect(Number(match[3])).toBe(pwmRoleCount(config));
    }
  });

  it('fails on the Uno only for want of pins, never for a plan it missed', () => {
    // Where the Uno fails but the check on the empty configuration shows no shortage, the failure
    // must come from the search itself; the reason then names a role that found no pin.
    for (const { config, result } of results) {
      if (result.ok) continue;
      expect(result.reason).toMatch(/PWM pins|free pins?|usable pins|serial receive|no pin is left|No pin is left/);
      expect(config.wiring.drivers.length).toBeGreaterThan(0);
    }
  });

  it('is deterministic', () => {
    for (const { options, result } of results.slice(0, 60)) expect(assignPins(starter(options))).toEqual(result);
  });
});

describe('reasons for impossible plans', () => {
  it('says the Uno has too few PWM pins for four dual half-bridges', () => {
    expect(assignPins(buildConfig({ layout: 'quad-mecanum', driver: 'dual-pwm' }))).toEqual({
      ok: false,
      reason: 'The Uno has 6 PWM pins, this layout needs 8.',
    });
  });

  it('counts the PWM pins an ESC’s servo timer takes', () => {
    const config = buildConfig({ layout: 'quad-mecanum', driver: 'two-input', board: 'uno' });
    expect(assignPins(config)).toEqual({ ok: false, reason: 'The Uno has 6 PWM pins, this layout needs 8.' });
  });

  it('explains that the only serial port on the Uno is busy with diagnostics', () => {
    const result = assignPins(buildConfig({ source: 'sbus' }));
    expect(result).toEqual({
      ok: false,
      reason:
        'The Uno’s only serial receive pin, D0, carries the USB serial port that serial diagnostics use; turn diagnostics off to receive the serial receiver there.',
    });
  });

  it('uses D0 for the receiver once diagnostics are off, with a warning about uploads', () => {
    const result = assignPins(buildConfig({ source: 'sbus', serialDiagnostics: false }));
    expect(result.ok && result.config.wiring.inputPins.rx.pin).toBe('D0');
    expect(result.ok && checkPinPlan(result.config).map((p) => p.code)).toContain('pin-shares-usb-serial');
  });

  it('counts external-interrupt pins', () => {
    const config = withPins(buildConfig({ source: 'ppm' }), { 'Driver 1/a.dir': 'D2', 'Driver 1/b.dir': 'D3' }, true);
    expect(assignPins(config)).toEqual({
      ok: false,
      reason: 'The Uno has 0 free pins with an external interrupt, this layout needs 1.',
    });
  });

  it('names a locked pin that cannot do its role', () => {
    const config = withPins(buildConfig({}), { 'Driver 1/a.pwm': 'D4' }, true);
    const result = assignPins(config);
    expect(result).toEqual({
      ok: false,
      reason: 'D4 has no PWM, but Driver 1 A PWM needs PWM; unlock or move that pin.',
    });
  });

  it('refuses to plan pins while a motor has no driver channel', () => {
    const config = buildConfig({});
    config.wiring.drivers[0].motors = ['Left'];
    expect(assignPins(config)).toEqual({
      ok: false,
      reason: 'Motor “Right” is not on any driver channel; fix that before pins can be assigned.',
    });
  });
});

describe('choices the assignment makes', () => {
  it('keeps locked pins where they are', () => {
    const config = withPins(
      buildConfig({ layout: 'quad-mecanum', board: 'mega2560', driver: 'dual-pwm', source: 'nrf24' }),
      { 'Driver 3/a.fwd': 'D46', 'input/ce': 'D30' },
      true,
    );
    const result = assignPins(config);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.config.wiring.drivers[2].pins['a.fwd']).toEqual({ pin: 'D46', locked: true });
    expect(result.config.wiring.inputPins.ce).toEqual({ pin: 'D30', locked: true });
  });

  it('leaves external interrupts, serial ports and the unused SPI bus free on the Mega', () => {
    const result = assignPins(
      buildConfig({ layout: 'quad-mecanum', board: 'mega2560', driver: 'dual-pwm', source: 'rc-pwm', switches: true }),
    );
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const driverPins = result.config.wiring.drivers.flatMap((d) => Object.values(d.pins).map((a) => a.pin));
    for (const precious of [
      'D2',
      'D3',
      'D18',
      'D19',
      'D20',
      'D21',
      'D14',
      'D15',
      'D16',
      'D17',
      'D50',
      'D51',
      'D52',
      'D53',
      'D0',
      'D1',
    ])
      expect(driverPins).not.toContain(precious);
  });

  it('drops unlocked pins of roles that no longer exist, and keeps locked ones', () => {
    const config = withPins(
      withPins(buildConfig({ source: 'ppm' }), { 'input/rx': 'D4', 'Driver 1/c.pwm': 'D5' }),
      { 'input/ch9': 'A5' },
      true,
    );
    const result = assignPins(config);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.config.wiring.inputPins.rx).toBeUndefined();
    expect(result.config.wiring.drivers[0].pins['c.pwm']).toBeUndefined();
    expect(result.config.wiring.inputPins.ch9).toEqual({ pin: 'A5', locked: true });
  });

  it('puts the status LED on the board’s LED when the SPI bus leaves it free', () => {
    const result = assignPins(buildConfig({ source: 'ppm' }));
    expect(result.ok && result.config.wiring.statusLed.pin).toBe('D13');
  });

  it('puts the transceiver CSN on the AVR SS pin', () => {
    const result = assignPins(buildConfig({ source: 'nrf24', board: 'mega2560' }));
    expect(result.ok && result.config.wiring.inputPins.csn.pin).toBe('D53');
  });

  it('never places PWM on the Uno timer-1 pins while ESCs need servo pulses', () => {
    const config = buildConfig({ layout: 'differential', driver: 'servo-esc', source: 'ppm' });
    config.wiring.drivers[1] = { ...config.wiring.drivers[1], kind: 'pwm-dir' };
    const result = assignPins(config);
    expect(result.ok).toBe(true);
    if (result.ok) expect(['D9', 'D10']).not.toContain(result.config.wiring.drivers[1].pins['a.pwm'].pin);
  });

  it('runs a 20 kHz layout on 16-bit timers on the Mega', () => {
    const result = assignPins(
      buildConfig({
        layout: 'quad-mecanum',
        board: 'mega2560',
        driver: 'dual-pwm',
        source: 'nrf24',
        pwmFrequencyHz: 20000,
      }),
    );
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const board = getBoard('mega2560');
    const timers = result.config.wiring.drivers
      .flatMap((d) => [d.pins['a.fwd'].pin, d.pins['a.rev'].pin])
      .map((id) => board.timers.find((t) => t.pins.includes(id!))!);
    for (const t of timers) expect(t.bits).toBe(16);
    expect(checkPinPlan(result.config)).toEqual([]);
  });

  it('keeps the two PWM inputs of an RP2040 driver on separate slice channels at one frequency', () => {
    const result = assignPins(
      buildConfig({
        layout: 'quad-omni-x',
        board: 'rp2040-pico',
        driver: 'two-input',
        source: 'nrf24',
        pwmFrequencyHz: 20000,
      }),
    );
    expect(result.ok && checkPinPlan(result.config).filter((p) => p.severity === 'error')).toEqual([]);
  });
});

describe('assignment around locked pins', () => {
  const feasible = COMBOS.filter(
    (o) => o.board === 'nano' || o.board === 'esp32-devkitc' || o.board === 'rp2040-pico',
  ).flatMap((options) => {
    const result = assignPins(buildConfig(options));
    return result.ok ? [{ options, config: result.config }] : [];
  });

  it('still finds a plan when any part of a known plan is locked', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: feasible.length - 1 }), fc.infiniteStream(fc.boolean()), (index, coin) => {
        const plan = feasible[index].config;
        const locked = Object.fromEntries(
          collectDemands(plan)
            .filter((d) => d.pin !== null && coin.next().value)
            .map((d) => [d.roleName, d.pin]),
        );
        const result = assignPins(withPins(buildConfig(feasible[index].options), locked, true));
        expect(result.ok, result.ok ? '' : result.reason).toBe(true);
        if (!result.ok) return;
        const after = new Map(collectDemands(result.config).map((d) => [d.roleName, d.pin]));
        for (const [role, pin] of Object.entries(locked)) expect(after.get(role)).toBe(pin);
        expect(checkPinPlan(result.config).filter((p) => p.severity === 'error')).toEqual([]);
      }),
      { numRuns: 150, seed: 4242 },
    );
  });

  it('gives the same plan for the same input', () => {
    const options = feasible[0].options;
    expect(pinsOf(assignPins(buildConfig(options)).ok ? feasible[0].config : buildConfig(options))).toEqual(
      pinsOf(feasible[0].config),
    );
  });
});

it('knows every driver kind it is asked about', () => {
  for (const id of DRIVER_KIND_IDS) expect(DRIVER_KINDS[id].id).toBe(id);
});
