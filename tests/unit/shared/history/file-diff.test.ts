import { describe, expect, it } from 'vitest';
import { fileDiff, filesDiff, restamp } from '@shared/history/file-diff';

const numbered = (n: number, change: Record<number, string> = {}) =>
  `${Array.from({ length: n }, (_, i) => change[i + 1] ?? `line ${i + 1}`).join('\n')}\n`;

describe('a side-by-side file diff', () => {
  it('puts a changed line beside its replacement and marks the changed middle', () => {
    const diff = fileDiff('a.h', '#define MW_FAILSAFE_MS 250\n', '#define MW_FAILSAFE_MS 150\n');
    expect(diff).toMatchObject({ status: 'changed', added: 1, removed: 1 });
    expect(diff.rows).toEqual([
      {
        kind: 'changed',
        left: { number: 1, text: '#define MW_FAILSAFE_MS 250', span: [23, 24] },
        right: { number: 1, text: '#define MW_FAILSAFE_MS 150', span: [23, 24] },
      },
    ]);
  });

  it('keeps three unchanged lines around a change and counts the rest as skipped', () => {
    const diff = fileDiff('b.ino', numbered(20), numbered(20, { 10: 'line ten' }));
    expect(diff.rows.map((r) => r.kind)).toEqual([
      'skip',
      'same',
      'same',
      'same',
      'changed',
      'same',
      'same',
      'same',
      'skip',
    ]);
    expect(diff.rows[0]).toEqual({ kind: 'skip', count: 6 });
    expect(diff.rows[8]).toEqual({ kind: 'skip', count: 7 });
  });

  it('numbers each side on its own after an inserted line', () => {
    const diff = fileDiff('c.h', 'a\nb\nc\n', 'a\nnew\nb\nc\n');
    expect(diff.rows).toEqual([
      { kind: 'same', left: { number: 1, text: 'a' }, right: { number: 1, text: 'a' } },
      { kind: 'added', left: null, right: { number: 2, text: 'new' } },
      { kind: 'same', left: { number: 2, text: 'b' }, right: { number: 3, text: 'b' } },
      { kind: 'same', left: { number: 3, text: 'c' }, right: { number: 4, text: 'c' } },
    ]);
  });

  it('shows a removed line on the left only', () => {
    const diff = fileDiff('d.h', 'a\nb\n', 'a\n');
    expect(diff.rows[1]).toEqual({ kind: 'removed', left: { number: 2, text: 'b' }, right: null });
    expect(diff).toMatchObject({ added: 0, removed: 1 });
  });
});

describe('the difference between two sets of files', () => {
  it('lists changed, added and removed files and names the unchanged ones', () => {
    const before = [
      { path: 'robot/robot.ino', content: 'same\n' },
      { path: 'robot/mw_config.h', content: 'rev 1\n' },
      { path: 'robot/mw_sbus.h', content: 'sbus\n' },
    ];
    const after = [
      { path: 'robot/robot.ino', content: 'same\n' },
      { path: 'robot/mw_config.h', content: 'rev 2\n' },
      { path: 'robot/mw_ppm.h', content: 'ppm\n' },
    ];
    const { changed, unchanged } = filesDiff(before, after);
    expect(changed.map((f) => [f.path, f.status])).toEqual([
      ['robot/mw_config.h', 'changed'],
      ['robot/mw_ppm.h', 'added'],
      ['robot/mw_sbus.h', 'removed'],
    ]);
    expect(unchanged).toEqual(['robot/robot.ino']);
  });

  it('sets apart files that differ only in the revision stamp', () => {
    const stamp = (revision: number, hash: string) =>
      `// Generated for revision ${revision} (configuration hash ${hash}).\n#define MW_REVISION ${revision}UL\n#define MW_CONFIG_HASH "${hash}"\nint pins = 13;\n`;
    const before = [
      { path: 'a.h', content: stamp(3, '0badc0de') },
      { path: 'b.h', content: `${stamp(3, '0badc0de')}x\n` },
    ];
    const after = [
      { path: 'a.h', content: stamp(4, 'cafef00d') },
      { path: 'b.h', content: `${stamp(4, 'cafef00d')}y\n` },
    ];
    const stamps = { from: { revision: 3, hash: '0badc0de' }, to: { revision: 4, hash: 'cafef00d' } };
    const result = filesDiff(before, after, { stamps });
    expect(result.stampOnly).toEqual(['a.h']);
    expect(result.changed.map((f) => f.path)).toEqual(['b.h']);
  });

  it('restamps only the revision number it was asked to', () => {
    expect(
      restamp('revision=3 pins=3 "revision": 3 Revision 33', { revision: 3, hash: 'aa' }, { revision: 7, hash: 'bb' }),
    ).toBe('revision=7 pins=3 "revision": 7 Revision 33');
  });
});
