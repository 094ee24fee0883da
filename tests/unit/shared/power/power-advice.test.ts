import { describe, expect, it } from 'vitest';
import { POWER_PROBLEM_CODES, powerAdvice } from '@shared/power/power-advice';
import type { DriverKindId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildConfig, reparse } from '../../../fixtures/robot-config-factory';

/** A differential robot whose numbers raise no power problem: 7.4 V motors on a 2S LiPo. */
function robot(change: (c: RobotConfig) => void = () => {}, driver: DriverKindId = 'pwm-dir'): RobotConfig {
  return reparse(buildConfig({ driver, source: 'ppm' }), (c) => {
    for (const m of c.motors) m.ratedVoltage = 7.4;
    change(c);
  });
}

const codes = (config: RobotConfig) => powerAdvice(config).problems.map((p) => p.code);
const stall = (a: number) => (c: RobotConfig) => c.motors.forEach((m) => (m.stallCurrentA = a));

describe('power advice on a sound robot', () => {
  it('finds no problem', () => {
    expect(powerAdvice(robot()).problems).toEqual([]);
  });

  it('sizes the fuse and wire from two 2 A stall currents: 2 A running, 3 A fuse, AWG 24', () => {
    const advice = powerAdvice(robot());
    expect(advice).toMatchObject({ stallTotalA: 4, runningA: 2, fuseA: 3, wire: { awg: 24, ampacityA: 3.5 } });
    expect(advice.rules.join(' ')).toContain('the 125 % continuous-load rule');
  });

  it('always reminds about a common ground', () => {
    expect(powerAdvice(robot()).notes[0]).toMatch(/^Join the grounds/);
  });

  it('uses only published codes with their severity', () => {
    const config = robot((c) => {
      c.power = { ...c.power, chemistry: 'alkaline', cells: 6, logicSupply: 'usb' };
      stall(50)(c);
    });
    for (const p of powerAdvice(config).problems)
      expect(POWER_PROBLEM_CODES[p.code as keyof typeof POWER_PROBLEM_CODES]).toBe(p.severity);
  });
});

describe('driver current ratings', () => {
  it('reports a stall above a TB6612-class peak of 3.2 A', () => {
    const [p] = powerAdvice(robot(stall(5), 'pwm-in1-in2-stby')).problems;
    expect(p.code).toBe('driver-peak-below-stall');
    expect(p.message).toContain('above Driver 1’s 3.2 A peak (TB6612FNG datasheet');
  });

  it('warns about a stall above the 1.2 A continuous rating only', () => {
    expect(codes(robot(stall(2), 'pwm-in1-in2-stby'))).toEqual(['driver-continuous-below-stall']);
  });

  it('is quiet below both ratings', () => {
    expect(codes(robot(stall(1), 'pwm-in1-in2-stby'))).toEqual([]);
  });

  it('uses the ratings entered for the module over the kind’s', () => {
    const config = robot((c) => {
      stall(5)(c);
      c.wiring.drivers[0].peakCurrentA = 6;
      c.wiring.drivers[0].continuousCurrentA = 6;
    }, 'pwm-in1-in2-stby');
    expect(codes(config)).toEqual([]);
  });
});

describe('battery voltage against the drivers', () => {
  it('reports a full 4S LiPo (16.8 V) above a TB6612’s 13.5 V', () => {
    expect(codes(robot((c) => (c.power.cells = 4), 'pwm-in1-in2-stby'))).toContain('battery-above-driver-max');
  });

  it('accepts a 3S LiPo (12.6 V) on it', () => {
    expect(codes(robot((c) => (c.power.cells = 3), 'pwm-in1-in2-stby'))).not.toContain('battery-above-driver-max');
  });

  it('reports a 1S LiPo below a half-bridge module’s 6 V', () => {
    expect(codes(robot((c) => (c.power.cells = 1), 'dual-pwm'))).toContain('battery-below-driver-min');
  });

  it('warns when a pack near empty falls below the driver’s minimum, and not above it', () => {
    // Four NiMH cells: 4.8 V nominal, 4.0 V empty, against the L298’s VIH + 2.5 = 4.8 V.
    const nimh = (cells: number) => robot((c) => (c.power = { ...c.power, chemistry: 'nimh', cells }), 'en-in1-in2');
    expect(codes(nimh(4))).toContain('battery-sags-below-driver-min');
    expect(codes(nimh(6))).not.toContain('battery-sags-below-driver-min');
  });
});

describe('battery voltage against the motors', () => {
  it('warns about 6 V motors on a full 3S LiPo and suggests an output limit', () => {
    const [p] = powerAdvice(
      robot((c) => {
        c.power.cells = 3;
        for (const m of c.motors) m.ratedVoltage = 6;
      }),
    ).problems.filter((x) => x.code === 'battery-above-motor-rating');
    // 6 V / 12.6 V = 47.6 %.
    expect(p.hint).toBe('Set the output limit to 47 % or less, or use a lower-voltage battery.');
  });

  it('is quiet once the output limit brings them within 25 % of their rating', () => {
    const config = robot((c) => {
      c.power.cells = 3;
      c.safety.outputLimitPercent = 50;
      for (const m of c.motors) m.ratedVoltage = 6;
    });
    expect(codes(config)).not.toContain('battery-above-motor-rating');
  });

  it('warns about 12 V motors on 7.4 V', () => {
    expect(codes(robot((c) => c.motors.forEach((m) => (m.ratedVoltage = 12))))).toContain('battery-below-motor-rating');
  });

  it('counts the L298 bridge drop', () => {
    const [p] = powerAdvice(robot(() => {}, 'en-in1-in2')).problems.filter(
      (x) => x.code === 'battery-below-motor-rating',
    );
    expect(p.message).toContain('after the driver’s 2.5 V drop');
  });
});

describe('battery current', () => {
  it('warns when all motors stalled draw more than the pack’s rating', () => {
    // Two 30 A stalls = 60 A against 2.2 Ah × 20 C = 44 A.
    expect(codes(robot(stall(30), 'dual-pwm'))).toContain('battery-current-too-low');
  });

  it('is quiet when the pack can deliver it', () => {
    expect(
      codes(
        robot((c) => {
          stall(30)(c);
          c.power.dischargeC = 30;
        }, 'dual-pwm'),
      ),
    ).not.toContain('battery-current-too-low');
  });

  it('warns about a 9 V block battery', () => {
    expect(codes(robot((c) => (c.power = { ...c.power, chemistry: 'alkaline', cells: 6 }), 'two-input'))).toContain(
      'small-9v-battery',
    );
  });

  it('is quiet for four alkaline cells', () => {
    expect(codes(robot((c) => (c.power = { ...c.power, chemistry: 'alkaline', cells: 4 }), 'two-input'))).not.toContain(
      'small-9v-battery',
    );
  });
});

describe('logic supply', () => {
  const logic = (
    supply: RobotConfig['power']['logicSupply'],
    driver: DriverKindId,
    cells = 2,
    board: RobotConfig['wiring']['board'] = 'uno',
  ) =>
    codes(
      robot((c) => {
        c.power.logicSupply = supply;
        c.power.cells = cells;
        c.wiring.board = board;
      }, driver),
    );

  it('reports a driver regulator that no driver has', () => {
    expect(logic('driver-regulator', 'pwm-in1-in2-stby')).toContain('logic-regulator-missing');
  });

  it('warns that an L298 module’s regulator sags with the motors', () => {
    const found = logic('driver-regulator', 'en-in1-in2');
    expect(found).toContain('logic-supply-sags');
    expect(found).not.toContain('logic-regulator-missing');
    expect(found).not.toContain('logic-regulator-over-voltage');
  });

  it('reports an L298 module regulator fed above 12 V', () => {
    expect(logic('driver-regulator', 'en-in1-in2', 4)).toContain('logic-regulator-over-voltage');
  });

  it('reports a battery above the ESP32 5 V pin', () => {
    expect(logic('board-vin', 'pwm-dir', 2, 'esp32-devkitc')).toContain('board-supply-over-voltage');
  });

  it('warns that a 2S pack near empty is below the Uno’s recommended 7 V on VIN', () => {
    expect(logic('board-vin', 'pwm-dir', 2)).toEqual(['board-supply-under-voltage', 'logic-supply-sags']);
  });

  it('warns that a USB-fed board stops when unplugged', () => {
    expect(logic('usb', 'pwm-dir')).toEqual(['logic-from-usb']);
  });

  it('is quiet with a separate regulator', () => {
    expect(logic('separate-regulator', 'pwm-dir')).toEqual([]);
  });
});

describe('notes', () => {
  it('adds the transceiver supply note for the home-made link', () => {
    expect(powerAdvice(reparse(robot(), (c) => (c.controls.source = 'nrf24'))).notes.join(' ')).toContain('1.9–3.6 V');
  });

  it('adds lithium charging care for LiPo packs only', () => {
    expect(powerAdvice(robot()).notes.join(' ')).toContain('balance charger');
    expect(powerAdvice(robot((c) => (c.power.chemistry = 'nimh'))).notes.join(' ')).not.toContain('balance charger');
  });
});
