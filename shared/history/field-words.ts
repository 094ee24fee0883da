import { BOARDS } from '../boards/boards';
import { DRIVER_KINDS } from '../drivers/driver-kinds';
import { INPUT_SOURCES } from '../inputs/input-sources';
import { LAYOUT_LABELS } from '../kinematics/presets';
import type { BoardId, DriveLayoutId, DriverKindId, InputSourceId } from '../schemas/ids';

/**
 * Names of configuration fields in words and how their values read, for the editor's change
 * list, the conflict dialog, table errors and History. Keys are the field names of
 * RobotConfigSchema; an unknown key is spelled out from its camelCase name and its unit read
 * from its ending, so a field added later (or a starter layout's parameter) still reads sensibly.
 */
type Format = (value: unknown) => string;

const num = (value: number) => (Number.isFinite(value) ? String(Math.round(value * 10000) / 10000) : 'not a number');

/**
 * "29 mm", "45°", "80 %": a space between number and unit, none before the degree sign
 * (The International System of Units, SI Brochure 9th ed., "Formatting the value of a
 * quantity"; section from memory).
 */
export function quantityWords(value: number, unit: string): string {
  if (!Number.isFinite(value)) return num(value);
  return unit === '°' ? `${num(value)}°` : `${num(value)} ${unit}`;
}

const unit =
  (suffix: string): Format =>
  (v) =>
    typeof v === 'number' ? quantityWords(v, suffix) : plainWords(v);
const fraction: Format = (v) => (typeof v === 'number' ? quantityWords(v * 100, '%') : plainWords(v));
const onOff: Format = (v) => (v === true ? 'on' : v === false ? 'off' : plainWords(v));
const orNone =
  (none: string, format: Format): Format =>
  (v) =>
    v === null ? none : format(v);
const named =
  (names: Record<string, string>): Format =>
  (v) =>
    typeof v === 'string' ? (names[v] ?? v) : plainWords(v);

/** Any value in words: lists joined by commas, objects as "field value" pairs in words. */
export function plainWords(value: unknown): string {
  if (value === undefined) return 'not set';
  if (value === null) return 'none';
  if (typeof value === 'boolean') return onOff(value);
  if (typeof value === 'number') return num(value);
  if (typeof value === 'string') return value === '' ? 'empty' : value;
  if (Array.isArray(value)) return value.length === 0 ? 'none' : value.map(plainWords).join(', ');
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  return entries.length === 0 ? 'empty' : entries.map(([k, v]) => `${fieldName(k)} ${formatValue(k, v)}`).join(', ');
}

const boardNames = Object.fromEntries(Object.entries(BOARDS).map(([id, b]) => [id, b.name])) as Record<BoardId, string>;
const sourceNames = Object.fromEntries(Object.entries(INPUT_SOURCES).map(([id, s]) => [id, s.name])) as Record<
  InputSourceId,
  string
>;
const kindNames = Object.fromEntries(Object.entries(DRIVER_KINDS).map(([id, k]) => [id, k.name])) as Record<
  DriverKindId,
  string
>;
const layoutNames: Record<DriveLayoutId | 'custom', string> = { ...LAYOUT_LABELS, custom: 'Custom wheel table' };

/** Field key → its name in words and how its values read; values of keys not listed read plainly. */
const FIELDS: Record<string, [string, Format?]> = {
  schemaVersion: ['file format version'],
  name: ['name'],
  // Chassis
  layout: ['drive layout', named(layoutNames)],
  params: ['layout parameters'],
  kind: ['kind', named(kindNames)],
  xMm: ['x (ahead of centre)', unit('mm')],
  yMm: ['y (left of centre)', unit('mm')],
  driveAngleDeg: ['driving direction', unit('°')],
  rollerAngleDeg: ['roller angle', unit('°')],
  radiusMm: ['radius', unit('mm')],
  reversed: ['reversed', onOff],
  maxRpm: ['top speed', unit('rpm')],
  startThreshold: ['start threshold (duty)', fraction],
  stallCurrentA: ['stall current', unit('A')],
  ratedVoltage: ['rated voltage', unit('V')],
  // Controls
  source: ['input source', named(sourceNames)],
  number: ['channel number'],
  low: ['low end'],
  high: ['high end'],
  axes: ['stick map'],
  channel: ['channel', orNone('none', plainWords)],
  reverse: ['reversed', onOff],
  deadband: ['deadband', fraction],
  expo: ['expo', fraction],
  rate: ['rate', fraction],
  rates: ['rates', (v) => (Array.isArray(v) ? v.map(fraction).join(', ') : plainWords(v))],
  armedWhen: ['armed at the', (v) => `${plainWords(v)} end`],
  desaturation: ['over-100 % handling', named({ scale: 'scale all motors down', clip: 'clip each motor' })],
  link: ['2.4 GHz link'],
  rfChannel: ['RF channel'],
  dataRate: ['data rate', named({ '250k': '250 kbit/s', '1M': '1 Mbit/s', '2M': '2 Mbit/s' })],
  sendRateHz: ['send rate', unit('Hz')],
  remoteBoard: ['remote board', named(boardNames)],
  // Wiring
  board: ['board', named(boardNames)],
  statusLed: ['status LED'],
  benchTestPin: ['bench-test pin'],
  pwmFrequencyHz: ['PWM frequency', orNone('board default', unit('Hz'))],
  continuousCurrentA: ['continuous current', orNone('kind default', unit('A'))],
  peakCurrentA: ['peak current', orNone('kind default', unit('A'))],
  pin: ['pin', orNone('unassigned', plainWords)],
  locked: ['locked', onOff],
  // Safety and power
  failsafeTimeoutMs: ['failsafe timeout', unit('ms')],
  rampPerSecond: ['ramp limit', unit('full scale/s')],
  outputLimitPercent: ['output limit', unit('%')],
  armingRequired: ['arming required', onOff],
  reverseDwellMs: ['reverse dwell', unit('ms')],
  startupValidFrames: ['valid frames before start'],
  centreTolerance: ['centre tolerance', fraction],
  chemistry: ['battery chemistry'],
  cells: ['cells in series'],
  capacityMah: ['capacity', unit('mAh')],
  dischargeC: ['discharge rating', unit('C')],
  // Firmware
  sketchName: ['sketch name', orNone('from the robot name', plainWords)],
  serialDiagnostics: ['serial diagnostics', onOff],
  serialBaud: ['serial speed', unit('baud')],
  diagnosticsIntervalMs: ['diagnostics interval', unit('ms')],
  benchTestDuty: ['bench-test duty', fraction],
  benchTestMs: ['bench-test time per motor', unit('ms')],
};

/** "pwmFrequencyHz" → "pwm frequency hz", for keys without a listed name. */
function spellKey(key: string): string {
  return key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[-_]/g, ' ')
    .toLowerCase();
}

// Units read from a key's ending, for keys not in the table (a starter layout's parameters).
const UNIT_SUFFIXES: [RegExp, string][] = [
  [/Mm$/, 'mm'],
  [/Deg$/, '°'],
  [/Ms$/, 'ms'],
  [/Hz$/, 'Hz'],
  [/Rpm$/, 'rpm'],
];

/** A field's name in words and how its values read. */
function wordsFor(key: string): [string, Format] {
  const listed = FIELDS[key];
  if (listed) return [listed[0], listed[1] ?? plainWords];
  const suffix = UNIT_SUFFIXES.find(([pattern]) => pattern.test(key));
  if (suffix) return [spellKey(key.replace(suffix[0], '')), unit(suffix[1])];
  return [spellKey(key), plainWords];
}

/** "failsafeTimeoutMs" → "failsafe timeout"; "wheelbaseMm" → "wheelbase". */
export function fieldName(key: string): string {
  return wordsFor(key)[0];
}

/** A field's value in words: "250 ms", "on", "Arduino Mega 2560", "unassigned". */
export function formatValue(key: string, value: unknown): string {
  if (value === undefined) return 'not set';
  return wordsFor(key)[1](value);
}
