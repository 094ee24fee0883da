import { parseArgs, type ParseArgsConfig } from 'node:util';
import { computeMixing, mixSticks } from '@shared/kinematics/mixing';
import { CliError, numberOption, printJson, readConfigFile } from '../io';

type Options = NonNullable<ParseArgsConfig['options']>;

/**
 * node's parseArgs refuses `--yaw -0.5` (a value that looks like an option), so a negative
 * number after a value option is joined to it first: `--yaw=-0.5`.
 */
export function parseCliArgs(args: string[], options: Options) {
  const joined: string[] = [];
  for (let i = 0; i < args.length; i += 1) {
    const name = args[i].startsWith('--') ? args[i].slice(2) : null;
    const next = args[i + 1];
    if (name && options[name]?.type === 'string' && next !== undefined && /^-\d|^-\.\d/.test(next)) {
      joined.push(`${args[i]}=${next}`);
      i += 1;
    } else {
      joined.push(args[i]);
    }
  }
  try {
    return parseArgs({ args: joined, options, allowPositionals: true, strict: true });
  } catch (error) {
    throw new CliError((error as Error).message, 2);
  }
}

/** A stick command option in −1..1 (0 when left out). */
function stickOption(values: Record<string, unknown>, name: string): number {
  const value = numberOption(values, name, 0);
  if (value < -1 || value > 1) throw new CliError(`--${name} must be between -1 and 1, got ${value}`, 2);
  return value;
}

/** Rounds away floating-point residue (and −0) for readable JSON. */
export function tidyNumber(value: number, places = 6): number {
  const factor = 10 ** places;
  const rounded = Math.round(value * factor) / factor;
  return rounded === 0 ? 0 : rounded;
}

// `mix <config.json> --forward F --strafe S --yaw Y` → { motors: [{ name, command }] }
export async function run(args: string[]): Promise<number> {
  const { values, positionals } = parseCliArgs(args, {
    forward: { type: 'string' },
    strafe: { type: 'string' },
    yaw: { type: 'string' },
  });
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const sticks = {
    forward: stickOption(values, 'forward'),
    strafe: stickOption(values, 'strafe'),
    yaw: stickOption(values, 'yaw'),
  };
  const config = await readConfigFile(positionals[0]);
  const mixing = computeMixing(config);
  const commands = mixSticks(mixing, sticks, config.controls.desaturation);
  printJson({ motors: mixing.motors.map((name, i) => ({ name, command: tidyNumber(commands[i]) })) });
  return 0;
}
