import { getBoard } from '../boards/boards';
import { DRIVER_KINDS } from '../drivers/driver-kinds';
import { INPUT_SOURCES } from '../inputs/input-sources';
import { formatHz } from '../boards/pwm-timing';
import type { Problem } from '../problems/problem';
import type { Driver, RobotConfig } from '../schemas/robot-config';
import { strayDriverRoles, strayInputRoles } from './pin-demands';

// Checks of the drivers themselves and how they meet the board: which motor sits on which
// driver, PWM frequency limits, logic levels, stop modes; plus the SBUS inverter on ATmega.

function driverProblem(
  severity: Problem['severity'],
  code: string,
  index: number,
  driver: Driver,
  field: (string | number)[],
  message: string,
  hint: string,
): Problem {
  return {
    severity,
    code,
    pins: [],
    roles: [driver.name],
    message,
    hint,
    path: ['wiring', 'drivers', index, ...field],
  };
}

function checkMotorPlacement(config: RobotConfig): Problem[] {
  const problems: Problem[] = [];
  const motorNames = new Set(config.motors.map((m) => m.name));
  const placed = new Map<string, string[]>();
  config.wiring.drivers.forEach((driver, index) => {
    const kind = DRIVER_KINDS[driver.kind];
    if (driver.motors.length > kind.channels) {
      problems.push(
        driverProblem(
          'error',
          'driver-too-many-motors',
          index,
          driver,
          ['motors'],
          `${driver.name} is a ${kind.name} driver with ${kind.channels} channel, but ${driver.motors.length} motors are on it.`,
          'Add a driver for the extra motor.',
        ),
      );
    }
    driver.motors.forEach((motor, slot) => {
      if (!motorNames.has(motor)) {
        problems.push(
          driverProblem(
            'error',
            'driver-motor-unknown',
            index,
            driver,
            ['motors', slot],
            `${driver.name} drives “${motor}”, but no motor has that name.`,
            'Choose one of the robot’s motors.',
          ),
        );
      }
      placed.set(motor, [...(placed.get(motor) ?? []), driver.name]);
    });
  });
  config.motors.forEach((motor, index) => {
    const drivers = placed.get(motor.name) ?? [];
    if (drivers.length === 0) {
      problems.push({
        severity: 'error',
        code: 'motor-not-on-driver',
        pins: [],
        roles: [motor.name],
        message: `Motor “${motor.name}” is not on any driver channel.`,
        hint: 'Put it on a free driver channel or add a driver.',
        path: ['motors', index, 'name'],
      });
    } else if (drivers.length > 1) {
      problems.push({
        severity: 'error',
        code: 'motor-on-two-drivers',
        pins: [],
        roles: [motor.name, ...drivers],
        message: `Motor “${motor.name}” is on ${drivers.join(' and ')}; one motor takes one driver channel.`,
        hint: 'Remove it from all drivers but one.',
        path: ['motors', index, 'name'],
      });
    }
  });
  return problems;
}

function checkDriver(config: RobotConfig, driver: Driver, index: number): Problem[] {
  const problems: Problem[] = [];
  const kind = DRIVER_KINDS[driver.kind];
  const board = getBoard(config.wiring.board);
  const f = driver.pwmFrequencyHz;
  if (f !== null && kind.maxPwmHz === null) {
    problems.push(
      driverProblem(
        'warning',
        'pwm-frequency-ignored',
        index,
        driver,
        ['pwmFrequencyHz'],
        `${driver.name} takes servo pulses, which always repeat at 50 Hz; its PWM frequency setting is not used.`,
        'Clear the PWM frequency.',
      ),
    );
  } else if (f !== null && kind.maxPwmHz !== null && f > kind.maxPwmHz) {
    problems.push(
      driverProblem(
        'error',
        'pwm-frequency-above-driver-max',
        index,
        driver,
        ['pwmFrequencyHz'],
        `${driver.name} is set to ${formatHz(f)} PWM, above the ${formatHz(kind.maxPwmHz)} its inputs accept (${kind.maxPwmSource}).`,
        `Set ${formatHz(Math.min(kind.maxPwmHz, 20000))} or less.`,
      ),
    );
  }
  const minHigh = kind.logic.minHigh;
  if ('volts' in minHigh && board.logicVolts < minHigh.volts) {
    problems.push(
      driverProblem(
        'warning',
        'logic-level-too-low',
        index,
        driver,
        ['kind'],
        `The ${board.shortName}’s ${board.logicVolts} V outputs are below the ${minHigh.volts} V that ${driver.name}’s inputs need to read high: ${kind.logic.note}.`,
        'Add a 3.3 V → 5 V level shifter (for example a 74HCT buffer), or choose a driver with 3.3 V inputs.',
      ),
    );
  }
  const way = kind.stopModes[driver.stopMode];
  const coastNeedsEnable = driver.kind === 'dual-pwm' && driver.stopMode === 'coast' && !driver.pins['a.en']?.pin;
  if (way === null || coastNeedsEnable) {
    problems.push(
      driverProblem(
        'warning',
        'stop-mode-unsupported',
        index,
        driver,
        ['stopMode'],
        `${driver.name} cannot ${driver.stopMode} with its pins as wired${coastNeedsEnable ? ' (coasting needs the enable pin)' : ''}; it will ${driver.stopMode === 'coast' ? 'brake' : 'coast'} instead.`,
        coastNeedsEnable
          ? 'Give the enable pin a pin, or choose brake.'
          : `Choose ${driver.stopMode === 'coast' ? 'brake' : 'coast'}.`,
      ),
    );
  }
  return problems;
}

function checkStrayRoles(config: RobotConfig): Problem[] {
  const inputs = strayInputRoles(config).map(({ roleId, pin, remote }): Problem => ({
    severity: 'warning',
    code: 'role-unknown',
    pins: [pin],
    roles: [`${remote ? 'remote' : 'input'}/${roleId}`],
    message: `The ${remote ? 'remote' : 'input source'} has no role “${roleId}” now, so ${pin} is kept for nothing.`,
    hint: 'Clear that pin; it is left over from another input source or channel table.',
    path: remote ? ['controls', 'link', 'remotePins', roleId, 'pin'] : ['wiring', 'inputPins', roleId, 'pin'],
  }));
  return [
    ...inputs,
    ...strayDriverRoles(config).map(({ driverIndex, roleId }) => {
      const driver = config.wiring.drivers[driverIndex];
      const pin = driver.pins[roleId].pin!;
      return {
        severity: 'warning',
        code: 'role-unknown',
        pins: [pin],
        roles: [`${driver.name}/${roleId}`],
        message: `${driver.name} has no role “${roleId}”, so ${pin} is kept for nothing.`,
        hint: 'Clear that pin; it is left over from another driver kind or motor count.',
        path: ['wiring', 'drivers', driverIndex, 'pins', roleId, 'pin'],
      } satisfies Problem;
    }),
  ];
}

function checkInverter(config: RobotConfig): Problem[] {
  const source = INPUT_SOURCES[config.controls.source];
  const board = getBoard(config.wiring.board);
  if (!source.needsPart || !source.needsPart.families.includes(board.family)) return [];
  return [
    {
      severity: 'warning',
      code: 'sbus-needs-inverter',
      pins: [config.wiring.inputPins.rx?.pin].filter((p): p is string => !!p),
      roles: ['input/rx'],
      message: `${source.name}: ${source.needsPart.reason}, so the ${board.shortName} needs ${source.needsPart.part}.`,
      hint: `Fit ${source.needsPart.part} between the receiver and the pin, or use a receiver with an uninverted output.`,
      path: ['controls', 'source'],
    },
  ];
}

export function checkDrivers(config: RobotConfig): Problem[] {
  return [
    ...checkMotorPlacement(config),
    ...config.wiring.drivers.flatMap((d, i) => checkDriver(config, d, i)),
    ...checkStrayRoles(config),
    ...checkInverter(config),
  ];
}
