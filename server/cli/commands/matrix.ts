import { CliError } from '../io';

export async function run(_args: string[]): Promise<number> {
  throw new CliError('The "matrix" command is not built yet.', 2);
}
