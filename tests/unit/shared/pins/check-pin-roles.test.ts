import { describe, expect, it } from 'vitest';
import { checkPinPlan } from '@shared/pins/check-pins';
import { PIN_PROBLEM_CODES } from '@shared/pins/problem-codes';
import { buildConfig, withPins } from '../../../fixtures/robot-config-factory';
import { assignedPlan, codes, esp32Plan, problemsWith, unoPlan } from '../../../fixtures/pin-plans';

describe('the pin check on complete plans', () => {
  it('finds nothing wrong with a sound Uno plan', () => {
    expect(checkPinPlan(unoPlan())).toEqual([]);
  });

  it('finds nothing wrong with a sound ESP32 plan', () => {
    expect(checkPinPlan(esp32Plan())).toEqual([]);
  });

  it('uses only codes from the published list, with their severity', () => {
    const problems = checkPinPlan(
      unoPlan(
        { source: 'nrf24', pwmFrequencyHz: 20000 },
        { 'Driver 1/a.pwm': 'D5', 'Driver 1/b.dir': 'D11', 'status-led': null },
      ),
    );
    expect(problems.length).toBeGreaterThan(3);
    for (const p of problems) expect(PIN_PROBLEM_CODES[p.code as keyof typeof PIN_PROBLEM_CODES]).toBe(p.severity);
  });

  it('lists errors before warnings', () => {
    const severities = checkPinPlan(unoPlan({}, { 'Driver 1/a.pwm': null, 'status-led': null })).map((p) => p.severity);
    expect(severities).toEqual([...severities].sort());
  });
});

describe('pin-missing', () => {
  it('reports a required role without a pin, pointing at its field', () => {
    const [problem] = problemsWith(unoPlan({}, { 'Driver 1/a.pwm': null }), 'pin-missing');
    expect(problem).toMatchObject({
      severity: 'error',
      roles: ['Driver 1/a.pwm'],
      path: ['wiring', 'drivers', 0, 'pins', 'a.pwm', 'pin'],
    });
    expect(problem.hint).toBe('Pins that can: D9, D5, D6, D11, D3.');
  });

  it('does not report an optional role without a pin', () => {
    const plan = assignedPlan({ driver: 'dual-pwm', source: 'ppm' });
    const withoutEnable = withPins(plan, { 'Driver 1/a.en': null });
    expect(codes(withoutEnable)).not.toContain('pin-missing');
  });
});

describe('status-led-missing', () => {
  it('warns when the status LED has no pin', () => {
    expect(problemsWith(unoPlan({}, { 'status-led': null }), 'status-led-missing')[0].severity).toBe('warning');
  });

  it('is quiet when the status LED has a pin', () => {
    expect(codes(unoPlan())).not.toContain('status-led-missing');
  });
});

describe('pin-unknown', () => {
  it('reports a pin the board does not have', () => {
    const [problem] = problemsWith(unoPlan({}, { 'Driver 1/a.pwm': 'D99' }), 'pin-unknown');
    expect(problem.message).toBe('D99 (for Driver 1 A PWM) is not a pin of the Uno.');
  });

  it('accepts an A6 on the Nano that the Uno lacks', () => {
    const nano = unoPlan(
      { board: 'nano', source: 'nrf24', channels: 1 },
      {
        'input/ppm': null,
        'input/ce': 'D4',
        'input/csn': 'D5',
        'remote/ce': 'D9',
        'remote/csn': 'D10',
        'remote/ch1': 'A6',
      },
    );
    expect(codes(nano)).not.toContain('pin-unknown');
    const uno = withPins(nano, {});
    uno.controls.link.remoteBoard = 'uno';
    expect(problemsWith(uno, 'pin-unknown')[0].message).toBe(
      'A6 (for remote channel 1 stick (Ch 1)) is not a pin of the remote’s Uno.',
    );
  });
});

describe('pin-cannot-do-role', () => {
  it('reports a PWM role on a pin without PWM', () => {
    expect(problemsWith(unoPlan({}, { 'Driver 1/a.pwm': 'D4' }), 'pin-cannot-do-role')[0].message).toBe(
      'D4 has no PWM, but Driver 1 A PWM needs PWM.',
    );
  });

  it('accepts a PWM role on a PWM pin', () => {
    expect(codes(unoPlan({}, { 'Driver 1/a.pwm': 'D3' }))).not.toContain('pin-cannot-do-role');
  });

  it('reports a PPM signal on a pin without an external interrupt', () => {
    expect(problemsWith(unoPlan({}, { 'input/ppm': 'D4' }), 'pin-cannot-do-role')[0].message).toContain(
      'needs an external interrupt',
    );
  });

  it('accepts an RC channel on a pin-change pin of the Uno but not of the Mega', () => {
    const uno = assignedPlan({ source: 'rc-pwm', channels: 2 });
    expect(codes(withPins(uno, { 'input/ch1': 'A3' }))).not.toContain('pin-cannot-do-role');
    const mega = assignedPlan({ source: 'rc-pwm', channels: 2, board: 'mega2560' });
    // variants/mega: only 10–13, 50–53 and A8–A15 have pin-change interrupts in the core.
    expect(problemsWith(withPins(mega, { 'input/ch1': 'A3' }), 'pin-cannot-do-role')[0].message).toContain(
      'neither an external nor a pin-change interrupt',
    );
    expect(codes(withPins(mega, { 'input/ch1': 'A9' }))).not.toContain('pin-cannot-do-role');
  });

  it('reports a digital role on the Nano analog-only A7', () => {
    const nano = unoPlan({ board: 'nano' }, { 'Driver 1/a.dir': 'A7' });
    expect(problemsWith(nano, 'pin-cannot-do-role')[0].message).toBe(
      'A7 is an analog input only, but Driver 1 A Direction needs a digital output.',
    );
  });

  it('reports a remote stick on a pin without an analog input', () => {
    const plan = assignedPlan({ source: 'nrf24', channels: 2 });
    expect(problemsWith(withPins(plan, { 'remote/ch1': 'D4' }), 'pin-cannot-do-role')[0].roles).toEqual(['remote/ch1']);
  });

  it('reports a serial receiver on a pin that is no UART receive line', () => {
    const plan = assignedPlan({ source: 'sbus', board: 'mega2560' });
    expect(problemsWith(withPins(plan, { 'input/rx': 'D22' }), 'pin-cannot-do-role')[0].message).toContain(
      'is not a serial receive pin',
    );
    expect(codes(withPins(plan, { 'input/rx': 'D17' }))).not.toContain('pin-cannot-do-role');
  });
});

describe('ESP32 pins (ESP-IDF GPIO page; REFERENCES §3)', () => {
  it('rejects a flash pin as an error', () => {
    expect(problemsWith(esp32Plan({}, { 'Driver 1/a.dir': 'GPIO6' }), 'pin-flash')[0]).toMatchObject({
      severity: 'error',
      pins: ['GPIO6'],
    });
  });

  it('has no flash problem on an ordinary GPIO', () => {
    expect(codes(esp32Plan({}, { 'Driver 1/a.dir': 'GPIO32' }))).not.toContain('pin-flash');
  });

  it('rejects an output on an input-only pin', () => {
    expect(problemsWith(esp32Plan({}, { 'Driver 1/a.dir': 'GPIO34' }), 'pin-input-only')[0].severity).toBe('error');
  });

  it('accepts an input on an input-only pin', () => {
    expect(codes(esp32Plan({}, { 'input/ppm': 'GPIO34' }))).not.toContain('pin-input-only');
  });

  it('warns about a strapping pin', () => {
    expect(problemsWith(esp32Plan({}, { 'Driver 1/a.dir': 'GPIO12' }), 'pin-strapping')[0].severity).toBe('warning');
  });

  it('does not warn about an ordinary GPIO', () => {
    expect(codes(esp32Plan({}, { 'Driver 1/a.dir': 'GPIO33' }))).not.toContain('pin-strapping');
  });
});

describe('pin-used-twice', () => {
  it('reports one pin given to two roles', () => {
    const [problem] = problemsWith(unoPlan({}, { 'Driver 1/b.dir': 'D8' }), 'pin-used-twice');
    expect(problem).toMatchObject({ pins: ['D8'], roles: ['Driver 1/a.dir', 'Driver 1/b.dir'] });
    expect(problem.message).toBe('D8 is used for Driver 1 A Direction and Driver 1 B Direction.');
  });

  it('lets two chips of the standby kind share their standby pin', () => {
    const plan = assignedPlan({ layout: 'trio-omni', driver: 'pwm-in1-in2-stby', source: 'ppm' });
    const [one, two] = plan.wiring.drivers;
    expect(one.pins.stby.pin).toBe(two.pins.stby.pin);
    expect(codes(plan)).not.toContain('pin-used-twice');
  });

  it('does not let a standby pin share with another role', () => {
    const plan = assignedPlan({ layout: 'trio-omni', driver: 'pwm-in1-in2-stby', source: 'ppm' });
    const clash = withPins(plan, { 'Driver 2/stby': plan.wiring.drivers[0].pins['a.in1'].pin });
    expect(codes(clash)).toContain('pin-used-twice');
  });
});

describe('pin-on-spi-bus', () => {
  it('reports a driver on the SPI MOSI pin while the transceiver uses the bus', () => {
    const plan = assignedPlan({ source: 'nrf24' });
    expect(problemsWith(withPins(plan, { 'Driver 1/a.pwm': 'D11' }), 'pin-on-spi-bus')[0].message).toContain(
      'SPI bus MOSI line',
    );
  });

  it('allows that pin when no transceiver is fitted', () => {
    expect(codes(unoPlan({}, { 'Driver 1/a.pwm': 'D11' }))).not.toContain('pin-on-spi-bus');
  });

  it('checks the remote board too', () => {
    const plan = assignedPlan({ source: 'nrf24' });
    expect(problemsWith(withPins(plan, { 'remote/ce': 'D13' }), 'pin-on-spi-bus')[0].path).toEqual([
      'controls',
      'link',
      'remotePins',
      'ce',
      'pin',
    ]);
  });
});

describe('spi-ss-not-output', () => {
  it('reports an input on the AVR SS pin while the transceiver uses the bus', () => {
    const plan = assignedPlan({ source: 'nrf24' });
    const moved = withPins(plan, { 'input/csn': 'D4', 'bench-test': 'D10' });
    expect(codes(moved)).toContain('spi-ss-not-output');
  });

  it('accepts the transceiver CSN on the SS pin', () => {
    const plan = assignedPlan({ source: 'nrf24' });
    expect(plan.wiring.inputPins.csn.pin).toBe('D10');
    expect(codes(plan)).not.toContain('spi-ss-not-output');
  });
});

describe('USB serial pins', () => {
  it('reports a role on the USB serial pins while diagnostics print there', () => {
    expect(problemsWith(unoPlan({}, { 'Driver 1/a.dir': 'D1' }), 'pin-on-usb-serial')[0].hint).toMatch(
      /turn serial diagnostics off/,
    );
  });

  it('only warns about uploads when diagnostics are off', () => {
    const plan = unoPlan({ serialDiagnostics: false }, { 'Driver 1/a.dir': 'D1' });
    expect(codes(plan)).not.toContain('pin-on-usb-serial');
    expect(problemsWith(plan, 'pin-shares-usb-serial')[0].severity).toBe('warning');
  });

  it('has nothing to say about other pins', () => {
    expect(codes(unoPlan({ serialDiagnostics: false }))).not.toContain('pin-shares-usb-serial');
  });
});

describe('role-unknown', () => {
  it('warns about a pin kept under a role the driver does not have', () => {
    const plan = unoPlan({}, { 'Driver 1/c.pwm': 'D4' });
    expect(problemsWith(plan, 'role-unknown')[0]).toMatchObject({ pins: ['D4'], severity: 'warning' });
  });

  it('is quiet for a role the driver has', () => {
    expect(codes(unoPlan())).not.toContain('role-unknown');
  });

  it('warns about an input pin left over from another input source', () => {
    const plan = unoPlan({}, { 'input/rx': 'D4' });
    expect(problemsWith(plan, 'role-unknown')[0]).toMatchObject({
      roles: ['input/rx'],
      path: ['wiring', 'inputPins', 'rx', 'pin'],
    });
  });
});

describe('missing pins on an empty plan', () => {
  it('reports every required role and suggests pins for each', () => {
    const problems = checkPinPlan(buildConfig({ source: 'ppm' })).filter((p) => p.code === 'pin-missing');
    expect(problems.map((p) => p.roles[0])).toEqual([
      'Driver 1/a.pwm',
      'Driver 1/a.dir',
      'Driver 1/b.pwm',
      'Driver 1/b.dir',
      'input/ppm',
    ]);
    expect(problems[4].hint).toBe('Pins that can: D2, D3.');
  });
});
