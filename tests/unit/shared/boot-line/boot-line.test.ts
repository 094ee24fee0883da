import { describe, expect, it } from 'vitest';
import { parseBootLine } from '@shared/boot-line/boot-line';

describe('reading a boot line', () => {
  it('reads the robot name, revision, hash and the rest', () => {
    const result = parseBootLine(
      'boot robot="Greenhouse Cart" revision=3 hash=1A2b3c4d generator=0.1.0 board=nano input=ppm',
    );
    expect(result).toEqual({
      ok: true,
      line: {
        device: 'robot',
        robotName: 'Greenhouse Cart',
        revision: 3,
        hash: '1a2b3c4d',
        extra: { generator: '0.1.0', board: 'nano', input: 'ppm' },
      },
    });
  });

  it('finds the line among others and behind a serial monitor time stamp', () => {
    const pasted =
      'ets Jun  8 2016 00:22:57\r\n12:03:04.120 -> boot robot="Aisle Scout" revision=12 hash=deadbeef generator=0.1.0\r\nhealth good=50/s';
    const result = parseBootLine(pasted);
    expect(result.ok && result.line).toMatchObject({ robotName: 'Aisle Scout', revision: 12, hash: 'deadbeef' });
  });

  it('keeps quotes inside the robot name', () => {
    const result = parseBootLine('boot robot="The "Big" One" revision=1 hash=00000000');
    expect(result.ok && result.line.robotName).toBe('The "Big" One');
  });

  it('reads the remote’s line too', () => {
    const result = parseBootLine('remote for robot="Bench Kiwi" revision=2 hash=cafef00d generator=0.1.0');
    expect(result.ok && result.line).toMatchObject({ device: 'remote', robotName: 'Bench Kiwi', revision: 2 });
  });

  it('says so when there is no boot line', () => {
    expect(parseBootLine('health good=50/s bad=0')).toEqual({
      ok: false,
      reason: 'No boot line found: paste the line the robot prints at start-up, beginning with boot robot="',
    });
  });

  it('names a hash of the wrong length', () => {
    expect(parseBootLine('boot robot="X" revision=1 hash=abc')).toEqual({
      ok: false,
      reason: 'The boot line\'s hash must be 8 hexadecimal digits, got "abc"',
    });
  });

  it('names a revision that is not a number', () => {
    const result = parseBootLine('boot robot="X" revision=three hash=00000000');
    expect(result.ok).toBe(false);
    expect(!result.ok && result.reason).toMatch(/revision "three" is not a whole number/);
  });
});
