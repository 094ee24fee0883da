import { BOARDS } from '../boards/boards';
import { DRIVER_KINDS } from '../drivers/driver-kinds';
import { INPUT_SOURCES } from '../inputs/input-sources';
import { LAYOUT_LABELS } from '../kinematics/presets';
import type { BoardId, DriveLayoutId, DriverKindId, InputSourceId } from '../schemas/ids';

type Format = (value: unknown) => string;

const num = (value: number) => String(Math.round(value * 10000) / 10000);

const unit =
  (suffix: string): Format =>
  (v) =>
    typeof v === 'number' ? `${num(v)} ${suffix}` : plain(v);
const fraction: Format = (v) => (typeof v === 'number' ? `${num(v * 100)} %` : plain(v));
const onOff: Format = (v) => (v === true ? 'on' : v === false ? 'off' : plain(v));
const orNone =
  (none: string, format: Format): Format =>
  (v) =>
    v === null ? none : format(v);
const named =
  (names: Record<string, string>): Format =>
  (v) =>
    typeof v === 'string' ? (names[v] ?? v) : plain(v);

/** Any value in words: lists joined by commas, objects as `key value` pairs. */
export function plain(value: unknown): string {
  if (value === null) return 'none';
  if (value === undefined) return '—';
  if (typeof value === 'boolean') return onOff(value);
  if (typeof value === 'number') return num(value);
  if (typeof value === 'string') return value === '' ? '(empty)' : value;
  if (Array.isArray(value)) return value.length === 0 ? '(none)' : value.map(plain).join(', ');
  const entries = Object.entries(value as Record<string, unknown>);
  return entries.length === 0 ? '(none)' : entries.map(([k, v]) => `${k} ${plain(v)}`).join(', ');
}

const boardNames = Object.fromEntries(Object.entries(BOARDS).map(([id, b]) => [id, b.name])) as Record<BoardId, string>;
const sourceNames = Object.fromEntries(Object.entries(INPUT_SOURCES).map(([id, s]) => [id, s.name])) as Record<InputSourceId, string>;
const kindNames = Object.fromEntries(Object.entries(DRIVER_KINDS).map(([id, k]) => [id, k.name])) as Record<DriverKindId, string>;
const layoutNames: Record<DriveLayoutId | 'custom', string> = { ...LAYOUT_LABELS, custom: 'Custom wheel table' };

/** Field key → its name in words and how its values read. Keys not listed fall back to words. */
const FIELDS: Record<string, [string, Format]> = {
  name: ['name', plain],
  layout: ['drive layout', named(layoutNames)],
  kind: ['kind', named(kindNames)],
  xMm: ['x position', unit('mm')],
  yMm: ['y position', unit('mm')],
  driveAngleDeg: ['driving direction', unit('°')],
  rollerAngleDeg: ['roller angle', unit('°')],
  radiusMm: ['radius', unit('mm')],
  motor: ['motor', plain],
  reversed: ['reversed', onOff],
  maxRpm: ['top speed', unit('rpm')],
  startThreshold: ['start threshold', fraction],
  stallCurrentA: ['stall current', unit('A')],
  ratedVoltage: ['rated voltage', unit('V')],
  source: ['input source', named(sourceNames)],
  number: ['channel number', plain],
  low: ['low end', plain],
  centre: ['centre', plain],
  high: ['high end', plain],
  channel: ['channel', orNone('none', plain)],
  reverse: ['reversed', onOff],
  deadband: ['deadband', fraction],
  expo: ['expo', fraction],
  rate: ['rate', fraction],
  rates: ['rates', (v) => (Array.isArray(v) ? v.map(fraction).join(', ') : plain(v))],
  armedWhen: ['armed at the', (v) => `${plain(v)} end`],
  desaturation: ['over 100 %', named({ scale: 'scale all motors down', clip: 'clip each motor' })],
  rfChannel: ['RF channel', plain],
  dataRate: ['data rate', named({ '250k': '250 kbit/s', '1M': '1 Mbit/s', '2M': '2 Mbit/s' })],
  address: ['address', plain],
  sendRateHz: ['send rate', unit('Hz')],
  remoteBoard: ['remote board', named(boardNames)],
  board: ['board', named(boardNames)],
  motors: ['motors', plain],
  pwmFrequencyHz: ['PWM frequency', orNone('board default', unit('Hz'))],
  stopMode: ['stop mode', plain],
  continuousCurrentA: ['continuous current', orNone('kind default', unit('A'))],
  peakCurrentA: ['peak current', orNone('kind default', unit('A'))],
  pin: ['pin', orNone('unassigned', plain)],
  locked: ['locked', onOff],
  failsafeTimeoutMs: ['failsafe timeout', unit('ms')],
  rampPerSecond: ['ramp limit', unit('full scale/s')],
  outputLimitPercent: ['output limit', unit('%')],
  armingRequired: ['arming required', onOff],
  reverseDwellMs: ['reverse dwell', unit('ms')],
  startupValidFrames: ['valid frames before start', plain],
  centreTolerance: ['centre tolerance', fraction],
  chemistry: ['battery chemistry', plain],
  cells: ['cells', plain],
  capacityMah: ['capacity', unit('mAh')],
  dischargeC: ['discharge rating', unit('C')],
  logicSupply: ['logic supply', plain],
  sketchName: ['sketch name', orNone('from the robot name', plain)],
  serialDiagnostics: ['serial diagnostics', onOff],
  serialBaud: ['serial speed', unit('baud')],
  diagnosticsIntervalMs: ['diagnostics interval', unit('ms')],
  benchTestDuty: ['bench test duty', fraction],
  benchTestMs: ['bench test time', unit('ms')],
};

/** "failsafeTimeoutMs" → "failsafe timeout ms", for keys without a listed name. */
function keyWords(key: string): string {
  return key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
}

export function fieldName(key: string): string {
  return FIELDS[key]?.[0] ?? keyWords(key);
}

export function formatValue(key: string, value: unknown): string {
  if (value === undefined) return '—';
  return (FIELDS[key]?.[1] ?? plain)(value);
}
