#!/usr/bin/env node
// Mixwright's command line: `npm run cli -- <command> ...`. JSON on stdout, messages on stderr.
import { CliError } from './io';

type Command = { summary: string; load: () => Promise<{ run: (args: string[]) => Promise<number> }> };

// Each command lives in its own file under ./commands and exports `run(args)` returning the exit code.
const commands: Record<string, Command> = {
  starter: {
    summary: 'starter <layout> [--board ID] [--input ID] [--driver ID]  a complete starter configuration',
    load: () => import('./commands/starter'),
  },
  matrix: {
    summary: 'matrix <config.json>  mixing matrix, rank and motion envelope',
    load: () => import('./commands/matrix'),
  },
  mix: {
    summary: 'mix <config.json> --forward F --strafe S --yaw Y  motor commands',
    load: () => import('./commands/mix'),
  },
  shape: {
    summary: 'shape <config.json> --channel N --raw V  a channel value after shaping',
    load: () => import('./commands/shape'),
  },
  check: {
    summary: 'check <config.json>  pin plan and configuration problems',
    load: () => import('./commands/check'),
  },
  assign: { summary: 'assign <config.json>  fill every unlocked pin', load: () => import('./commands/assign') },
  bundle: {
    summary: 'bundle <config.json> (-o out.zip | --dir out/)  the firmware bundle',
    load: () => import('./commands/bundle'),
  },
};

function usage(): string {
  return [
    'Usage: npm run cli -- <command> [arguments]',
    '',
    ...Object.values(commands).map((c) => `  ${c.summary}`),
  ].join('\n');
}

async function main(argv: string[]): Promise<number> {
  const [name, ...args] = argv;
  if (!name || name === '--help' || name === 'help') {
    process.stderr.write(`${usage()}\n`);
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    process.stderr.write(`Unknown command "${name}".\n${usage()}\n`);
    return 2;
  }
  const module = await command.load();
  return module.run(args);
}

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    if (error instanceof CliError) {
      process.stderr.write(`${error.message}\n`);
      process.exitCode = error.exitCode;
    } else {
      process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
      process.exitCode = 1;
    }
  },
);
