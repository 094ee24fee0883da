import { diffConfigs, valueWords, type ConfigChange } from './diff-configs';
import { deepEqual, pathKey, valueAt, withValueAt } from './field-path';

/** Who changed a field that differs between a newer saved revision ("theirs") and a draft ("mine"). */
export type ChangeOrigin = 'theirs' | 'mine' | 'both';

export interface RebaseRow extends ConfigChange {
  /** Dotted path, unique per row: the key of a choice. */
  key: string;
  origin: ChangeOrigin;
  /** Before = theirs, after = mine; the base revision's value, in words. */
  baseWords: string;
  /** What to keep unless the person chooses otherwise. */
  suggested: 'theirs' | 'mine';
}

/**
 * Every field where the draft (`mine`, started from `base`) differs from the newer revision
 * (`theirs`), with who changed it since `base`: a field only they changed suggests theirs, a
 * field only I changed suggests mine, a field both changed suggests mine and is marked `both`.
 */
export function rebaseRows(base: unknown, theirs: unknown, mine: unknown): RebaseRow[] {
  return diffConfigs(theirs, mine).map((change) => {
    const atBase = valueAt(base, change.path);
    const iChanged = !deepEqual(atBase, change.after);
    const theyChanged = !deepEqual(atBase, change.before);
    const origin: ChangeOrigin = iChanged && theyChanged ? 'both' : iChanged ? 'mine' : 'theirs';
    return {
      ...change,
      key: pathKey(change.path),
      origin,
      baseWords: valueWords(atBase, change.unit),
      suggested: origin === 'theirs' ? 'theirs' : 'mine',
    };
  });
}

/** The draft rebased on `theirs`: their revision, with my value for every row chosen as mine. */
export function rebaseDraft<T>(theirs: T, rows: readonly RebaseRow[], choices: Readonly<Record<string, 'theirs' | 'mine'>>): T {
  let next = structuredClone(theirs);
  for (const row of rows) {
    if ((choices[row.key] ?? row.suggested) === 'mine') next = withValueAt(next, row.path, structuredClone(row.after));
  }
  return next;
}
