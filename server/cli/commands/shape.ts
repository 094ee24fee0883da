import { shapeChannel } from '@shared/shaping/shape-channels';
import { CliError, numberOption, printJson, readConfigFile } from '../io';
import { parseCliArgs, tidyNumber } from './mix';

// `shape <config.json> --channel N --raw V` → { value }
export async function run(args: string[]): Promise<number> {
  const { values, positionals } = parseCliArgs(args, { channel: { type: 'string' }, raw: { type: 'string' } });
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const channel = numberOption(values, 'channel');
  if (!Number.isInteger(channel) || channel < 1)
    throw new CliError(`--channel must be a channel number (1, 2, …), got ${channel}`, 2);
  const raw = numberOption(values, 'raw');
  const config = await readConfigFile(positionals[0]);
  if (!config.controls.channels.some((c) => c.number === channel)) {
    throw new CliError(`--channel: channel ${channel} is not in the channel table (controls.channels)`, 2);
  }
  printJson({ value: tidyNumber(shapeChannel(config, channel, raw).value) });
  return 0;
}
