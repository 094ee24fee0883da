import { settingChanges, settingValueWords, type SettingChange } from './setting-changes';
import { deepEqual, pathKey, valueAt, withValueAt, type FieldPath } from './field-path';

/** Who changed a field that differs between a newer saved revision ("theirs") and a draft ("mine"). */
export type ChangeOrigin = 'theirs' | 'mine' | 'both';

export interface RebaseRow extends SettingChange {
  /** Dotted path, unique per row: the key of a choice. */
  key: string;
  origin: ChangeOrigin;
  /** From = theirs, to = mine; the base revision's value, in words (null where absent). */
  baseWords: string | null;
  /** My value itself (undefined where my draft has no such field or item). */
  mine: unknown;
  /** What to keep unless the person chooses otherwise. */
  suggested: 'theirs' | 'mine';
}

/**
 * Every field where the draft (`mine`, started from `base`) differs from the newer revision
 * (`theirs`), with who changed it since `base`: a field only they changed suggests theirs, a
 * field only I changed suggests mine, a field both changed suggests mine and is marked `both`.
 */
export function rebaseRows(base: unknown, theirs: unknown, mine: unknown): RebaseRow[] {
  return settingChanges(theirs, mine).map((change) => {
    const atBase = valueAt(base, change.path);
    const mineValue = valueAt(mine, change.path);
    const iChanged = !deepEqual(atBase, mineValue);
    const theyChanged = !deepEqual(atBase, valueAt(theirs, change.path));
    const origin: ChangeOrigin = iChanged && theyChanged ? 'both' : iChanged ? 'mine' : 'theirs';
    return {
      ...change,
      key: pathKey(change.path),
      origin,
      baseWords: settingValueWords(change.path, atBase, theirs, mine),
      mine: mineValue,
      suggested: origin === 'theirs' ? 'theirs' : 'mine',
    };
  });
}

/** `value` put at `path`; an item of a list is appended past the end, or taken out when `value` is undefined. */
function withMine<T>(root: T, path: FieldPath, value: unknown): T {
  const index = path[path.length - 1];
  const listPath = path.slice(0, -1);
  const list = valueAt(root, listPath);
  if (!Array.isArray(list) || typeof index !== 'number') return withValueAt(root, path, value);
  if (value === undefined)
    return withValueAt(
      root,
      listPath,
      list.filter((_, i) => i !== index),
    );
  return index < list.length ? withValueAt(root, path, value) : withValueAt(root, listPath, [...list, value]);
}

/**
 * The draft rebased on `theirs`: their revision, with my value for every row chosen as mine.
 * Lists differ only at their ends (items past the shorter list are rows of their own), so my
 * changes are applied first, in order, and my removals last, from the end, keeping indexes true.
 */
export function rebaseDraft<T>(
  theirs: T,
  rows: readonly RebaseRow[],
  choices: Readonly<Record<string, 'theirs' | 'mine'>>,
): T {
  const chosen = rows.filter((row) => (choices[row.key] ?? row.suggested) === 'mine');
  const removals = chosen.filter((row) => row.mine === undefined).reverse();
  let next = structuredClone(theirs);
  for (const row of [...chosen.filter((r) => r.mine !== undefined), ...removals])
    next = withMine(next, row.path, structuredClone(row.mine));
  return next;
}
