import type { RobotConfig } from '@shared/schemas/robot-config';
import { cString } from '../c-text';
import { FIRMWARE_GENERATOR_VERSION } from '../generator-version';
import { computeMixing } from '@shared/kinematics/mixing';
import { getBoard } from '@shared/boards/boards';
import { checkPinPlan } from '@shared/pins/check-pins';
import type { BoardProfile } from '@shared/boards/board-types';
import { configHash } from './config-hash';
import { buildControlsModel, type ControlsModel } from './controls-model';
import { IssueList } from './firmware-config-error';
import { buildInputModel, type InputModel } from './input-model';
import { buildOutputModel, type MotorModel } from './output-model';
import { PinRegistry, type PinEntry } from './pin-registry';
import { buildPwmModel, buildServoModel, type PwmModel, type ServoModel } from './pwm-model';
import { q14 } from './fixed-point';

/** How often the control step runs; the ramp step is computed for it. */
export const CONTROL_PERIOD_MS = 10;

export const CORE_NAMES: Record<BoardProfile['family'], string> = {
  avr: 'Arduino AVR Boards (arduino:avr)',
  esp32: 'Arduino ESP32 core 3.x by Espressif (esp32:esp32)',
  rp2040: 'Arduino-Pico RP2040 core (rp2040:rp2040)',
};

export interface FirmwareModel extends ControlsModel {
  meta: { generatorVersion: string; revision: number; hash: string };
  robot: { nameLiteral: string; name: string };
  board: {
    id: string;
    name: string;
    family: string;
    core: string;
    isAvr: boolean;
    isEsp32: boolean;
    isRp2040: boolean;
    fqbn: string;
  };
  input: InputModel;
  motors: MotorModel[];
  driverHeaders: string[];
  outputSetup: string[];
  pins: PinEntry[];
  pwm: PwmModel;
  servo: ServoModel;
  serial: { baud: number; diagnostics: boolean; intervalMs: number; commands: boolean; sharedWithInput: boolean };
  safety: {
    failsafeMs: number;
    startupFrames: number;
    reverseDwellMs: number;
    rampStepQ: number;
    outputLimitQ: number;
    centreToleranceQ: number;
    desaturateScale: boolean;
  };
  control: { periodMs: number };
  bench: { dutyQ: number; ms: number; pinPresent: boolean };
  led: { present: boolean };
  notes: string[];
}

function optionalPins(config: RobotConfig, pins: PinRegistry) {
  const led = pins.use(
    config.wiring.statusLed.pin,
    ['wiring', 'statusLed', 'pin'],
    'MW_PIN_STATUS_LED',
    'status LED (with a resistor)',
    'status LED',
    false,
  );
  const bench = pins.use(
    config.wiring.benchTestPin.pin,
    ['wiring', 'benchTestPin', 'pin'],
    'MW_PIN_BENCH_TEST',
    'bench-test switch to ground',
    'bench-test switch',
    false,
  );
  return { led: led !== null, bench: bench !== null };
}

/**
 * Everything the templates need, computed and checked here: every number is already in the
 * fixed-point form the C code uses, every user string is an escaped literal or a sanitized
 * identifier. Throws FirmwareConfigError listing every field that stops generation.
 */
export function buildFirmwareModel(config: RobotConfig, revision: number): FirmwareModel {
  const issues = new IssueList();
  // The pin plan's errors first (two roles on one pin, timer and bus clashes …): firmware for a
  // plan that cannot work is not generated. Its warnings are for the wiring screen.
  for (const problem of checkPinPlan(config))
    if (problem.severity === 'error') issues.add(problem.path, problem.message);
  const board = getBoard(config.wiring.board);
  const pins = new PinRegistry(board, issues);
  const input = buildInputModel(config, pins, issues);
  const controls = buildControlsModel(config, input, issues);
  const mixing = computeMixing(config);
  const outputs = buildOutputModel(config, mixing.matrix, pins, issues);
  const pwm = buildPwmModel(config, board, outputs.wiring);
  const servo = buildServoModel(board, outputs.servoPinMacros, issues);
  const optional = optionalPins(config, pins);
  issues.throwIfAny();
  const shared = input.uart?.usb === true;
  const { safety, firmware } = config;
  return {
    ...controls,
    meta: { generatorVersion: FIRMWARE_GENERATOR_VERSION, revision, hash: configHash(config) },
    robot: { nameLiteral: cString(config.name), name: config.name },
    board: {
      id: board.id,
      name: board.name,
      family: board.family,
      core: CORE_NAMES[board.family],
      isAvr: board.family === 'avr',
      isEsp32: board.family === 'esp32',
      isRp2040: board.family === 'rp2040',
      fqbn: board.fqbn,
    },
    input,
    motors: outputs.motors,
    driverHeaders: outputs.driverHeaders,
    outputSetup: outputs.outputSetup,
    pins: pins.entries,
    pwm,
    servo,
    serial: {
      // A receiver on the USB serial port sets the port's speed; commands would collide with its frames.
      baud: shared ? input.uart!.baud : firmware.serialBaud,
      diagnostics: firmware.serialDiagnostics,
      intervalMs: firmware.diagnosticsIntervalMs,
      commands: !shared,
      sharedWithInput: shared,
    },
    safety: {
      failsafeMs: safety.failsafeTimeoutMs,
      startupFrames: safety.startupValidFrames,
      reverseDwellMs: safety.reverseDwellMs,
      rampStepQ: Math.max(1, q14(Math.min(1, (safety.rampPerSecond * CONTROL_PERIOD_MS) / 1000))),
      outputLimitQ: q14(safety.outputLimitPercent / 100),
      centreToleranceQ: q14(safety.centreTolerance),
      desaturateScale: config.controls.desaturation === 'scale',
    },
    control: { periodMs: CONTROL_PERIOD_MS },
    bench: { dutyQ: q14(firmware.benchTestDuty), ms: firmware.benchTestMs, pinPresent: optional.bench },
    led: { present: optional.led },
    notes: [...pwm.notes, ...(input.uart ? [input.uart.note] : [])],
  };
}
