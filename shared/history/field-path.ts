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
