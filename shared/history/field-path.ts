/** A path into a configuration: keys of objects and indexes of arrays, e.g. ['chassis', 'wheels', 0, 'xMm']. */
export type FieldPath = (string | number)[];

/** The dotted form used in form errors and links: `chassis.wheels.0.xMm`. */
export function pathKey(path: readonly (string | number)[]): string {
  return path.join('.');
}

export function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Equality of JSON-like values (objects compared by keys, not key order; undefined keys ignored). */
export function deepEqual(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (Array.isArray(a) || Array.isArray(b)) {
    return Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every((v, i) => deepEqual(v, b[i]));
  }
  if (isPlainObject(a) && isPlainObject(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const key of keys) if (!deepEqual(a[key], b[key])) return false;
    return true;
  }
  return false;
}

export function valueAt(root: unknown, path: readonly (string | number)[]): unknown {
  let node: unknown = root;
  for (const key of path) {
    if (Array.isArray(node) && typeof key === 'number') node = node[key];
    else if (isPlainObject(node)) node = node[String(key)];
    else return undefined;
  }
  return node;
}

/**
 * A copy of `root` with `value` at `path`, creating objects on the way; `undefined` removes an
 * object key. Parts of `root` off the path are shared, not copied.
 */
export function withValueAt<T>(root: T, path: readonly (string | number)[], value: unknown): T {
  if (path.length === 0) return value as T;
  const [key, ...rest] = path;
  if (Array.isArray(root) && typeof key === 'number') {
    const copy = [...root];
    copy[key] = withValueAt(copy[key], rest, value);
    return copy as T;
  }
  const base: Record<string, unknown> = isPlainObject(root) ? { ...root } : {};
  const next = withValueAt(base[String(key)], rest, value);
  if (next === undefined) delete base[String(key)];
  else base[String(key)] = next;
  return base as T;
}

/** One difference between two JSON values; `undefined` means absent on that side. */
export interface FieldChange {
  path: FieldPath;
  before: unknown;
  after: unknown;
}

function objectChanges(a: Record<string, unknown>, b: Record<string, unknown>, path: FieldPath): FieldChange[] {
  const keys = [...Object.keys(a), ...Object.keys(b).filter((k) => !(k in a))];
  return keys.flatMap((key) => {
    // A key on one side only is one change of its whole value (a pin role, a layout parameter).
    if (!(key in b) || !(key in a))
      return deepEqual(a[key], b[key]) ? [] : [{ path: [...path, key], before: a[key], after: b[key] }];
    return fieldChanges(a[key], b[key], [...path, key]);
  });
}

const isPrimitive = (value: unknown) => value === null || typeof value !== 'object';

/**
 * Every field that differs from `a` (before) to `b` (after), in document order. Objects are
 * compared key by key; lists of parts (wheels, motors, channels, drivers) item by item, an item
 * on one side only being one change; a list of plain values (rates, a driver's motors) is one
 * value. Works on any JSON-like value, not only a whole configuration.
 */
export function fieldChanges(a: unknown, b: unknown, path: FieldPath = []): FieldChange[] {
  if (deepEqual(a, b)) return [];
  if (isPlainObject(a) && isPlainObject(b)) return objectChanges(a, b, path);
  if (Array.isArray(a) && Array.isArray(b) && ![...a, ...b].every(isPrimitive)) {
    const length = Math.max(a.length, b.length);
    return Array.from({ length }, (_, i) =>
      i < a.length && i < b.length
        ? fieldChanges(a[i], b[i], [...path, i])
        : [{ path: [...path, i], before: a[i], after: b[i] }],
    ).flat();
  }
  return [{ path, before: a, after: b }];
}
