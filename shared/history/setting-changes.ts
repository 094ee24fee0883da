import { driverPinRoles } from '../drivers/driver-kinds';
import { inputPinRoles, remotePinRoles } from '../inputs/input-sources';
import type { RobotConfig } from '../schemas/robot-config';
import { fieldName, formatValue, plainWords } from './field-words';
import { fieldChanges, isPlainObject, type FieldPath } from './field-path';

export type SettingSection = 'Robot' | 'Chassis' | 'Motors' | 'Controls' | 'Wiring' | 'Safety' | 'Power' | 'Firmware';

/** One setting that differs between two configurations, in words. */
export interface SettingChange {
  /** Path in the configuration, e.g. ['chassis', 'wheels', 0, 'reversed']. */
  path: FieldPath;
  section: SettingSection;
  /** What the setting belongs to: "Front left wheel", "Forward axis", "Safety". */
  subject: string;
  /** The setting's name, empty when a whole item was added or removed. */
  field: string;
  kind: 'changed' | 'added' | 'removed';
  /** The old and new values in words (null on the side where the item does not exist). */
  from: string | null;
  to: string | null;
  /** The whole change as one sentence: "Front left wheel: reversed off → on". */
  text: string;
}

interface Located {
  section: SettingSection;
  subject: string;
  /** The key whose name and format apply, and any words before it ("A PWM pin"). */
  key: string | null;
  prefix?: string;
}

/** "Front left" → "Front left wheel"; a name already saying what it is stays as it is. */
function itemLabel(name: unknown, noun: string, index: number, alsoMeans: string[] = []): string {
  if (typeof name !== 'string' || name === '') return `${noun[0].toUpperCase()}${noun.slice(1)} ${index + 1}`;
  const lower = name.toLowerCase();
  return [noun, ...alsoMeans].some((word) => lower.includes(word)) ? name : `${name} ${noun}`;
}

type Side = Partial<RobotConfig> & Record<string, any>;

const side = (value: unknown): Side => (isPlainObject(value) ? value : {});

function pick<T>(a: Side, b: Side, get: (c: Side) => T | undefined): T | undefined {
  return get(b) ?? get(a);
}

function roleLabel(roles: { id: string; label: string }[], id: string): string {
  return roles.find((r) => r.id === id)?.label ?? id;
}

const pinKey = (rest: FieldPath): Pick<Located, 'key' | 'prefix'> => ({
  key: rest.length ? String(rest[rest.length - 1]) : null,
});

function locateWiring(path: FieldPath, a: Side, b: Side): Located {
  const [, part, index, sub, role, ...rest] = path;
  if (part === 'drivers' && typeof index === 'number') {
    const driver = pick(a, b, (c) => c.wiring?.drivers?.[index]);
    const subject = itemLabel(driver?.name, 'driver', index, ['bridge', 'esc']);
    if (sub === 'pins' && role !== undefined && driver) {
      const label = roleLabel(driverPinRoles(driver.kind, driver.motors.length), String(role));
      return { section: 'Wiring', subject, ...pinKey(rest), prefix: `${label} pin` };
    }
    return { section: 'Wiring', subject, key: sub === undefined ? null : String(sub) };
  }
  if (part === 'inputPins' && index !== undefined) {
    const source = pick(a, b, (c) => c.controls);
    const roles = source
      ? inputPinRoles(
          source.source,
          source.channels.map((ch: { number: number }) => ch.number),
        )
      : [];
    return {
      section: 'Wiring',
      subject: 'Input',
      ...pinKey([sub, role, ...rest].filter((x) => x !== undefined) as FieldPath),
      prefix: `${roleLabel(roles, String(index))} pin`,
    };
  }
  if (part === 'statusLed' || part === 'benchTestPin') {
    const subject = part === 'statusLed' ? 'Status LED' : 'Bench test switch';
    return { section: 'Wiring', subject, key: index === undefined ? null : String(index) };
  }
  return { section: 'Wiring', subject: 'Wiring', key: part === undefined ? null : String(part) };
}

function locateControls(path: FieldPath, a: Side, b: Side): Located {
  const [, part, index, key, ...rest] = path;
  if (part === 'channels' && typeof index === 'number') {
    const channel = pick(a, b, (c) => c.controls?.channels?.[index]);
    const subject = channel ? `Channel ${channel.number} (${channel.name})` : `Channel row ${index + 1}`;
    return { section: 'Controls', subject, key: key === undefined ? null : String(key) };
  }
  if (part === 'axes' && index !== undefined) {
    const axis = String(index);
    return {
      section: 'Controls',
      subject: `${axis[0].toUpperCase()}${axis.slice(1)} axis`,
      key: key === undefined ? null : String(key),
    };
  }
  if (part === 'rateSwitch' || part === 'armingSwitch') {
    return {
      section: 'Controls',
      subject: part === 'rateSwitch' ? 'Rate switch' : 'Arming switch',
      key: index === undefined ? null : String(index),
    };
  }
  if (part === 'link') {
    if (index === 'remotePins' && key !== undefined) {
      const controls = pick(a, b, (c) => c.controls);
      const label = controls ? roleLabel(remotePinRoles(controls), String(key)) : String(key);
      return { section: 'Controls', subject: 'Remote', ...pinKey(rest), prefix: `${label} pin` };
    }
    return { section: 'Controls', subject: 'Radio link', key: index === undefined ? null : String(index) };
  }
  return { section: 'Controls', subject: 'Controls', key: part === undefined ? null : String(part) };
}

function locate(path: FieldPath, a: Side, b: Side): Located {
  const [top, part, index, key] = path;
  switch (top) {
    case 'chassis': {
      if (part === 'wheels' && typeof index === 'number') {
        const wheel = pick(a, b, (c) => c.chassis?.wheels?.[index]);
        return {
          section: 'Chassis',
          subject: itemLabel(wheel?.name, 'wheel', index, ['track']),
          key: key === undefined ? null : String(key),
        };
      }
      if (part === 'params')
        return {
          section: 'Chassis',
          subject: 'Chassis',
          key: index === undefined ? 'params' : String(index),
          prefix: 'layout',
        };
      return { section: 'Chassis', subject: 'Chassis', key: part === undefined ? null : String(part) };
    }
    case 'motors': {
      const motor = typeof part === 'number' ? pick(a, b, (c) => c.motors?.[part]) : undefined;
      const subject = typeof part === 'number' ? itemLabel(motor?.name, 'motor', part) : 'Motors';
      return { section: 'Motors', subject, key: index === undefined ? null : String(index) };
    }
    case 'controls':
      return locateControls(path, a, b);
    case 'wiring':
      return locateWiring(path, a, b);
    case 'safety':
    case 'power':
    case 'firmware': {
      const section = (top[0].toUpperCase() + top.slice(1)) as SettingSection;
      return { section, subject: section, key: part === undefined ? null : String(part) };
    }
    default:
      // The robot's own fields (name), or a path of some other JSON value: named by its last key.
      return { section: 'Robot', subject: 'Robot', key: top === undefined ? null : String(path[path.length - 1]) };
  }
}

function sentence(change: Omit<SettingChange, 'text' | 'path' | 'section'>): string {
  if (change.field === '') return `${change.subject} ${change.kind}`;
  if (change.kind === 'added') return `${change.subject}: ${change.field} added${change.to ? ` (${change.to})` : ''}`;
  if (change.kind === 'removed')
    return `${change.subject}: ${change.field} removed${change.from ? ` (was ${change.from})` : ''}`;
  return `${change.subject}: ${change.field} ${change.from} → ${change.to}`;
}

/** A setting's name in words: what it belongs to, and the field ("A PWM pin", "" for a whole item). */
function placeWords(path: FieldPath, a: Side, b: Side): Located & { field: string } {
  const where = locate(path, a, b);
  // A pin's own field reads as the role's pin ("A PWM pin"), not "A PWM pin pin".
  const keyName =
    where.key === null || (where.prefix?.endsWith(' pin') && where.key === 'pin') ? '' : fieldName(where.key);
  return { ...where, field: [where.prefix, keyName].filter(Boolean).join(' ') };
}

function valueIn(where: Located, value: unknown): string | null {
  if (value === undefined) return null;
  return where.key === null ? plainItem(value) : formatValue(where.key, value);
}

/** An added or removed item reads as its name (and kind) rather than every field. */
function plainItem(value: unknown): string {
  if (value && typeof value === 'object' && !Array.isArray(value)) {
    const item = value as Record<string, unknown>;
    if ('pin' in item) return `${formatValue('pin', item.pin)}${item.locked ? ', locked' : ''}`;
    if (typeof item.name === 'string') return item.name;
  }
  return plainWords(value);
}

/**
 * The value at `path` in words, as it reads in a change between `from` and `to` (null where
 * absent): the conflict dialog shows the base revision's value this way.
 */
export function settingValueWords(path: FieldPath, value: unknown, from: unknown, to: unknown): string | null {
  return valueIn(locate(path, side(from), side(to)), value);
}

/**
 * Every setting that differs from `from` to `to`, in configuration order, each with a sentence
 * a builder reads at a glance: "Front left wheel: reversed off → on", "Safety: failsafe
 * timeout 250 ms → 150 ms", "Front driver: A PWM pin D5 → D6". Works on any JSON-like value.
 */
export function settingChanges(from: unknown, to: unknown): SettingChange[] {
  return fieldChanges(from, to).map(({ path, before, after }) => {
    const where = placeWords(path, side(from), side(to));
    const kind = before === undefined ? 'added' : after === undefined ? 'removed' : 'changed';
    const change = {
      subject: where.subject,
      field: where.field,
      kind,
      from: valueIn(where, before),
      to: valueIn(where, after),
    } as const;
    return { path, section: where.section, ...change, text: sentence(change) };
  });
}

/** A change's place on one line, for lists without section headings: "Chassis › Front left wheel › reversed". */
export function changeLabel(change: Pick<SettingChange, 'section' | 'subject' | 'field'>): string {
  return [change.section === change.subject ? null : change.section, change.subject, change.field]
    .filter(Boolean)
    .join(' › ');
}
