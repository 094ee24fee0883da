import { hasErrors } from '@shared/problems/problem';
import { robotProblems } from '@shared/problems/robot-problems';
import { CliError, printJson, readConfigFile } from '../io';
import { parseCliArgs } from './mix';

// `check <config.json>` → { problems: [{ severity, code, pins, message, hint }] }; exit 1 on any error.
export async function run(args: string[]): Promise<number> {
  const { positionals } = parseCliArgs(args, {});
  if (positionals.length > 1) throw new CliError(`Unexpected argument "${positionals[1]}"`, 2);
  const config = await readConfigFile(positionals[0]);
  const problems = robotProblems(config);
  printJson({
    problems: problems.map(({ severity, code, pins, message, hint }) => ({ severity, code, pins, message, hint })),
  });
  return hasErrors(problems) ? 1 : 0;
}
