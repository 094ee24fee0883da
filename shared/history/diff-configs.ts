import { fieldWords } from './field-words';
import { deepEqual, isPlainObject, type FieldPath } from './field-path';

/** One field that differs between two configurations, in words and as values. */
export interface ConfigChange {
  /** Where it is, e.g. ['chassis', 'wheels', 0, 'xMm']; a whole list when its length changed. */
  path: FieldPath;
  /** "Chassis › wheel “Front left” › radius". */
  label: string;
  kind: 'changed' | 'added' | 'removed';
  before: unknown;
  after: unknown;
  /** Unit of the values, when they have one ("mm", "°", "A"). */
  unit?: string;
  /** The values in words with units: "29 mm", "yes", "not set". */
  beforeWords: string;
  afterWords: string;
}

/**
 * Every field that differs from `a` (before) to `b` (after), in document order. Objects are
 * compared key by key; lists of parts (wheels, motors, channels, drivers) item by item while
 * their length stays the same, otherwise as one change of the whole list; lists of plain values
 * (rates) as one value. Works on any JSON-like value, not only a whole configuration.
 */
export function diffConfigs(a: unknown, b: unknown): ConfigChange[] {
  const out: ConfigChange[] = [];
  walk(a, b, { path: [], labels: [], unit: undefined }, out);
  return out;
}

interface Place {
  path: FieldPath;
  labels: string[];
  unit: string | undefined;
}

function walk(a: unknown, b: unknown, place: Place, out: ConfigChange[]): void {
  if (deepEqual(a, b)) return;
  const objectLike = (v: unknown) => isPlainObject(v) || v === undefined;
  if (objectLike(a) && objectLike(b) && (isPlainObject(a) || isPlainObject(b))) {
    const left = (a ?? {}) as Record<string, unknown>;
    const right = (b ?? {}) as Record<string, unknown>;
    const keys = [...Object.keys(left), ...Object.keys(right).filter((k) => !(k in left))];
    for (const key of keys) {
      const words = fieldWords(key);
      const label = place.path.length === 0 && key === 'name' ? 'Robot name' : words.label;
      walk(left[key], right[key], { path: [...place.path, key], labels: [...place.labels, label], unit: words.unit }, out);
    }
    return;
  }
  if (Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every(isPlainObject) && b.every(isPlainObject)) {
    const listKey = String(place.path[place.path.length - 1] ?? '');
    a.forEach((item, index) => {
      const itemLabel = itemWords(listKey, item as Record<string, unknown>, index);
      walk(item, b[index], { path: [...place.path, index], labels: [...place.labels.slice(0, -1), itemLabel], unit: undefined }, out);
    });
    return;
  }
  out.push({
    path: place.path,
    label: joinLabels(place.labels),
    kind: a === undefined ? 'added' : b === undefined ? 'removed' : 'changed',
    before: a,
    after: b,
    ...(place.unit ? { unit: place.unit } : {}),
    beforeWords: valueWords(a, place.unit),
    afterWords: valueWords(b, place.unit),
  });
}

const SINGULAR: Record<string, string> = { wheels: 'wheel', motors: 'motor', drivers: 'driver', channels: 'channel' };

/** "wheel “Front left”", "channel 2", or "item 3" for a list item. */
function itemWords(listKey: string, item: Record<string, unknown>, index: number): string {
  const noun = SINGULAR[listKey] ?? `${fieldWords(listKey).label} item`;
  if (listKey === 'channels' && typeof item.number === 'number') return `channel ${item.number}`;
  if (typeof item.name === 'string') return `${noun} “${item.name}”`;
  return `${noun} ${index + 1}`;
}

function joinLabels(labels: string[]): string {
  if (labels.length === 0) return 'Whole configuration';
  const [first, ...rest] = labels;
  return [first.charAt(0).toUpperCase() + first.slice(1), ...rest].join(' › ');
}

function numberWords(n: number, unit: string | undefined): string {
  if (!Number.isFinite(n)) return 'not a number';
  const text = String(Math.round(n * 10000) / 10000);
  if (!unit) return text;
  return unit === '°' || unit === '%' ? `${text}${unit}` : `${text} ${unit}`;
}

/** A value in words: numbers with their unit, yes/no, "none" for null, names for lists of parts. */
export function valueWords(value: unknown, unit?: string): string {
  if (value === undefined) return 'not set';
  if (value === null) return 'none';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') return numberWords(value, unit);
  if (typeof value === 'string') return value === '' ? 'empty' : value;
  if (Array.isArray(value)) {
    if (value.length === 0) return 'none';
    if (value.every(isPlainObject)) {
      const names = value.map((item, i) => {
        const number = typeof item.number === 'number' ? item.number : null;
        if (typeof item.name === 'string') return number === null ? item.name : `${item.name} (${number})`;
        return number === null ? `item ${i + 1}` : `channel ${number}`;
      });
      return `${value.length}: ${names.join(', ')}`;
    }
    return value.map((v) => valueWords(v, unit)).join(', ');
  }
  if (isPlainObject(value)) {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined);
    return entries.length === 0 ? 'empty' : entries.map(([k, v]) => `${fieldWords(k).label} ${valueWords(v, fieldWords(k).unit)}`).join('; ');
  }
  return String(value);
}
