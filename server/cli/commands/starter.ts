import type { z } from 'zod';
import { BoardIdSchema, DriveLayoutIdSchema, DriverKindIdSchema, InputSourceIdSchema } from '@shared/schemas/ids';
import { buildStarterConfig } from '@shared/starter';
import { CliError, printJson } from '../io';
import { parseCliArgs } from './mix';

function pick<T>(schema: z.ZodType<T>, value: string | undefined, field: string): T | undefined {
  if (value === undefined) return undefined;
  const result = schema.safeParse(value);
  if (!result.success)
    throw new CliError(`${field}: "${value}" is not known. ${result.error.issues[0]?.message ?? ''}`.trim(), 2);
  return result.data;
}

// `starter <layout> [--board ID] [--input ID] [--driver ID] [--name TEXT]` → a complete configuration
export async function run(args: string[]): Promise<number> {
  const { values, positionals } = parseCliArgs(args, {
    board: { type: 'string' },
    input: { type: 'string' },
    driver: { type: 'string' },
    name: { type: 'string' },
  });
  if (positionals.length === 0)
    throw new CliError(`Missing argument: the layout (${DriveLayoutIdSchema.options.join(', ')})`, 2);
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const layout = pick(DriveLayoutIdSchema, positionals[0], 'layout')!;
  const name = values.name as string | undefined;
  if (name !== undefined && (name.trim() === '' || name.length > 60))
    throw new CliError('--name: give 1 to 60 characters', 2);
  printJson(
    buildStarterConfig({
      layout,
      board: pick(BoardIdSchema, values.board as string | undefined, '--board'),
      input: pick(InputSourceIdSchema, values.input as string | undefined, '--input'),
      driver: pick(DriverKindIdSchema, values.driver as string | undefined, '--driver'),
      name,
    }),
  );
  return 0;
}
