import { assignPins } from '@shared/pins/assign-pins';
import { CliError, printJson, readConfigFile } from '../io';
import { parseCliArgs } from './mix';

// `assign <config.json>` → { ok: true, config } with every pin filled, or { ok: false, reason } and exit 1.
export async function run(args: string[]): Promise<number> {
  const { positionals } = parseCliArgs(args, {});
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const config = await readConfigFile(positionals[0]);
  const result = assignPins(config);
  printJson(result);
  return result.ok ? 0 : 1;
}
