export type JsonPath = (string | number)[];

/** One difference between two JSON values; `undefined` means absent on that side. */
export interface JsonChange {
  path: JsonPath;
  from: unknown;
  to: unknown;
}

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

const isPrimitive = (value: unknown) => value === null || typeof value !== 'object';

export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => jsonEqual(v, b[i]));
  if (isPlainObject(a) && isPlainObject(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].every((k) => jsonEqual(a[k], b[k]));
  }
  return false;
}

function objectChanges(a: Record<string, unknown>, b: Record<string, unknown>, path: JsonPath): JsonChange[] {
  const keys = [...Object.keys(a), ...Object.keys(b).filter((k) => !(k in a))];
  return keys.flatMap((key) => {
    if (!(key in b) || !(key in a)) return jsonEqual(a[key], b[key]) ? [] : [{ path: [...path, key], from: a[key], to: b[key] }];
    return jsonChanges(a[key], b[key], [...path, key]);
  });
}

/**
 * The differences between two JSON values, as leaf paths. Objects are compared key by key;
 * lists of objects (wheels, motors, channels, drivers) item by item, an item present on one
 * side only being one change; a list of plain values (rates, a driver's motors) is one value.
 */
export function jsonChanges(a: unknown, b: unknown, path: JsonPath = []): JsonChange[] {
  if (jsonEqual(a, b)) return [];
  if (isPlainObject(a) && isPlainObject(b)) return objectChanges(a, b, path);
  if (Array.isArray(a) && Array.isArray(b) && ![...a, ...b].every(isPrimitive)) {
    const length = Math.max(a.length, b.length);
    return Array.from({ length }, (_, i) =>
      i < a.length && i < b.length ? jsonChanges(a[i], b[i], [...path, i]) : [{ path: [...path, i], from: a[i], to: b[i] }],
    ).flat();
  }
  return [{ path, from: a, to: b }];
}
