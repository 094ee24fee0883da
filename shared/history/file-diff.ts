import { diffArrays } from 'diff';

export interface DiffLine {
  /** Line number in its file, from 1. */
  number: number;
  text: string;
  /** The changed middle of a changed line, [start, end) in `text`, for highlighting. */
  span?: [number, number];
}

/** One row of a side-by-side view: old file on the left, new on the right. */
export type DiffRow =
  | { kind: 'same'; left: DiffLine; right: DiffLine }
  | { kind: 'changed'; left: DiffLine; right: DiffLine }
  | { kind: 'removed'; left: DiffLine; right: null }
  | { kind: 'added'; left: null; right: DiffLine }
  /** Unchanged lines left out between the shown ones. */
  | { kind: 'skip'; count: number };

export interface FileDiff {
  path: string;
  status: 'changed' | 'added' | 'removed';
  added: number;
  removed: number;
  rows: DiffRow[];
}

export interface TextFile {
  path: string;
  content: string;
}

const lines = (text: string) => (text === '' ? [] : text.replace(/\n$/, '').split('\n'));

/** The part of two similar lines between their common start and common end. */
function middleSpans(a: string, b: string): [[number, number], [number, number]] {
  let start = 0;
  while (start < a.length && start < b.length && a[start] === b[start]) start++;
  let end = 0;
  while (end < a.length - start && end < b.length - start && a[a.length - 1 - end] === b[b.length - 1 - end]) end++;
  return [
    [start, a.length - end],
    [start, b.length - end],
  ];
}

/** Every line of both files as rows; removed lines beside the added lines that replace them. */
function allRows(oldText: string, newText: string): DiffRow[] {
  const rows: DiffRow[] = [];
  let l = 1;
  let r = 1;
  let pendingRemoved: string[] = [];
  const flush = (added: string[]) => {
    const pairs = Math.max(pendingRemoved.length, added.length);
    for (let i = 0; i < pairs; i++) {
      const left = i < pendingRemoved.length ? { number: l++, text: pendingRemoved[i] } : null;
      const right = i < added.length ? { number: r++, text: added[i] } : null;
      if (left && right) {
        const [ls, rs] = middleSpans(left.text, right.text);
        rows.push({ kind: 'changed', left: { ...left, span: ls }, right: { ...right, span: rs } });
      } else if (left) rows.push({ kind: 'removed', left, right: null });
      else if (right) rows.push({ kind: 'added', left: null, right });
    }
    pendingRemoved = [];
  };
  for (const change of diffArrays(lines(oldText), lines(newText))) {
    if (change.removed) pendingRemoved.push(...change.value);
    else if (change.added) flush(change.value);
    else {
      flush([]);
      for (const text of change.value)
        rows.push({ kind: 'same', left: { number: l++, text }, right: { number: r++, text } });
    }
  }
  flush([]);
  return rows;
}

/** Keeps `context` unchanged rows around each change; longer unchanged runs become one skip row. */
function withContext(rows: DiffRow[], context: number): DiffRow[] {
  const near = rows.map(() => false);
  rows.forEach((row, i) => {
    if (row.kind === 'same') return;
    for (let j = Math.max(0, i - context); j <= Math.min(rows.length - 1, i + context); j++) near[j] = true;
  });
  const out: DiffRow[] = [];
  let skipped = 0;
  rows.forEach((row, i) => {
    if (near[i]) {
      if (skipped) out.push({ kind: 'skip', count: skipped });
      skipped = 0;
      out.push(row);
    } else skipped++;
  });
  if (skipped) out.push({ kind: 'skip', count: skipped });
  return out;
}

/** Side-by-side rows of one file's change, with `context` unchanged lines around each change. */
export function fileDiff(path: string, oldText: string | null, newText: string | null, context = 3): FileDiff {
  const rows = allRows(oldText ?? '', newText ?? '');
  const status = oldText === null ? 'added' : newText === null ? 'removed' : 'changed';
  const count = (side: 'left' | 'right') =>
    rows.filter((row) => row.kind !== 'same' && row.kind !== 'skip' && row[side]).length;
  return { path, status, added: count('right'), removed: count('left'), rows: withContext(rows, context) };
}

/** Which revision a generated file was made for: every file carries it in its first lines. */
export interface RevisionStamp {
  revision: number;
  hash: string;
}

/**
 * The old file's text as it would read had it been generated for the new revision: its
 * configuration hash and revision number swapped for the new ones. Files that then match
 * differ only in that stamp.
 */
export function restamp(text: string, from: RevisionStamp, to: RevisionStamp): string {
  return text
    .split(from.hash)
    .join(to.hash)
    .replace(/(revision[\s=":]*)(\d+)/gi, (whole, lead: string, n: string) =>
      Number(n) === from.revision ? `${lead}${to.revision}` : whole,
    );
}

export interface FilesDiff {
  changed: FileDiff[];
  /** Files whose only difference is the revision stamp. */
  stampOnly: string[];
  unchanged: string[];
}

/**
 * The files that differ between two sets (a firmware bundle before and after), in path order.
 * With `stamps`, files that differ only in the revision stamp are listed apart.
 */
export function filesDiff(
  before: TextFile[],
  after: TextFile[],
  options: { context?: number; stamps?: { from: RevisionStamp; to: RevisionStamp } } = {},
): FilesDiff {
  const old = new Map(before.map((f) => [f.path, f.content]));
  const now = new Map(after.map((f) => [f.path, f.content]));
  const paths = [...new Set([...old.keys(), ...now.keys()])].sort();
  const result: FilesDiff = { changed: [], stampOnly: [], unchanged: [] };
  const { stamps } = options;
  for (const path of paths) {
    const a = old.get(path) ?? null;
    const b = now.get(path) ?? null;
    if (a === b) result.unchanged.push(path);
    else if (a !== null && b !== null && stamps && restamp(a, stamps.from, stamps.to) === b)
      result.stampOnly.push(path);
    else result.changed.push(fileDiff(path, a, b, options.context));
  }
  return result;
}
