import { findPin, getBoard } from '@shared/boards/boards';
import type { BoardProfile } from '@shared/boards/board-types';
import { formatHz, pwmSettingForPin } from '@shared/boards/pwm-timing';
import { CHANNEL_PREFIXES, DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import { INPUT_SOURCES } from '@shared/inputs/input-sources';
import { collectDemands, type PinDemand } from '@shared/pins/pin-demands';
import { planContexts } from '@shared/pins/plan-context';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { assignmentOf } from './pin-records';
import { pwmWords } from './pin-words';

// The wiring sheet's tables, built from a configuration alone: what goes where, in the words
// and pin labels a builder reads off the board.

export interface PinRef {
  /** Mixwright's pin id ('D9'), or null for "no pin". */
  id: string | null;
  /** As printed on the board ('~9'); equals id when the board prints the id. */
  label: string | null;
  /** What the firmware writes ('9'). */
  code: string | null;
  /** The id is not a pin of the board. */
  unknown: boolean;
}

export function pinRef(board: BoardProfile, id: string | null): PinRef {
  if (id === null) return { id: null, label: null, code: null, unknown: false };
  const pin = findPin(board, id);
  return pin
    ? { id, label: pin.label, code: pin.code, unknown: false }
    : { id, label: null, code: null, unknown: true };
}

export interface SheetPinRow {
  pin: PinRef;
  /** Every role on this pin ("Driver 1 A PWM"). */
  roles: string[];
  /** What the pin does for them: "PWM, timer 1 A", "input with pull-up". */
  note: string;
}

const NEED_NOTES: Record<PinDemand['need'], string> = {
  pwm: 'PWM',
  'digital-out': 'digital out',
  'servo-pulse': 'servo pulses, 50 Hz',
  interrupt: 'input, interrupt',
  'external-interrupt': 'input, ext. interrupt',
  'uart-rx': 'serial receive',
  'analog-in': 'analog in',
  'switch-in': 'switch to ground, pull-up',
  led: 'LED output',
};

function noteFor(board: BoardProfile, demand: PinDemand): string {
  const pin = demand.pin ? findPin(board, demand.pin) : undefined;
  const words = pin && (demand.need === 'pwm' || demand.need === 'servo-pulse') ? pwmWords(board, pin) : null;
  return words ? `${NEED_NOTES[demand.need]}, ${words}` : NEED_NOTES[demand.need];
}

/** One row per used pin of one board side, in the board's pin order. */
export function sheetPinRows(config: RobotConfig, side: PinDemand['side'] = 'robot'): SheetPinRow[] {
  const board = getBoard(side === 'robot' ? config.wiring.board : config.controls.link.remoteBoard);
  const demands = collectDemands(config).filter((d) => d.side === side && d.pin !== null);
  const order = new Map(board.pins.map((p, i) => [p.id, i]));
  const byPin = new Map<string, PinDemand[]>();
  for (const d of demands) byPin.set(d.pin!, [...(byPin.get(d.pin!) ?? []), d]);
  return [...byPin.entries()]
    .sort(([a], [b]) => (order.get(a) ?? 1e6) - (order.get(b) ?? 1e6) || a.localeCompare(b))
    .map(([id, list]) => ({
      pin: pinRef(board, id),
      roles: list.map((d) => capitalizeFirst(d.label)),
      note: [...new Set(list.map((d) => noteFor(board, d)))].join('; '),
    }));
}

export interface SheetDriverRole {
  channel: 'A' | 'B' | null;
  motor: string | null;
  role: string;
  pin: PinRef;
  optional: boolean;
}

export interface SheetDriver {
  name: string;
  kind: string;
  motors: { channel: 'A' | 'B'; motor: string }[];
  roles: SheetDriverRole[];
  stop: string;
  pwm: string;
  ratings: string;
}

function pwmLine(config: RobotConfig, driverIndex: number): string {
  const driver = config.wiring.drivers[driverIndex];
  const kind = DRIVER_KINDS[driver.kind];
  if (kind.maxPwmHz === null) return 'servo pulses at 50 Hz';
  const board = getBoard(config.wiring.board);
  const first = driverPinRoles(driver.kind, driver.motors.length).find((r) => r.need === 'pwm');
  const pinId = first ? assignmentOf(config, { owner: 'driver', driverIndex, roleId: first.id }).pin : null;
  const pin = pinId ? findPin(board, pinId) : undefined;
  const setting = pin ? pwmSettingForPin(board, pin, driver.pwmFrequencyHz, kind.maxPwmHz) : null;
  const asked = driver.pwmFrequencyHz === null ? 'board default' : `${formatHz(driver.pwmFrequencyHz)} set`;
  return setting ? `${asked}, runs at ${formatHz(setting.actualHz)}` : asked;
}

function ratingsLine(config: RobotConfig, driverIndex: number): string {
  const driver = config.wiring.drivers[driverIndex];
  const ratings = DRIVER_KINDS[driver.kind].ratings;
  const cont = driver.continuousCurrentA ?? ratings.continuousA;
  const peak = driver.peakCurrentA ?? ratings.peakA;
  if (cont === null && peak === null) return 'as on the module’s label';
  const volts = ratings.motorVolts ? `, motors ${ratings.motorVolts.min}–${ratings.motorVolts.max} V` : '';
  return `${cont ?? '?'} A continuous, ${peak ?? '?'} A peak${volts}`;
}

/** One entry per driver: its channels' motors and every role with its pin. */
export function sheetDrivers(config: RobotConfig): SheetDriver[] {
  const board = getBoard(config.wiring.board);
  return config.wiring.drivers.map((driver, driverIndex) => {
    const kind = DRIVER_KINDS[driver.kind];
    const channelOf = (roleId: string) => {
      const prefix = roleId.split('.')[0];
      const slot = CHANNEL_PREFIXES.indexOf(prefix as 'a' | 'b');
      return slot < 0 || !roleId.includes('.') ? null : slot;
    };
    const roles = driverPinRoles(driver.kind, driver.motors.length).map((role): SheetDriverRole => {
      const slot = channelOf(role.id);
      return {
        channel: slot === null ? null : slot === 0 ? 'A' : 'B',
        motor: slot === null ? null : (driver.motors[slot] ?? null),
        role: slot === null ? role.label : role.label.slice(2),
        pin: pinRef(board, assignmentOf(config, { owner: 'driver', driverIndex, roleId: role.id }).pin),
        optional: role.optional,
      };
    });
    const stopWay = kind.stopModes[driver.stopMode];
    return {
      name: driver.name,
      kind: kind.name,
      motors: driver.motors.map((motor, i) => ({ channel: i === 0 ? 'A' : 'B', motor })),
      roles,
      stop: `${driver.stopMode}${stopWay ? '' : ' (not possible with this kind)'}`,
      pwm: pwmLine(config, driverIndex),
      ratings: ratingsLine(config, driverIndex),
    };
  });
}

export interface SheetInput {
  source: string;
  /** The board these pins are on (short name). */
  board: string;
  /** Line settings and parts, as sentences. */
  notes: string[];
  rows: { role: string; pin: PinRef }[];
}

/** The receiver's or transceiver's wiring, with the SPI bus when the transceiver uses it. */
export function sheetInput(config: RobotConfig, side: PinDemand['side'] = 'robot'): SheetInput {
  const source = INPUT_SOURCES[config.controls.source];
  const board = getBoard(side === 'robot' ? config.wiring.board : config.controls.link.remoteBoard);
  const owner = side === 'robot' ? 'input' : 'remote';
  const rows = collectDemands(config)
    .filter((d) => d.owner === owner)
    .map((d) => ({
      role: capitalizeFirst(side === 'remote' ? d.label.replace(/^remote /, '') : d.label),
      pin: pinRef(board, d.pin),
    }));
  const ctx = planContexts(config).find((c) => c.side === side);
  if (ctx?.spiInUse) {
    for (const line of ['sck', 'mosi', 'miso'] as const)
      rows.push({ role: `Transceiver ${line.toUpperCase()} (SPI bus)`, pin: pinRef(board, board.spi[line]) });
  }
  const notes: string[] = [];
  if (source.serial)
    notes.push(`${source.serial.baud} baud, ${source.serial.format}${source.serial.inverted ? ', inverted' : ''}.`);
  if (source.needsPart?.families.includes(board.family) && side === 'robot')
    notes.push(`Fit ${source.needsPart.part}: ${source.needsPart.reason}.`);
  return { source: source.name, board: board.shortName, notes, rows };
}

/** The status LED and the bench-test switch. */
export function sheetExtras(config: RobotConfig): { role: string; pin: PinRef; note: string }[] {
  const board = getBoard(config.wiring.board);
  return [
    { role: 'Status LED', pin: pinRef(board, config.wiring.statusLed.pin), note: 'LED and series resistor to ground' },
    {
      role: 'Bench-test switch',
      pin: pinRef(board, config.wiring.benchTestPin.pin),
      note: 'switch to ground, held at power-up',
    },
  ];
}

function capitalizeFirst(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
