import { describe, expect, it } from 'vitest';
import { cIdentifier, cString, cStringBody, macroPart, markdownText } from '@server/features/firmware/c-text';
import { remoteFolderName, SKETCH_NAME_PATTERN, sketchFolderName } from '@server/features/firmware/sketch-name';

describe('C identifiers from names', () => {
  it('keeps letters and digits and joins words with underscores', () => {
    expect(cIdentifier('Front left (motor #2)')).toBe('front_left_motor_2');
  });

  it('folds accents and drops other non-ASCII letters', () => {
    expect(cIdentifier('Räder vorn – Ω')).toBe('rader_vorn');
  });

  it('starts with a letter even when the name starts with a digit', () => {
    expect(cIdentifier('3rd wheel', 'motor')).toBe('motor_3rd_wheel');
  });

  it('uses the fallback when nothing usable is left', () => {
    expect(cIdentifier('*/ "" \\', 'motor')).toBe('motor');
  });

  it('never equals a C++ keyword', () => {
    expect(cIdentifier('switch')).toBe('switch_');
    expect(macroPart('loop')).toBe('LOOP_');
  });

  it('is cut to the length limit without a trailing underscore', () => {
    const id = cIdentifier('a'.repeat(20) + ' ' + 'b'.repeat(40), 'x', 24);
    expect(id.length).toBeLessThanOrEqual(24);
    expect(id).toMatch(/^[a-z][a-z0-9_]*[a-z0-9]$/);
  });
});

describe('C string literals from names', () => {
  it('escapes quotes, backslashes and question marks (no trigraphs)', () => {
    expect(cString('say "hi" \\ ??=')).toBe('"say \\"hi\\" \\\\ \\?\\?="');
  });

  it('writes newlines and non-ASCII bytes as three-digit octal escapes', () => {
    expect(cStringBody('a\nb')).toBe('a\\012b');
    expect(cStringBody('é')).toBe('\\303\\251');
  });

  it('keeps an octal escape from swallowing the digits after it', () => {
    expect(cStringBody('\u00019')).toBe('\\0019');
  });
});

describe('Markdown text from names', () => {
  it('cannot break a table row, start a heading or open a code span', () => {
    expect(markdownText('a | b\n# c `d` <e>')).toBe('a \\| b \\# c \\`d\\` \\<e\\>');
  });
});

describe('sketch folder names', () => {
  it('follow the Arduino rules: "Greenhouse Cart" becomes greenhouse_cart', () => {
    expect(sketchFolderName('Greenhouse Cart', null)).toBe('greenhouse_cart');
  });

  it('fall back to a fixed name when the robot name has no usable characters', () => {
    expect(sketchFolderName('★★★', null)).toBe('mixwright_robot');
  });

  it('keep a configured name as it is', () => {
    expect(sketchFolderName('Anything', 'bench-kiwi.v2')).toBe('bench-kiwi.v2');
  });

  it('stay within 63 characters for the remote folder too', () => {
    const robot = sketchFolderName('x'.repeat(80), null);
    expect(robot).toMatch(SKETCH_NAME_PATTERN);
    expect(remoteFolderName(robot)).toMatch(SKETCH_NAME_PATTERN);
    expect(remoteFolderName(robot).endsWith('_remote')).toBe(true);
  });
});
