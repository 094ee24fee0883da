import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { blockersOf } from '@/features/firmware/lib/blockers';
import { fieldLink } from '@/features/firmware/lib/field-link';
import { groupFiles, pickFile } from '@/features/firmware/lib/file-groups';
import { highlightHtml, lineCount } from '@/features/firmware/lib/highlight';
import { usageOf } from '@/features/firmware/lib/usage';
import { firmwareFile, firmwareFiles } from '../factories';

describe('grouping the bundle into folders', () => {
  it('puts the robot sketch first, then the remote transmitter sketch, then the documents', () => {
    const groups = groupFiles(firmwareFiles({ remote: true }));
    expect(groups.map((g) => [g.title, g.folder, g.files.length])).toEqual([
      ['Robot sketch', 'greenhouse_cart', 2],
      ['Remote transmitter sketch', 'greenhouse_cart_remote', 2],
      ['Bundle documents', null, 3],
    ]);
  });

  it('leaves the remote group out when the link is not home-made', () => {
    expect(groupFiles(firmwareFiles()).map((g) => g.id)).toEqual(['robot', 'documents']);
  });

  it("opens the robot's .ino when the file asked for is not in the bundle", () => {
    expect(pickFile(firmwareFiles(), 'old_name/old_name.ino')?.path).toBe('greenhouse_cart/greenhouse_cart.ino');
    expect(pickFile(firmwareFiles(), 'README.md')?.path).toBe('README.md');
  });
});

describe('highlighting a file', () => {
  it('escapes markup in the file, so nothing in it becomes HTML', () => {
    const html = highlightHtml('// <img src=x onerror=alert(1)>\n', 'cpp');
    expect(html).not.toContain('<img');
    expect(html).toContain('&lt;img');
    expect(highlightHtml('<b>&</b>', 'text')).toBe('&lt;b&gt;&amp;&lt;/b&gt;');
  });

  it('counts lines with and without a final newline', () => {
    expect(lineCount('a\nb\n')).toBe(2);
    expect(lineCount('a\nb')).toBe(2);
    expect(lineCount('')).toBe(1);
  });

  it('highlights C++, JSON and Markdown', () => {
    expect(highlightHtml('#define X 1\n', 'cpp')).toContain('hljs-meta');
    expect(highlightHtml('{"a": 1}', 'json')).toContain('hljs-attr');
    expect(highlightHtml('# Title\n', 'markdown')).toContain('hljs-section');
  });
});

describe('memory use against a board limit', () => {
  it('is fine below three quarters of RAM and tight from there', () => {
    expect(usageOf(1500, 2048, 'ram')).toEqual({ percent: 74, tone: 'ok' });
    expect(usageOf(1536, 2048, 'ram')).toEqual({ percent: 75, tone: 'warn' });
  });

  it('is an error when the build does not fit', () => {
    expect(usageOf(33_000, 32_256, 'flash')).toEqual({ percent: 103, tone: 'error' });
    expect(usageOf(32_256, 32_256, 'flash').tone).toBe('warn');
  });
});

describe('reasons that block generation', () => {
  it('takes the exact paths from a firmware_blocked answer', () => {
    const error = new ApiError(422, {
      code: 'firmware_blocked',
      message: 'x',
      fields: { 'wiring.drivers.0.pins.a.en.pin': 'No pin' },
      issues: [{ path: ['wiring', 'drivers', 0, 'pins', 'a.en', 'pin'], message: 'No pin' }],
    });
    expect(blockersOf(error)).toEqual([{ path: ['wiring', 'drivers', 0, 'pins', 'a.en', 'pin'], message: 'No pin' }]);
  });

  it("strips the body's config prefix from an invalid draft's fields", () => {
    const error = new ApiError(400, {
      code: 'invalid_input',
      message: 'x',
      fields: { 'config.safety.rampPerSecond': 'Too big' },
    });
    expect(blockersOf(error)).toEqual([{ path: ['safety', 'rampPerSecond'], message: 'Too big' }]);
  });

  it('is null for any other error', () => {
    expect(blockersOf(new ApiError(500, { code: 'server_error', message: 'x' }))).toBeNull();
    expect(blockersOf(new TypeError('offline'))).toBeNull();
  });
});

describe('links to fields', () => {
  it("lead to the section that shows the field's first key", () => {
    expect(fieldLink(['power', 'battery', 'cells'])).toBe('../safety?field=power.battery.cells');
    expect(fieldLink(['motors', 1, 'name'])).toBe('../chassis?field=motors.1.name');
    expect(fieldLink(['unknown'])).toBeNull();
  });

  it("lead to Wiring for the handheld remote's pins, which Wiring plans beside the robot's", () => {
    expect(fieldLink(['controls', 'link', 'remotePins', 'throttle', 'pin'])).toBe(
      '../wiring?field=controls.link.remotePins.throttle.pin',
    );
  });
});

it('gives a file its size in bytes of UTF-8', () => {
  expect(firmwareFile('a.h', 'é').size).toBe(2);
});
