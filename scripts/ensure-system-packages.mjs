#!/usr/bin/env node
// Makes sure the system packages the tests need are present before vitest starts:
// Debian's Chromium for the browser tests, and the AVR toolchain, Arduino AVR core and
// simavr for the firmware tests. Installs them with apt-get when running as root;
// otherwise prints the exact command and fails.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const needs = [
  { what: 'Chromium', present: () => existsSync('/usr/bin/chromium'), packages: ['chromium'] },
  {
    what: 'AVR compiler and Arduino AVR core',
    present: () =>
      hasCommand('avr-g++') && existsSync('/usr/share/arduino/hardware/arduino/avr/cores/arduino/Arduino.h'),
    packages: ['gcc-avr', 'avr-libc', 'arduino-core-avr'],
  },
  {
    what: 'simavr and its library',
    present: () => hasCommand('simavr') && existsSync('/usr/include/simavr/sim_avr.h'),
    packages: ['simavr', 'libsimavr-dev'],
  },
  { what: 'host C++ compiler', present: () => hasCommand('g++') && hasCommand('gcc'), packages: ['g++'] },
];

function hasCommand(name) {
  return spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;
}

const missing = needs.filter((n) => !n.present());
if (missing.length === 0) process.exit(0);

const packages = [...new Set(missing.flatMap((n) => n.packages))];
const command = `apt-get update && apt-get install -y --no-install-recommends ${packages.join(' ')}`;
console.log(`Tests need: ${missing.map((n) => n.what).join(', ')}.`);

if (typeof process.getuid === 'function' && process.getuid() === 0) {
  console.log(`Installing: ${command}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('sh', ['-c', command], { stdio: 'inherit', env });
  const still = needs.filter((n) => !n.present());
  if (still.length > 0) {
    console.error(`Still missing after install: ${still.map((n) => n.what).join(', ')}`);
    process.exit(1);
  }
} else {
  console.error(`Not running as root, so not installing. Run:\n  sudo sh -c '${command}'`);
  process.exit(1);
}
