import { getBoard } from '../boards/boards';
import { DRIVER_KINDS } from '../drivers/driver-kinds';
import type { Problem } from '../problems/problem';
import type { Driver, RobotConfig } from '../schemas/robot-config';
import { summarizeBattery, type BatterySummary } from './battery';
import { fuseRatingA, runningCurrentA, wireForCurrent } from './wire-and-fuse';

/** Stable codes of the power checks and their severity. */
export const POWER_PROBLEM_CODES = {
  'driver-peak-below-stall': 'error',
  'driver-continuous-below-stall': 'warning',
  'battery-above-driver-max': 'error',
  'battery-below-driver-min': 'error',
  'battery-sags-below-driver-min': 'warning',
  'battery-above-motor-rating': 'warning',
  'battery-below-motor-rating': 'warning',
  'battery-current-too-low': 'warning',
  'small-9v-battery': 'warning',
  'logic-regulator-missing': 'error',
  'logic-regulator-over-voltage': 'error',
  'board-supply-over-voltage': 'error',
  'board-supply-under-voltage': 'warning',
  'logic-supply-sags': 'warning',
  'logic-from-usb': 'warning',
} as const;

type PowerCode = keyof typeof POWER_PROBLEM_CODES;

export interface DriverPowerRow {
  name: string;
  continuousA: number | null;
  peakA: number | null;
  /** Highest stall current among the motors on this driver. */
  worstStallA: number;
  motorVolts: { min: number; max: number } | null;
}

export interface PowerAdvice {
  battery: BatterySummary;
  stallTotalA: number;
  /** Half the stall currents summed: all motors at their maximum-power point. */
  runningA: number;
  fuseA: number | null;
  wire: { awg: number; mm2: number; ampacityA: number } | null;
  /** How the fuse and wire were chosen, with the rule's source. */
  rules: string[];
  drivers: DriverPowerRow[];
  problems: Problem[];
  /** Cautions that apply to this robot whatever its numbers. */
  notes: string[];
}

function problem(code: PowerCode, roles: string[], path: (string | number)[], message: string, hint: string): Problem {
  return { severity: POWER_PROBLEM_CODES[code], code, pins: [], roles, message, hint, path };
}

const volts = (v: number) => `${Math.round(v * 10) / 10} V`;
const amps = (a: number) => `${Math.round(a * 10) / 10} A`;

function stallOf(config: RobotConfig, name: string): number {
  return config.motors.find((m) => m.name === name)?.stallCurrentA ?? 0;
}

function driverRow(config: RobotConfig, driver: Driver): DriverPowerRow {
  const ratings = DRIVER_KINDS[driver.kind].ratings;
  return {
    name: driver.name,
    continuousA: driver.continuousCurrentA ?? ratings.continuousA,
    peakA: driver.peakCurrentA ?? ratings.peakA,
    worstStallA: Math.max(0, ...driver.motors.map((m) => stallOf(config, m))),
    motorVolts: ratings.motorVolts,
  };
}

function checkDriverPower(
  config: RobotConfig,
  battery: BatterySummary,
  driver: Driver,
  index: number,
  row: DriverPowerRow,
): Problem[] {
  const out: Problem[] = [];
  const path = ['wiring', 'drivers', index];
  const source = DRIVER_KINDS[driver.kind].ratings.source;
  const worst = driver.motors.find((m) => stallOf(config, m) === row.worstStallA) ?? '';
  if (row.peakA !== null && row.worstStallA > row.peakA) {
    out.push(
      problem(
        'driver-peak-below-stall',
        [driver.name, worst],
        [...path, 'peakCurrentA'],
        `Motor “${worst}” stalls at ${amps(row.worstStallA)}, above ${driver.name}’s ${amps(row.peakA)} peak (${source}): a stall or a hard reversal can destroy it.`,
        `Use a driver rated for at least ${amps(row.worstStallA)} peak, or smaller motors.`,
      ),
    );
  } else if (row.continuousA !== null && row.worstStallA > row.continuousA) {
    out.push(
      problem(
        'driver-continuous-below-stall',
        [driver.name, worst],
        [...path, 'continuousCurrentA'],
        `Motor “${worst}” stalls at ${amps(row.worstStallA)}, above ${driver.name}’s ${amps(row.continuousA)} continuous rating: a held stall will overheat it.`,
        'Keep stalls short (the ramp limit and a fuse help), or use a larger driver.',
      ),
    );
  }
  const range = row.motorVolts;
  if (range && battery.fullVolts > range.max) {
    out.push(
      problem(
        'battery-above-driver-max',
        [driver.name],
        ['power', 'cells'],
        `A full battery gives ${volts(battery.fullVolts)}, above the ${volts(range.max)} ${driver.name} can take.`,
        'Use fewer cells or a driver rated for the battery.',
      ),
    );
  } else if (range && battery.nominalVolts < range.min) {
    out.push(
      problem(
        'battery-below-driver-min',
        [driver.name],
        ['power', 'cells'],
        `The battery’s ${volts(battery.nominalVolts)} is below the ${volts(range.min)} ${driver.name} needs to work.`,
        'Use more cells or a driver for lower voltages.',
      ),
    );
  } else if (range && battery.emptyVolts < range.min) {
    out.push(
      problem(
        'battery-sags-below-driver-min',
        [driver.name],
        ['power', 'cells'],
        `Near empty the battery falls to ${volts(battery.emptyVolts)}, below the ${volts(range.min)} ${driver.name} needs: it will cut out before the pack is flat.`,
        'Recharge earlier, or add a cell.',
      ),
    );
  }
  return out;
}

function checkMotorVoltage(config: RobotConfig, battery: BatterySummary): Problem[] {
  const limit = config.safety.outputLimitPercent / 100;
  return config.motors.flatMap((motor, index) => {
    const driver = config.wiring.drivers.find((d) => d.motors.includes(motor.name));
    const drop = driver ? (DRIVER_KINDS[driver.kind].bridgeDropVolts ?? 0) : 0;
    const most = battery.fullVolts * limit - drop;
    const path = ['motors', index, 'ratedVoltage'];
    // Common practice: up to about 25 % over the rated voltage is tolerated by brushed hobby motors.
    if (most > motor.ratedVoltage * 1.25) {
      const suggest = Math.floor(((motor.ratedVoltage + drop) / battery.fullVolts) * 100);
      return [
        problem(
          'battery-above-motor-rating',
          [motor.name],
          path,
          `Motor “${motor.name}” is rated ${volts(motor.ratedVoltage)} but can see up to ${volts(most)} from a full battery.`,
          `Set the output limit to ${suggest} % or less, or use a lower-voltage battery.`,
        ),
      ];
    }
    if (battery.nominalVolts - drop < motor.ratedVoltage * 0.75) {
      return [
        problem(
          'battery-below-motor-rating',
          [motor.name],
          path,
          `Motor “${motor.name}” is rated ${volts(motor.ratedVoltage)} but gets about ${volts(battery.nominalVolts - drop)}${drop ? ` after the driver’s ${volts(drop)} drop` : ''}: it will run slow and weak.`,
          'Use a battery closer to the motors’ rated voltage.',
        ),
      ];
    }
    return [];
  });
}

function checkBattery(config: RobotConfig, battery: BatterySummary, stallTotalA: number): Problem[] {
  const out: Problem[] = [];
  if (battery.isNineVoltBlock) {
    out.push(
      problem(
        'small-9v-battery',
        ['battery'],
        ['power', 'chemistry'],
        'A 9 V block battery delivers a few hundred milliamps at best: the motors will stall and the board will reset.',
        'Use a rechargeable pack (for example 2S LiPo or six NiMH cells).',
      ),
    );
  } else if (stallTotalA > battery.maxCurrentA) {
    out.push(
      problem(
        'battery-current-too-low',
        ['battery'],
        ['power', 'dischargeC'],
        `All motors stalled draw ${amps(stallTotalA)}, more than the ${amps(battery.maxCurrentA)} the pack is rated for (${config.power.capacityMah} mAh × ${config.power.dischargeC} C).`,
        'Use a pack with a higher discharge rating or capacity; its voltage sags and it heats under such loads.',
      ),
    );
  }
  return out;
}

function checkLogicSupply(config: RobotConfig, battery: BatterySummary): Problem[] {
  const supply = config.power.logicSupply;
  const board = getBoard(config.wiring.board);
  const path = ['power', 'logicSupply'];
  const sags = problem(
    'logic-supply-sags',
    ['logic supply'],
    path,
    'The board shares the motors’ battery: when motors start, stall or reverse, the voltage dips and the board can reset mid-run.',
    'Feed the board from its own regulator with a large capacitor (a few hundred µF) at its input, and keep the motor wires short.',
  );
  if (supply === 'usb')
    return [
      problem(
        'logic-from-usb',
        ['logic supply'],
        path,
        'The board runs from USB: the robot stops whenever the cable is unplugged.',
        'For driving, feed the board from a regulator on the battery.',
      ),
    ];
  if (supply === 'driver-regulator') {
    const withRegulator = config.wiring.drivers.find((d) => DRIVER_KINDS[d.kind].regulator);
    if (!withRegulator)
      return [
        problem(
          'logic-regulator-missing',
          ['logic supply'],
          path,
          'The logic supply is set to a driver’s regulator, but none of these drivers has one.',
          'Use a separate 5 V regulator.',
        ),
      ];
    const reg = DRIVER_KINDS[withRegulator.kind].regulator!;
    if (battery.fullVolts > reg.maxInputVolts) {
      return [
        problem(
          'logic-regulator-over-voltage',
          [withRegulator.name],
          path,
          `${withRegulator.name}’s 5 V regulator takes up to ${volts(reg.maxInputVolts)}, but a full battery gives ${volts(battery.fullVolts)}: ${reg.note}.`,
          'Remove the regulator jumper and use a separate 5 V regulator.',
        ),
      ];
    }
    return [sags];
  }
  if (supply === 'board-vin') {
    const input = board.supplyInput;
    if (battery.fullVolts > input.maxVolts)
      return [
        problem(
          'board-supply-over-voltage',
          [board.shortName],
          path,
          `A full battery gives ${volts(battery.fullVolts)}, above the ${volts(input.maxVolts)} the ${board.shortName}’s ${input.pin} accepts (${input.note}).`,
          'Use a regulator between the battery and the board.',
        ),
      ];
    const out = [sags];
    if (battery.emptyVolts < input.minVolts)
      out.unshift(
        problem(
          'board-supply-under-voltage',
          [board.shortName],
          path,
          `Near empty the battery gives ${volts(battery.emptyVolts)}, below the ${volts(input.minVolts)} the ${board.shortName}’s ${input.pin} needs.`,
          'Add a cell, or use a boost or buck-boost regulator.',
        ),
      );
    return out;
  }
  return [];
}

function notes(config: RobotConfig): string[] {
  const list = [
    // Common practice.
    'Join the grounds: battery negative, every driver’s ground and the board’s ground must meet, or signals float and motors twitch.',
    'Put the fuse and a reachable power switch in the battery’s positive lead, as close to the battery as you can.',
  ];
  // Supply range and 5 V-tolerant inputs: nRF24L01+ Product Specification v1.0; the capacitor is common practice.
  if (config.controls.source === 'nrf24')
    list.push(
      'Feed the nRF24L01+ from 3.3 V (its supply range is 1.9–3.6 V; its inputs take 5 V), with a 10 µF capacitor across its supply pins.',
    );
  if (['lipo', 'li-ion', 'lifepo4'].includes(config.power.chemistry))
    list.push(
      'Charge lithium packs with a balance charger, supervised, on a fire-safe surface; never above 4.2 V per LiPo cell; store at about 3.8 V per cell; retire a swollen pack.',
    );
  if (config.wiring.drivers.some((d) => DRIVER_KINDS[d.kind].bridgeDropVolts))
    list.push(
      'An L298-class bridge loses about 2–3 V (L298 datasheet: 1.8–3.2 V at 1 A): the motors see that much less than the battery.',
    );
  if (config.wiring.drivers.some((d) => 'fractionOfVcc' in DRIVER_KINDS[d.kind].logic.minHigh))
    list.push(
      'Feed the TB6612-class driver’s VCC from the board’s own logic supply, so its inputs read the board’s high level.',
    );
  return list;
}

/** Power and protection advice from the motors, the battery and the drivers. Pure computation. */
export function powerAdvice(config: RobotConfig): PowerAdvice {
  const battery = summarizeBattery(config.power);
  const stallTotalA = config.motors.reduce((sum, m) => sum + m.stallCurrentA, 0);
  const runningA = runningCurrentA(config.motors.map((m) => m.stallCurrentA));
  const fuseA = fuseRatingA(runningA);
  const wire = wireForCurrent(fuseA ?? runningA * 1.25);
  const rows = config.wiring.drivers.map((d) => driverRow(config, d));
  const problems = [
    ...config.wiring.drivers.flatMap((d, i) => checkDriverPower(config, battery, d, i, rows[i])),
    ...checkMotorVoltage(config, battery),
    ...checkBattery(config, battery, stallTotalA),
    ...checkLogicSupply(config, battery),
  ];
  return {
    battery,
    stallTotalA,
    runningA,
    fuseA,
    wire,
    rules: [
      `Running current: half of each motor’s stall current, summed (${amps(runningA)}): a motor driven hard works near its maximum-power point (linear DC-motor model).`,
      // Both rules are common practice (wire-and-fuse.ts).
      `Fuse: the next standard blade fuse at or above 1.25 × the running current${fuseA ? ` (${fuseA} A)` : ''}, by the 125 % continuous-load rule.`,
      `Wire: the thinnest gauge whose chassis-wiring ampacity covers the fuse${wire ? ` (AWG ${wire.awg}, ${wire.mm2} mm², ${wire.ampacityA} A)` : ''}, so the fuse blows before the wire overheats.`,
    ],
    drivers: rows,
    problems: [...problems.filter((p) => p.severity === 'error'), ...problems.filter((p) => p.severity === 'warning')],
    notes: notes(config),
  };
}
