import { describe, expect, it } from 'vitest';
import { buildConfig, reparse, withPins } from '../../../fixtures/robot-config-factory';
import { assignedPlan, codes, esp32Plan, problemsWith, unoPlan } from '../../../fixtures/pin-plans';

describe('pwm-frequency-above-driver-max', () => {
  it('reports a PWM frequency above what a PWM + direction module takes', () => {
    const [problem] = problemsWith(unoPlan({ pwmFrequencyHz: 30000 }), 'pwm-frequency-above-driver-max');
    expect(problem).toMatchObject({ severity: 'error', path: ['wiring', 'drivers', 0, 'pwmFrequencyHz'] });
    expect(problem.message).toContain('above the 20 kHz its inputs accept');
  });

  it('accepts 30 kHz on a TB6612-class driver, whose datasheet allows 100 kHz', () => {
    const plan = assignedPlan({ driver: 'pwm-in1-in2-stby', pwmFrequencyHz: 30000, source: 'ppm', board: 'mega2560' });
    expect(codes(plan)).not.toContain('pwm-frequency-above-driver-max');
  });
});

describe('pwm-frequency-ignored', () => {
  it('warns that an ESC ignores a PWM frequency', () => {
    const plan = assignedPlan({ driver: 'servo-esc', source: 'ppm' });
    const set = reparse(plan, (c) => {
      c.wiring.drivers[0].pwmFrequencyHz = 20000;
    });
    expect(problemsWith(set, 'pwm-frequency-ignored')[0].severity).toBe('warning');
  });

  it('is quiet for an ESC without one', () => {
    expect(codes(assignedPlan({ driver: 'servo-esc', source: 'ppm' }))).not.toContain('pwm-frequency-ignored');
  });
});

describe('logic-level-too-low', () => {
  it('warns when a 3.3 V board drives a module with 5 V input buffers', () => {
    const plan = assignedPlan({ driver: 'dual-pwm', source: 'ppm', board: 'esp32-devkitc' });
    expect(problemsWith(plan, 'logic-level-too-low')[0].message).toContain('3.3 V outputs are below the 3.5 V');
  });

  it('is quiet for the same module on a 5 V board', () => {
    expect(codes(assignedPlan({ driver: 'dual-pwm', source: 'ppm' }))).not.toContain('logic-level-too-low');
  });

  it('is quiet for an L298-class driver on a 3.3 V board (inputs high from 2.3 V)', () => {
    expect(codes(assignedPlan({ driver: 'en-in1-in2', source: 'ppm', board: 'rp2040-pico' }))).not.toContain(
      'logic-level-too-low',
    );
  });
});

describe('motors and driver channels', () => {
  it('reports a motor on no driver channel', () => {
    const config = reparse(unoPlan(), (c) => {
      c.wiring.drivers[0].motors = ['Left'];
    });
    expect(problemsWith(config, 'motor-not-on-driver')[0]).toMatchObject({
      roles: ['Right'],
      path: ['motors', 1, 'name'],
    });
  });

  it('is quiet when every motor has a channel', () => {
    expect(codes(unoPlan())).not.toContain('motor-not-on-driver');
  });

  it('reports a motor on two drivers', () => {
    const config = reparse(assignedPlan({ driver: 'dual-pwm', source: 'ppm' }), (c) => {
      c.wiring.drivers[1].motors = ['Left'];
    });
    expect(problemsWith(config, 'motor-on-two-drivers')[0].message).toBe(
      'Motor “Left” is on Driver 1 and Driver 2; one motor takes one driver channel.',
    );
  });

  it('reports a driver naming a motor the robot lacks', () => {
    const config = reparse(unoPlan(), (c) => {
      c.wiring.drivers[0].motors = ['Left', 'Ghost'];
    });
    expect(codes(config)).toContain('driver-motor-unknown');
    expect(codes(unoPlan())).not.toContain('driver-motor-unknown');
  });

  it('reports two motors on a one-channel driver', () => {
    const config = reparse(assignedPlan({ driver: 'dual-pwm', source: 'ppm' }), (c) => {
      c.wiring.drivers[0].motors = ['Left', 'Right'];
      c.wiring.drivers.pop();
    });
    expect(codes(config)).toContain('driver-too-many-motors');
    expect(codes(unoPlan())).not.toContain('driver-too-many-motors');
  });
});

describe('sbus-needs-inverter', () => {
  it('warns that an ATmega board needs an inverter for SBUS', () => {
    const plan = assignedPlan({ source: 'sbus', board: 'mega2560' });
    expect(problemsWith(plan, 'sbus-needs-inverter')[0]).toMatchObject({ severity: 'warning', pins: ['D15'] });
  });

  it('is quiet on an ESP32, whose UART can invert its input', () => {
    expect(codes(assignedPlan({ source: 'sbus', board: 'esp32-devkitc' }))).not.toContain('sbus-needs-inverter');
  });

  it('is quiet for iBUS, which is not inverted', () => {
    expect(codes(assignedPlan({ source: 'ibus', board: 'mega2560' }))).not.toContain('sbus-needs-inverter');
  });
});

describe('stop-mode-unsupported', () => {
  it('warns that a PWM + direction module cannot coast', () => {
    const config = reparse(unoPlan(), (c) => {
      c.wiring.drivers[0].stopMode = 'coast';
    });
    expect(problemsWith(config, 'stop-mode-unsupported')[0].message).toBe(
      'Driver 1 cannot coast with its pins as wired; it will brake instead.',
    );
  });

  it('is quiet for a PWM + direction module set to brake', () => {
    expect(codes(unoPlan())).not.toContain('stop-mode-unsupported');
  });

  it('warns when a dual half-bridge should coast without its enable pin, and not with it', () => {
    const plan = reparse(assignedPlan({ driver: 'dual-pwm', source: 'ppm' }), (c) => {
      c.wiring.drivers[0].stopMode = 'coast';
    });
    expect(plan.wiring.drivers[0].pins['a.en'].pin).not.toBeNull();
    expect(codes(plan)).not.toContain('stop-mode-unsupported');
    expect(problemsWith(withPins(plan, { 'Driver 1/a.en': null }), 'stop-mode-unsupported')[0].message).toContain(
      'coasting needs the enable pin',
    );
  });
});

describe('checks that span both boards', () => {
  it('checks a remote on the Nano for the home-made link', () => {
    const plan = assignedPlan({ source: 'nrf24', channels: 4, switches: true });
    expect(plan.controls.link.remotePins.ce.pin).not.toBeNull();
    expect(codes(plan)).toEqual([]);
  });

  it('needs no remote pins for other sources', () => {
    expect(buildConfig({ source: 'ppm' }).controls.link.remotePins).toEqual({});
    expect(codes(esp32Plan())).toEqual([]);
  });
});
