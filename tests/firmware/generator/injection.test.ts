import { join } from 'node:path';
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';
import { assignPins } from '@shared/pins/assign-pins';
import { renderBundle, type BundleFile } from '@server/features/firmware/render-bundle';
import { compileAvrSketch, type AvrCompileResult } from '@server/features/firmware/toolchain/avr-compile';
import { runLimited } from '@server/features/firmware/toolchain/run-tool';
import { sketchFolders, writeBundle } from '../helpers/bundle-files';
import { lexC } from '../helpers/c-lexer';
import { sampleConfig } from '../../factories/robot-config';

// Hostile names for the robot, its motors, wheels, channels and driver must never become code:
// every bundle still compiles with -Wall -Wextra -Werror, and user text appears only inside
// escaped string literals or as part of sanitized identifiers.

const FRAGMENTS = [
  '"',
  '\\',
  '*/',
  '/*',
  '\n',
  '\r\n',
  '#include <evil.h>',
  '??/',
  "'",
  '`',
  '|',
  'é',
  'Ω',
  '日本',
  '😀',
  '\t',
  '%s',
  '{{x}}',
  '}',
  ';',
  ' int main() { return 1; } ',
  '\\"',
  '\\n',
  '\0',
  'ß',
];
const MARKER = 'Zq';

const nameArb = (index: number, max: number) =>
  fc
    .array(fc.constantFrom(...FRAGMENTS), { minLength: 1, maxLength: 12 })
    .map((parts) => `${MARKER}${index}${parts.join('')}`)
    .map((name) => {
      // Cut by whole characters until the UTF-16 length fits the schema's limit.
      const chars = [...name];
      while (chars.join('').length > max) chars.pop();
      return chars.join('').trim();
    })
    .filter((name) => name.length > 0);

const namesArb = fc.record({
  robot: nameArb(0, 60),
  left: nameArb(1, 40),
  right: nameArb(2, 40),
  driver: nameArb(3, 40),
  channel: nameArb(4, 39),
  nrf24: fc.boolean(),
});

type Names = typeof namesArb extends fc.Arbitrary<infer T> ? T : never;

function hostileConfig(names: Names): RobotConfig {
  const config = structuredClone(sampleConfig());
  config.name = names.robot;
  config.motors[0].name = names.left;
  config.motors[1].name = names.right;
  config.chassis.wheels[0] = { ...config.chassis.wheels[0], name: names.left, motor: names.left };
  config.chassis.wheels[1] = { ...config.chassis.wheels[1], name: names.right, motor: names.right };
  config.wiring.drivers[0].name = names.driver;
  config.wiring.drivers[0].motors = [names.left, names.right];
  config.controls.channels.forEach((c, i) => (c.name = `${names.channel}${i}`));
  if (names.nrf24) {
    config.controls.source = 'nrf24';
    config.controls.channels.forEach((c) => Object.assign(c, { low: 0, centre: 512, high: 1023 }));
    config.wiring.drivers[0].pins['b.pwm'] = { pin: 'D5', locked: false };
    config.wiring.drivers[0].pins['b.in1'] = { pin: 'A1', locked: false };
    config.wiring.inputPins = {};
    config.wiring.statusLed = { pin: null, locked: false };
    // The pin plan places the transceiver and the remote's pins.
    const assigned = assignPins(RobotConfigSchema.parse(config));
    if (!assigned.ok) throw new Error(assigned.reason);
    return assigned.config;
  }
  return RobotConfigSchema.parse(config);
}

const SAMPLES = fc.sample(namesArb, { numRuns: 12, seed: 20260101 });

interface Case {
  config: RobotConfig;
  files: BundleFile[];
  builds: AvrCompileResult[];
}

describe('names full of quotes, comment ends, line breaks, #include and non-ASCII', () => {
  let cases: Case[];

  beforeAll(async () => {
    const rendered = SAMPLES.map((names) => {
      const config = hostileConfig(names);
      return { config, files: renderBundle(config, { revision: 9 }) };
    });
    const jobs = rendered.flatMap((c, i) =>
      sketchFolders(c.files).map((folder) => async () => {
        const root = await writeBundle(c.files, 'inject-');
        return { i, build: await compileAvrSketch(join(root, folder), folder.endsWith('_remote') ? 'nano' : 'uno') };
      }),
    );
    const results = await runLimited(jobs, 2);
    cases = rendered.map((c, i) => ({ ...c, builds: results.filter((r) => r.i === i).map((r) => r.build) }));
  });

  it('still give bundles whose sketches all compile with warnings as errors', () => {
    for (const c of cases) {
      for (const build of c.builds) expect(build.ok ? 'ok' : build.messages).toBe('ok');
    }
    expect(cases.some((c) => c.builds.length === 2)).toBe(true);
  });

  it('appear in code only inside string literals that decode to exactly one name, or inside identifiers', () => {
    for (const { config, files } of cases) {
      const names = [config.name, ...config.motors.map((m) => m.name)];
      for (const f of files.filter((x) => /\.(ino|h)$/.test(x.path))) {
        const lexed = lexC(f.content);
        const outsideIdentifiers = lexed.code.replace(/[A-Za-z_][A-Za-z0-9_]*/g, ' ');
        expect(outsideIdentifiers.toLowerCase(), f.path).not.toContain(MARKER.toLowerCase());
        for (const comment of lexed.comments) expect(comment.toLowerCase(), f.path).not.toContain(MARKER.toLowerCase());
        for (const literal of lexed.strings.filter((s) => s.includes(MARKER))) expect(names, f.path).toContain(literal);
      }
    }
  });

  it('never reach the folder names, which stay within the Arduino sketch rules', () => {
    for (const { files } of cases) {
      for (const folder of sketchFolders(files)) expect(folder).toMatch(/^[a-z0-9][a-z0-9_]{0,62}$/);
    }
  });

  it('cannot break a README table row or start a new Markdown block', () => {
    for (const { files } of cases) {
      const readme = files.find((f) => f.path === 'README.md')!.content;
      // Names keep their case in the README; sanitized folder names are lower case.
      for (const line of readme.split('\n').filter((l) => l.includes(MARKER))) {
        expect(line.startsWith('|') || line.startsWith('# ')).toBe(true);
        // The file table has two columns, the wiring tables three; an escaped bar is not a border.
        const borders = line.replace(/\\\\/g, '').replace(/\\\|/g, '').split('|').length - 1;
        if (line.startsWith('|')) expect([3, 4]).toContain(borders);
      }
    }
  });

  it('survive in config.json exactly', () => {
    for (const { config, files } of cases) {
      expect(RobotConfigSchema.parse(JSON.parse(files.find((f) => f.path === 'config.json')!.content))).toEqual(config);
    }
  });
});
